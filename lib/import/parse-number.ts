// Reading numbers from cells: one decimal mark per file, no thousands separators, optional exponent.
import { isMissingValue } from "./missing-values";

export type DecimalMark = "." | ",";

export type NumberCell = { kind: "number"; value: number } | { kind: "missing" } | { kind: "invalid" };

const POINT_NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
const COMMA_NUMBER = /^[+-]?(?:\d+,?\d*|,\d+)(?:[eE][+-]?\d+)?$/;

const MISSING: NumberCell = { kind: "missing" };
const INVALID: NumberCell = { kind: "invalid" };

/**
 * Reads a cell as a number with the given decimal mark: "12.5" / "12,5", "-3", "1.5e3"; surrounding blanks are
 * ignored. Empty cells and MISSING_VALUE_MARKERS are "missing"; anything else that is not such a number (text,
 * "1,234.5" with a thousands separator, "Infinity", "0x10") is "invalid".
 *
 * @example parseNumber("12,5", ",") // { kind: "number", value: 12.5 }
 */
export function parseNumber(cell: string, decimalMark: DecimalMark): NumberCell {
  const text = cell.trim();
  let value = Number.NaN;
  if (decimalMark === ".") {
    if (POINT_NUMBER.test(text)) value = Number(text);
  } else if (COMMA_NUMBER.test(text)) {
    value = Number(text.replace(",", "."));
  }
  // A finite result only: "1e999" overflows to Infinity and is not a reading.
  if (Number.isFinite(value)) return { kind: "number", value };
  return isMissingValue(text) ? MISSING : INVALID;
}
