import type { OperatingPoint, ReadingColumns } from "./types";

/** operatingPointAt: the six readings of sample `index` as an operating point (NaN where missing). */
export function operatingPointAt(columns: ReadingColumns, index: number): OperatingPoint {
  return {
    hotInK: columns.hotInK[index] as number,
    hotOutK: columns.hotOutK[index] as number,
    coldInK: columns.coldInK[index] as number,
    coldOutK: columns.coldOutK[index] as number,
    hotFlowKgPerS: columns.hotFlowKgPerS[index] as number,
    coldFlowKgPerS: columns.coldFlowKgPerS[index] as number,
  };
}
