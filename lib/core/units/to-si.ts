import { findUnit } from "./find-unit";
import type { Quantity, UnitOf } from "./quantities";

/**
 * Converts a value in a user unit to SI (K, kg/s, W, W/(m²·K), m²·K/W, m², J/(kg·K)).
 *
 * Formula: SI = (value + offset)·scale, offset non-zero only for absolute °C (273.15) and °F (459.67, with scale 1/1.8).
 * Source: NIST SP 811 (2008), Appendix B.8 (factors) and B.9 (temperature), from exact defining constants.
 * Does not validate physical ranges (a temperature below absolute zero converts like any other); non-finite in,
 * non-finite out. Range checks belong to the validation layer and the thermal core.
 *
 * @throws UnitError for a unit id not in UNIT_TABLE[quantity] (only reachable from untyped callers)
 * @example toSI("temperature", 100, "degC") // 373.15
 */
export function toSI<Q extends Quantity>(quantity: Q, value: number, unit: UnitOf<Q>): number {
  const definition = findUnit(quantity, unit);
  return (value + definition.offset) * definition.scale;
}
