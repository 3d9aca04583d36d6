/** Characters that make a spreadsheet read a text cell as a formula (OWASP CSV injection guidance). */
const FORMULA_TRIGGERS = new Set(["=", "+", "-", "@", "\t", "\r"]);

/**
 * csvCell: one CSV field: numbers as written by JavaScript (non-finite and null become empty), text neutralised
 * against formula injection (a single quote is put before text starting with = + - @ tab or CR) and quoted per
 * RFC 4180 when it holds a comma, quote, CR or LF (quotes doubled).
 *
 * Source: RFC 4180 (Shafranovich 2005) §2 for quoting; OWASP, "CSV Injection" (owasp.org community page) for the
 * trigger characters and the leading single quote (from memory).
 */
export function csvCell(value: string | number | null): string {
  if (value === null) return "";
  if (typeof value === "number") return Number.isFinite(value) ? String(value) : "";
  const neutral = FORMULA_TRIGGERS.has(value.charAt(0)) ? `'${value}` : value;
  return /[",\r\n]/.test(neutral) ? `"${neutral.replace(/"/g, '""')}"` : neutral;
}
