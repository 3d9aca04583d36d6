import type { InstrumentRole, ReadingColumns } from "./types";

/** Column of ReadingColumns that holds each instrument role's readings. */
export const ROLE_COLUMN_KEYS: Readonly<Record<InstrumentRole, Exclude<keyof ReadingColumns, "timeMs">>> = {
  hotIn: "hotInK",
  hotOut: "hotOutK",
  coldIn: "coldInK",
  coldOut: "coldOutK",
  hotFlow: "hotFlowKgPerS",
  coldFlow: "coldFlowKgPerS",
};

/**
 * roleColumn: the readings of one instrument role (the column itself, not a copy; callers must not write to it).
 *
 * @example roleColumn(columns, "coldOut") // columns.coldOutK
 */
export function roleColumn(columns: ReadingColumns, role: InstrumentRole): Float64Array {
  return columns[ROLE_COLUMN_KEYS[role]];
}
