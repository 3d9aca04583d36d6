// The reject report of an import as CSV (line, reason), safe to open in a spreadsheet.
import type { RejectedRow } from "./import-errors";

const FORMULA_START = /^[=+\-@\t\r]/;

/**
 * Neutralises spreadsheet formula injection: a cell starting with = + - @ tab or carriage return is prefixed with a
 * single quote, so a spreadsheet shows it as text instead of evaluating it (OWASP, "CSV Injection").
 */
export function neutraliseFormula(cell: string): string {
  return FORMULA_START.test(cell) ? `'${cell}` : cell;
}

/** One CSV field (RFC 4180): quoted when it holds a comma, quote or line break, quotes doubled. */
export function csvField(cell: string): string {
  const safe = neutraliseFormula(cell);
  return /[",\r\n]/.test(safe) ? `"${safe.replaceAll('"', '""')}"` : safe;
}

/** "line,reason" then one row per rejected row, CRLF line ends (RFC 4180). */
export function rejectsToCsv(rejects: readonly RejectedRow[]): string {
  const rows = ["line,reason", ...rejects.map((reject) => `${csvField(String(reject.line))},${csvField(reject.reason)}`)];
  return `${rows.join("\r\n")}\r\n`;
}
