import type { OperatingPoint } from "../screening/types";

/** Vector order used by the reconciliation: hotIn, hotOut, coldIn, coldOut, hotFlow, coldFlow (INSTRUMENT_ROLES). */
export const OPERATING_POINT_KEYS = ["hotInK", "hotOutK", "coldInK", "coldOutK", "hotFlowKgPerS", "coldFlowKgPerS"] as const;

/**
 * operatingPointVector: an operating point as a six-vector, or (given a vector) back to an operating point.
 *
 * @example operatingPointVector({ hotInK: 400, hotOutK: 350, coldInK: 300, coldOutK: 330, hotFlowKgPerS: 2, coldFlowKgPerS: 3 }) // [400, 350, 300, 330, 2, 3]
 */
export function operatingPointVector(point: OperatingPoint): [number, number, number, number, number, number] {
  return [point.hotInK, point.hotOutK, point.coldInK, point.coldOutK, point.hotFlowKgPerS, point.coldFlowKgPerS];
}
