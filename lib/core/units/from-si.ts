import { findUnit } from "./find-unit";
import type { Quantity, UnitOf } from "./quantities";

/**
 * Converts an SI value to a user unit: the inverse of toSI.
 *
 * Formula: value = SI/scale − offset.
 * Source: NIST SP 811 (2008), Appendix B.8 and B.9.
 *
 * @throws UnitError for a unit id not in UNIT_TABLE[quantity]
 * @example fromSI("power", 1000, "Btu/h") // 3412.1416…
 */
export function fromSI<Q extends Quantity>(quantity: Q, valueSI: number, unit: UnitOf<Q>): number {
  const definition = findUnit(quantity, unit);
  return valueSI / definition.scale - definition.offset;
}
