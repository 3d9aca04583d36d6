import { requirePositive } from "./input-checks";
import { specificHeat } from "./specific-heat";
import type { HeatCapacity } from "./types";

/**
 * Integral-mean specific heat between two temperatures, so that m·meanCp·|Δ T| is the stream's enthalpy change.
 *
 * Formula: c̄ = (1/(T2 − T1))·∫ cp dT from T1 to T2 = a + b·(T1 + T2)/2 for cp = a + b·T (and cp(T1) when T1 = T2);
 * for water the integral is taken by 5-point Gauss–Legendre quadrature (cp is smooth and nearly flat in the liquid
 * range, so the quadrature error is far below the property uncertainty; Abramowitz & Stegun 1964, 25.4.29).
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
  if (heatCapacity.kind === "water") {
    if (fromK === toK) return atStart;
    return gaussLegendreMean((temperatureK) => specificHeat(heatCapacity, temperatureK), fromK, toK);
  }
  // For a linear cp the integral mean equals the arithmetic mean of the end values.
  return (atStart + atEnd) / 2;
}

/** Abscissae and weights of 5-point Gauss–Legendre quadrature on [−1, 1] (Abramowitz & Stegun 1964, Table 25.4). */
const GAUSS_LEGENDRE_5: ReadonlyArray<readonly [number, number]> = [
  [0, 128 / 225],
  [Math.sqrt(5 - 2 * Math.sqrt(10 / 7)) / 3, (322 + 13 * Math.sqrt(70)) / 900],
  [-Math.sqrt(5 - 2 * Math.sqrt(10 / 7)) / 3, (322 + 13 * Math.sqrt(70)) / 900],
  [Math.sqrt(5 + 2 * Math.sqrt(10 / 7)) / 3, (322 - 13 * Math.sqrt(70)) / 900],
  [-Math.sqrt(5 + 2 * Math.sqrt(10 / 7)) / 3, (322 - 13 * Math.sqrt(70)) / 900],
];

function gaussLegendreMean(integrand: (x: number) => number, from: number, to: number): number {
  const half = (to - from) / 2;
  const middle = (to + from) / 2;
  let sum = 0;
  for (const [abscissa, weight] of GAUSS_LEGENDRE_5) sum += weight * integrand(middle + half * abscissa);
  // (1/(b − a))·∫ = (1/2)·Σ wᵢ f(xᵢ)
  return sum / 2;
}
