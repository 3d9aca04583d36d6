import { referenceDuty, type CleanCoefficientParameters, type ExchangerSpec } from "../core/simulate";

/**
 * criticalFouling: the fouling resistance at which the duty at reference conditions equals the threshold.
 *
 * The duty at reference conditions decreases monotonically with Rf, so the root is found by bisection on
 * Rf in [0, 1] m²·K/W to a relative width of 1e-12.
 *
 * @param spec exchanger spec with dutyThresholdW.
 * @param cleanCoefficient true clean-U parameters.
 * @throws if the clean exchanger is already below the threshold.
 * @returns Rf in m²·K/W.
 */
export function criticalFouling(spec: ExchangerSpec, cleanCoefficient: CleanCoefficientParameters): number {
  if (referenceDuty(spec, cleanCoefficient, 0) < spec.dutyThresholdW) {
    throw new Error(`criticalFouling: ${spec.tag} is below its threshold even when clean`);
  }
  let low = 0;
  let high = 1;
  while (high - low > 1e-12 * high) {
    const middle = 0.5 * (low + high);
    if (referenceDuty(spec, cleanCoefficient, middle) < spec.dutyThresholdW) high = middle;
    else low = middle;
  }
  return 0.5 * (low + high);
}
