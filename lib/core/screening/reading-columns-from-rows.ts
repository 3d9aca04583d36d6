import type { ReadingColumns } from "./types";

/** A row as the database or the importer gives it: null where a value is missing. */
export interface ReadingRow {
  timeMs: number;
  hotInK: number | null;
  hotOutK: number | null;
  coldInK: number | null;
  coldOutK: number | null;
  hotFlowKgPerS: number | null;
  coldFlowKgPerS: number | null;
}

function valueOrNaN(value: number | null | undefined): number {
  return value === null || value === undefined || !Number.isFinite(value) ? Number.NaN : value;
}

/**
 * readingColumnsFromRows: row objects to column arrays (NaN for null, undefined or non-finite values), sorted by time.
 *
 * Rows are sorted by timeMs (stable); when several rows share a time the last one wins, so a re-imported value
 * replaces the old one. Rows with a non-finite time are dropped.
 *
 * @param rows readings, any order; not modified.
 * @returns columns of equal length, strictly increasing in time.
 * @example readingColumnsFromRows([{ timeMs: 0, hotInK: 400, hotOutK: null, ... }]).hotOutK[0] // NaN
 */
export function readingColumnsFromRows(rows: readonly ReadingRow[]): ReadingColumns {
  const order: number[] = [];
  for (let index = 0; index < rows.length; index += 1) {
    if (Number.isFinite((rows[index] as ReadingRow).timeMs)) order.push(index);
  }
  order.sort((a, b) => (rows[a] as ReadingRow).timeMs - (rows[b] as ReadingRow).timeMs || a - b);
  const kept: number[] = [];
  for (let position = 0; position < order.length; position += 1) {
    const index = order[position] as number;
    const next = order[position + 1];
    if (next !== undefined && (rows[next] as ReadingRow).timeMs === (rows[index] as ReadingRow).timeMs) continue;
    kept.push(index);
  }
  const count = kept.length;
  const columns: ReadingColumns = {
    timeMs: new Float64Array(count),
    hotInK: new Float64Array(count),
    hotOutK: new Float64Array(count),
    coldInK: new Float64Array(count),
    coldOutK: new Float64Array(count),
    hotFlowKgPerS: new Float64Array(count),
    coldFlowKgPerS: new Float64Array(count),
  };
  for (let position = 0; position < count; position += 1) {
    const row = rows[kept[position] as number] as ReadingRow;
    columns.timeMs[position] = row.timeMs;
    columns.hotInK[position] = valueOrNaN(row.hotInK);
    columns.hotOutK[position] = valueOrNaN(row.hotOutK);
    columns.coldInK[position] = valueOrNaN(row.coldInK);
    columns.coldOutK[position] = valueOrNaN(row.coldOutK);
    columns.hotFlowKgPerS[position] = valueOrNaN(row.hotFlowKgPerS);
    columns.coldFlowKgPerS[position] = valueOrNaN(row.coldFlowKgPerS);
  }
  return columns;
}
