import fs from "node:fs";
import path from "node:path";

/**
 * Reads the (y, x) pairs of a NIST StRD file from the shared reference data (see its README): the data block
 * follows the last line that starts with "Data:" and names the columns; parsing by marker, not line number.
 * Path relative to the repository root, which is the test working directory.
 */
export function readStrd(file: string): { y: number[]; x: number[] } {
  const text = fs.readFileSync(path.resolve("..", "shared", "reference-data", "nist-strd", file), "utf8");
  const lines = text.split(/\r?\n/);
  let start = -1;
  lines.forEach((line, index) => {
    if (/^Data:\s+y\s+x\s*$/.test(line.trimEnd())) start = index + 1;
  });
  if (start < 0) throw new Error(`${file}: no "Data:   y   x" marker`);
  const y: number[] = [];
  const x: number[] = [];
  for (const line of lines.slice(start)) {
    const fields = line.trim().split(/\s+/).filter((field) => field.length > 0);
    if (fields.length !== 2) continue;
    y.push(Number(fields[0]));
    x.push(Number(fields[1]));
  }
  return { y, x };
}

/** Number of agreeing significant digits, −log10(|a − b|/|b|) (LRE of McCullough 1998, Am. Stat. 52:358). */
export function significantDigits(actual: number, certified: number): number {
  if (actual === certified) return 17;
  return -Math.log10(Math.abs(actual - certified) / Math.abs(certified));
}
