import type { CleanModelParameters } from "./types";

/**
 * cleanResistance: 1/U_clean of the grey-box model at given flows.
 *
 * Formula: 1/U_clean = a_h·(m_h/m_h,ref)^(−n_h) + a_c·(m_c/m_c,ref)^(−n_c) + R_w.
 * Valid: positive flows in turbulent flow (film coefficients ∝ flow^0.8, Dittus–Boelter Re ≥ 1e4, 0.6 ≤ Pr ≤ 160);
 * property changes with temperature are not modelled. Resistances on one area basis.
 * Source: Wilson (1915), Trans. ASME 37:47–82 (resistances in series, film ∝ velocity^−n, from memory);
 * Dittus & Boelter (1930) via FIELD-NOTES §4.
 *
 * @param parameters film resistances at the reference flows, exponents, wall resistance, reference flows
 * @param hotFlowKgPerS > 0
 * @param coldFlowKgPerS > 0
 * @returns m²·K/W
 * @throws RangeError for a non-positive flow
 * @example cleanResistance(p, p.hotFlowRefKgPerS, p.coldFlowRefKgPerS) // a_h + a_c + R_w
 */
export function cleanResistance(parameters: CleanModelParameters, hotFlowKgPerS: number, coldFlowKgPerS: number): number {
  if (!(hotFlowKgPerS > 0) || !(coldFlowKgPerS > 0)) {
    throw new RangeError(`cleanResistance: flows must be positive, got hot ${hotFlowKgPerS} kg/s, cold ${coldFlowKgPerS} kg/s`);
  }
  return (
    parameters.hotFilmResistanceRefM2KPerW * Math.pow(hotFlowKgPerS / parameters.hotFlowRefKgPerS, -parameters.exponentHot) +
    parameters.coldFilmResistanceRefM2KPerW * Math.pow(coldFlowKgPerS / parameters.coldFlowRefKgPerS, -parameters.exponentCold) +
    parameters.wallResistanceM2KPerW
  );
}
