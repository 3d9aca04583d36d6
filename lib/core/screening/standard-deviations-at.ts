import type { InstrumentUncertainties } from "./instrument-uncertainties";
import type { OperatingPoint } from "./types";

/**
 * standardDeviationsAt: the standard deviation of each reading of an operating point, in vector order (hotIn,
 * hotOut, coldIn, coldOut in K; hotFlow, coldFlow in kg/s = relative uncertainty × |reading|).
 *
 * @example standardDeviationsAt(point, uncertainties)[4] // uncertainties.hotFlow · point.hotFlowKgPerS
 */
export function standardDeviationsAt(point: OperatingPoint, uncertainties: InstrumentUncertainties): number[] {
  return [
    uncertainties.hotIn,
    uncertainties.hotOut,
    uncertainties.coldIn,
    uncertainties.coldOut,
    uncertainties.hotFlow * Math.abs(point.hotFlowKgPerS),
    uncertainties.coldFlow * Math.abs(point.coldFlowKgPerS),
  ];
}
