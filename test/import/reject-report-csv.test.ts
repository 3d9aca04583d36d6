import { describe, expect, it } from "vitest";
import { csvField, neutraliseFormula, rejectsToCsv } from "../../lib/import/reject-report-csv";

describe("neutraliseFormula", () => {
  it("prefixes cells a spreadsheet would evaluate with a single quote", () => {
    // OWASP "CSV Injection": cells starting with = + - @ tab or carriage return
    for (const cell of ["=1+1", "+1", "-2", "@SUM(A1)", "\tx", "\rx"]) expect(neutraliseFormula(cell)).toBe(`'${cell}`);
    expect(neutraliseFormula("line 3: ok")).toBe("line 3: ok");
  });
});

describe("rejectsToCsv", () => {
  it("writes line and reason, quoting per RFC 4180 after neutralising formulas", () => {
    // RFC 4180 §2: fields with commas, quotes or line breaks are quoted, quotes doubled
    expect(csvField('say "hi", twice')).toBe('"say ""hi"", twice"');
    expect(rejectsToCsv([
      { line: 17, reason: 'timestamp "2026-13-01 10:00" does not match DD/MM/YYYY HH:mm[:ss]' },
      { line: 18, reason: "=HYPERLINK(\"http://x\")" },
    ])).toBe('line,reason\r\n17,"timestamp ""2026-13-01 10:00"" does not match DD/MM/YYYY HH:mm[:ss]"\r\n18,"\'=HYPERLINK(""http://x"")"\r\n');
  });
});
