import { requirePositive } from "./input-checks";
import { specificHeat } from "./specific-heat";
import type { HeatCapacity } from "./types";

/**
 * Integral-mean specific heat between two temperatures, so that m·meanCp·|Δ T| is the stream's enthalpy change.
 *
 * Formula: c̄ = (1/(T2 − T1))·∫ cp dT from T1 to T2 = a + b·(T1 + T2)/2 for cp = a + b·T (and cp(T1) when T1 = T2).
 * Valid: T1, T2 > 0 K with cp positive at both ends (then, being linear, positive in between).
 * Source: definition of the mean heat capacity (e.g. Smith, Van Ness & Abbott 2005, Introduction to Chemical
 * Engineering Thermodynamics, 7th ed., Sect. 4.1, mean heat capacity; from memory).
 *
 * @param heatCapacity constant or linear specific heat
 * @param fromK start temperature, K
 * @param toK end temperature, K (may be below fromK)
 * @returns mean specific heat, J/(kg·K)
 * @throws ThermalInputError "not-finite" / "non-positive" for bad temperatures or cp ≤ 0 at either end
 * @example meanSpecificHeat({ kind: "linear", interceptJPerKgK: 1000, slopeJPerKgK2: 2 }, 300, 500) // 1800
 */
export function meanSpecificHeat(heatCapacity: HeatCapacity, fromK: number, toK: number): number {
  requirePositive(fromK, "start temperature", "K");
  requirePositive(toK, "end temperature", "K");
  const atStart = specificHeat(heatCapacity, fromK);
  const atEnd = specificHeat(heatCapacity, toK);
  if (heatCapacity.kind === "constant") {
    return atStart;
  }
  // For a linear cp the integral mean equals the arithmetic mean of the end values.
  return (atStart + atEnd) / 2;
}
