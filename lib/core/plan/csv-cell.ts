import { spreadsheetCsvField } from "../export/spreadsheet-text";

/**
 * csvCell: one CSV field: numbers as written by JavaScript (non-finite and null become empty), text neutralised
 * against formula injection and quoted per RFC 4180 (spreadsheetCsvField).
 */
export function csvCell(value: string | number | null): string {
  if (value === null) return "";
  if (typeof value === "number") return Number.isFinite(value) ? String(value) : "";
  return spreadsheetCsvField(value);
}
