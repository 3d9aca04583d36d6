// The reject report of an import as CSV (line, reason), safe to open in a spreadsheet.
import { spreadsheetCsvField, spreadsheetText } from "../core/export/spreadsheet-text";
import type { RejectedRow } from "./import-errors";

/**
 * Neutralises spreadsheet formula injection: a cell starting with = + - @ tab or carriage return (and NUL, LF) is
 * prefixed with a single quote, so a spreadsheet shows it as text instead of evaluating it (OWASP, "CSV Injection").
 * Kept as a name for callers; the rule lives in lib/core/export/spreadsheet-text.ts.
 */
export const neutraliseFormula = spreadsheetText;

/** One CSV field (RFC 4180): neutralised, then quoted when it holds a comma, quote or line break, quotes doubled. */
export function csvField(cell: string): string {
  return spreadsheetCsvField(cell);
}

/** "line,reason" then one row per rejected row, CRLF line ends (RFC 4180). */
export function rejectsToCsv(rejects: readonly RejectedRow[]): string {
  const rows = ["line,reason", ...rejects.map((reject) => `${csvField(String(reject.line))},${csvField(reject.reason)}`)];
  return `${rows.join("\r\n")}\r\n`;
}
