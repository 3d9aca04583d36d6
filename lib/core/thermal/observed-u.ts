import { requirePositive } from "./input-checks";
import { meanTemperatureDifference } from "./mean-temperature-difference";
import type { ObservedU, ObservedUInput } from "./types";

/**
 * Overall heat-transfer coefficient implied by a measured duty and terminal temperatures.
 *
 * Formula: U = Q/(A·F·LMTD_cf).
 * Valid: Q > 0, A > 0, terminals valid for the arrangement (see correctionFactor).
 * Source: rate equation Q = U·A·ΔT_m, Incropera et al. (2007), 6th ed., Sect. 11.3, Eq. 11.14 (from memory).
 *
 * @returns U in W/(m²·K), the mean temperature difference F·LMTD (K), F and the counterflow LMTD (K)
 * @throws ThermalInputError "non-positive"/"not-finite" for duty or area; otherwise as correctionFactor
 * @example observedU({ dutyW: 1e6, areaM2: 100, arrangement: { kind: "counterflow" }, temperatures: { hotInK: 400, hotOutK: 350, coldInK: 300, coldOutK: 340 } })
 */
export function observedU(input: ObservedUInput): ObservedU {
  const dutyW = requirePositive(input.dutyW, "duty", "W");
  const areaM2 = requirePositive(input.areaM2, "heat-transfer area", "m²");
  const difference = meanTemperatureDifference(input.temperatures, input.arrangement);
  return {
    uWPerM2K: dutyW / (areaM2 * difference.meanK),
    meanTemperatureDifferenceK: difference.meanK,
    correctionFactor: difference.correctionFactor,
    lmtdK: difference.lmtdK,
  };
}
