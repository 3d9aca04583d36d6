import type { OperatingPoint } from "../screening/types";

/**
 * operatingPointFromVector: the inverse of operatingPointVector (order hotIn, hotOut, coldIn, coldOut, hotFlow, coldFlow).
 *
 * @throws RangeError unless the vector has six entries.
 */
export function operatingPointFromVector(vector: readonly number[]): OperatingPoint {
  if (vector.length !== 6) throw new RangeError(`an operating point has six values, got ${vector.length}`);
  return {
    hotInK: vector[0] as number,
    hotOutK: vector[1] as number,
    coldInK: vector[2] as number,
    coldOutK: vector[3] as number,
    hotFlowKgPerS: vector[4] as number,
    coldFlowKgPerS: vector[5] as number,
  };
}
