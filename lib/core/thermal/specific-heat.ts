import { waterSpecificHeat } from "../fluids/water-specific-heat";
import { ThermalInputError } from "./errors";
import { requireFinite, requirePositive } from "./input-checks";
import type { HeatCapacity } from "./types";

/**
 * Specific heat of a stream at an absolute temperature.
 *
 * Formula: cp(T) = c (constant) or cp(T) = a + b·T (linear), T in kelvin; liquid water: IAPWS-IF97 Region 1 at
 * the stated pressure (waterSpecificHeat).
 * Valid: T > 0 K; the linear form only over the range its coefficients were fitted for, and only where cp(T) > 0;
 * water from 273.15 K to saturation at its pressure (at most 623.15 K).
 * Source: definition; no fitted coefficients are built in (callers supply a fit valid for their fluid); water:
 * IAPWS R7-97(2012).
 *
 * @param heatCapacity constant or linear specific heat, J/(kg·K) and J/(kg·K²)
 * @param temperatureK absolute temperature, K, finite and positive
 * @returns specific heat, J/(kg·K), always positive
 * @throws ThermalInputError "not-finite" for non-finite input, "non-positive" for T ≤ 0 K or cp(T) ≤ 0,
 *   "out-of-range" for water outside its liquid range
 * @example specificHeat({ kind: "linear", interceptJPerKgK: 1000, slopeJPerKgK2: 2 }, 400) // 1800
 */
export function specificHeat(heatCapacity: HeatCapacity, temperatureK: number): number {
  requirePositive(temperatureK, "temperature", "K");
  if (heatCapacity.kind === "constant") {
    return requirePositive(heatCapacity.jPerKgK, "specific heat", "J/(kg·K)");
  }
  if (heatCapacity.kind === "water") {
    requirePositive(heatCapacity.pressurePa, "water pressure", "Pa");
    try {
      return waterSpecificHeat(temperatureK, heatCapacity.pressurePa);
    } catch (error) {
      throw new ThermalInputError("temperature", temperatureK, "out-of-range", (error as Error).message);
    }
  }
  requireFinite(heatCapacity.interceptJPerKgK, "specific heat intercept", "J/(kg·K)");
  requireFinite(heatCapacity.slopeJPerKgK2, "specific heat slope", "J/(kg·K²)");
  const value = heatCapacity.interceptJPerKgK + heatCapacity.slopeJPerKgK2 * temperatureK;
  if (!(value > 0)) {
    throw new ThermalInputError(
      "specific heat",
      value,
      "non-positive",
      `specific heat at ${temperatureK} K must be positive, got ${value} J/(kg·K)`,
    );
  }
  return value;
}
