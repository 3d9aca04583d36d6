import type { CleanCoefficientParameters } from "./types";

/**
 * cleanOverallCoefficient: clean overall heat-transfer coefficient at the given flows.
 *
 * 1/U_clean = R_hot,ref·(mh/mh_ref)^(−n_hot) + R_cold,ref·(mc/mc_ref)^(−n_cold) + R_wall
 * Film coefficients scale as flow^0.8 in turbulent pipe flow (Dittus–Boelter, Nu = 0.023 Re^0.8 Pr^n,
 * valid for Re ≥ 1e4, 0.6 ≤ Pr ≤ 160; FIELD-NOTES §4), so film resistances scale as flow^−0.8.
 * Outside turbulent flow (very low flows in shutdowns) the form is kept as a smooth extrapolation.
 *
 * @param parameters film resistances at the reference flows (m²·K/W), wall resistance, exponents, reference flows.
 * @param hotFlowKgPerS hot stream mass flow, > 0.
 * @param coldFlowKgPerS cold stream mass flow, > 0.
 * @throws if a flow is not positive.
 * @returns U_clean in W/(m²·K).
 * @example cleanOverallCoefficient(parameters, parameters.hotFlowRefKgPerS, parameters.coldFlowRefKgPerS)
 *   // = 1 / (hot film + cold film + wall resistance)
 */
export function cleanOverallCoefficient(
  parameters: CleanCoefficientParameters,
  hotFlowKgPerS: number,
  coldFlowKgPerS: number,
): number {
  if (!(hotFlowKgPerS > 0) || !(coldFlowKgPerS > 0)) {
    throw new Error(`cleanOverallCoefficient: flows must be positive, got hot ${hotFlowKgPerS}, cold ${coldFlowKgPerS}`);
  }
  const hotFilm = parameters.hotFilmResistanceRefM2KPerW * Math.pow(hotFlowKgPerS / parameters.hotFlowRefKgPerS, -parameters.exponentHot);
  const coldFilm = parameters.coldFilmResistanceRefM2KPerW * Math.pow(coldFlowKgPerS / parameters.coldFlowRefKgPerS, -parameters.exponentCold);
  return 1 / (hotFilm + coldFilm + parameters.wallResistanceM2KPerW);
}
