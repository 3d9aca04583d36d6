// User-entered text made safe for spreadsheet exports (CSV and XLSX): no cell can start a formula. Pure; the
// core (plan CSV) and the presentation layer (chart CSV, reject reports, XLSX) share this one rule.

/**
 * First characters that make a spreadsheet read a text cell as a formula or start one: = + - @ tab and carriage
 * return (OWASP, "CSV Injection", community page), the NUL character (OWASP ASVS 5.0 requirement 1.2.10 adds \0)
 * and, as a precaution of ours (no source), line feed, the other line-break character next to carriage return.
 */
export const FORMULA_TRIGGERS: readonly string[] = ["=", "+", "-", "@", "\t", "\r", "\n", "\0"];

/**
 * spreadsheetText: one text cell as a spreadsheet must show it, never evaluate it. Text whose first character is
 * one of FORMULA_TRIGGERS gets a single quote in front (OWASP, "CSV Injection": "prepend each cell field with a
 * single quote"); other text is returned as it is. For XLSX string cells and as the first step of a CSV field.
 * Apply it to user-entered text only: numbers belong in number cells (a negative number is not a formula).
 *
 * @example spreadsheetText("=HYPERLINK(\"http://x\")") // "'=HYPERLINK(\"http://x\")"
 */
export function spreadsheetText(text: string): string {
  return text.length > 0 && FORMULA_TRIGGERS.includes(text.charAt(0)) ? `'${text}` : text;
}

/**
 * spreadsheetCsvField: one CSV field of user-entered text: neutralised by spreadsheetText, then quoted per
 * RFC 4180 §2 (rules 6 and 7): a field holding a comma, a double quote, CR or LF is enclosed in double quotes and
 * each double quote inside is doubled. `delimiter` is the file's field separator (";" and tab files need their own
 * separator quoted).
 *
 * @example spreadsheetCsvField('say "hi", twice') // "\"say \"\"hi\"\", twice\""
 */
export function spreadsheetCsvField(text: string, delimiter = ","): string {
  const safe = spreadsheetText(text);
  return safe.includes(delimiter) || /[",\r\n]/.test(safe) ? `"${safe.replaceAll('"', '""')}"` : safe;
}
