// Which decimal mark the numbers of a file use: point or comma.
import type { DecimalMark } from "./parse-number";

const COMMA_DECIMAL = /^[+-]?\d+,\d+$/;
const COMMA_GROUPING = /^[+-]?\d{1,3},\d{3}$/;
const POINT_DECIMAL = /^[+-]?\d*\.\d+(?:[eE][+-]?\d+)?$/;

/**
 * Detects the decimal mark from value cells of the first rows (the measured columns, not the timestamps): cells
 * like "12,5" count for comma, cells like "12.5" for point, and the larger count wins ("." when neither appears or
 * on a tie). In a comma-delimited file a comma can only sit inside a quoted field, and "1,234" there is more
 * likely a thousands separator than a decimal comma, so such cells (exactly three digits after the comma) do not
 * count. A ";"- or tab-delimited file with "12,5" values is therefore decimal comma.
 */
export function detectDecimalMark(cells: readonly string[], delimiter: string): DecimalMark {
  let comma = 0;
  let point = 0;
  for (const cell of cells) {
    const text = cell.trim();
    if (POINT_DECIMAL.test(text)) point += 1;
    else if (COMMA_DECIMAL.test(text) && !(delimiter === "," && COMMA_GROUPING.test(text))) comma += 1;
  }
  return comma > point ? "," : ".";
}
