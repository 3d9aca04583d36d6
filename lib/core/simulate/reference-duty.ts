import { rate } from "../thermal";
import { cleanOverallCoefficient } from "./clean-overall-coefficient";
import type { CleanCoefficientParameters, ExchangerSpec } from "./types";

/**
 * referenceDuty: duty at the spec's reference conditions (inlet temperatures and flows) for a given
 * fouling resistance, rated with the thermal core's effectiveness–NTU `rate`.
 *
 * U = 1 / (1/U_clean(reference flows) + Rf)
 *
 * @param spec exchanger spec (area, arrangement, streams, reference conditions).
 * @param cleanCoefficient true clean-U parameters.
 * @param foulingM2KPerW fouling resistance, >= 0.
 * @returns duty in W.
 */
export function referenceDuty(
  spec: ExchangerSpec,
  cleanCoefficient: CleanCoefficientParameters,
  foulingM2KPerW: number,
): number {
  const reference = spec.reference;
  const cleanU = cleanOverallCoefficient(cleanCoefficient, reference.hotFlowKgPerS, reference.coldFlowKgPerS);
  return rate({
    uWPerM2K: 1 / (1 / cleanU + foulingM2KPerW),
    areaM2: spec.areaM2,
    arrangement: spec.arrangement,
    hot: { massFlowKgPerS: reference.hotFlowKgPerS, heatCapacity: spec.hotStream.heatCapacity, inletK: reference.hotInletK },
    cold: { massFlowKgPerS: reference.coldFlowKgPerS, heatCapacity: spec.coldStream.heatCapacity, inletK: reference.coldInletK },
  }).dutyW;
}
