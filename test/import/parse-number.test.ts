import { describe, expect, it } from "vitest";
import { isMissingValue, MISSING_VALUE_MARKERS } from "../../lib/import/missing-values";
import { parseNumber } from "../../lib/import/parse-number";

describe("parseNumber", () => {
  it("reads numbers with the file's decimal mark, signs and exponents", () => {
    // decimal notation with one decimal mark (ISO 80000-1 §7.3.2 allows point or comma)
    expect(parseNumber("12.5", ".")).toEqual({ kind: "number", value: 12.5 });
    expect(parseNumber(" -3 ", ".")).toEqual({ kind: "number", value: -3 });
    expect(parseNumber("1.5e3", ".")).toEqual({ kind: "number", value: 1500 });
    expect(parseNumber("12,5", ",")).toEqual({ kind: "number", value: 12.5 });
    expect(parseNumber(",5", ",")).toEqual({ kind: "number", value: 0.5 });
  });

  it("treats empty cells and historian or spreadsheet markers as missing", () => {
    // documented list MISSING_VALUE_MARKERS (lib/import/missing-values.ts)
    for (const cell of ["", "  ", "NaN", "null", "#N/A", "Bad", "I/O Timeout", "Comm Fail", "#DIV/0!", "-"]) {
      expect(parseNumber(cell, ".")).toEqual({ kind: "missing" });
    }
    expect(MISSING_VALUE_MARKERS).toContain("scan off");
    expect(isMissingValue(" SHUTDOWN ")).toBe(true);
  });

  it("calls everything else invalid: text, the other decimal mark, thousands separators, infinities", () => {
    // one decimal mark per file, no grouping (docs/import.md)
    for (const cell of ["abc", "12,5", "1,234.5", "Infinity", "0x10", "1e999", "12.5.1"]) {
      expect(parseNumber(cell, ".")).toEqual({ kind: "invalid" });
    }
    expect(parseNumber("12.5", ",")).toEqual({ kind: "invalid" });
  });
});
