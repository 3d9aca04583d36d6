import { parse } from "csv-parse/sync";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { rejectsToCsv } from "../../lib/import/reject-report-csv";
import { FORMULA_TRIGGERS, spreadsheetCsvField, spreadsheetText } from "../../lib/core/export/spreadsheet-text";

// Text biased towards the characters that matter: formula triggers, delimiters, quotes and line breaks.
const dangerous = fc.constantFrom("=", "+", "-", "@", "\t", "\r", "\n", "\0", ",", ";", '"', "'", " ", "A1", "cmd|' /C calc'!A0", "HYPERLINK(", "SUM(1,2)", "é", "😀");
const cellText = fc.oneof(fc.string({ unit: "grapheme", maxLength: 30 }), fc.array(dangerous, { maxLength: 10 }).map((parts) => parts.join("")));

describe("spreadsheetText", () => {
  it("prefixes a single quote to text starting with a formula trigger and leaves other text alone", () => {
    // OWASP, "CSV Injection": = + - @ tab (0x09) carriage return (0x0D); OWASP ASVS 5.0 1.2.10: also NUL (\0)
    for (const cell of ["=1+1", "+1", "-2", "@SUM(A1)", "\tx", "\rx", "\0x", "=cmd|' /C calc'!A0"]) expect(spreadsheetText(cell)).toBe(`'${cell}`);
    for (const cell of ["", "line 3: ok", "'=already quoted", " =1+1", "1-2", "a=b"]) expect(spreadsheetText(cell)).toBe(cell);
  });

  it("never returns text that starts with a trigger, and changes text only by one leading quote", () => {
    fc.assert(
      fc.property(cellText, (text) => {
        const safe = spreadsheetText(text);
        expect(FORMULA_TRIGGERS.includes(safe.charAt(0))).toBe(false);
        expect(safe === text || safe === `'${text}`).toBe(true);
        // idempotent: neutralising twice adds nothing
        expect(spreadsheetText(safe)).toBe(safe);
      }),
      { numRuns: 2000 },
    );
  });
});

describe("spreadsheetCsvField", () => {
  it("quotes per RFC 4180 §2 rules 6-7: comma, quote, CR or LF inside means quoted with quotes doubled", () => {
    // RFC 4180 §2.7: "a double-quote appearing inside a field must be escaped by preceding it with another double quote"
    expect(spreadsheetCsvField('say "hi", twice')).toBe('"say ""hi"", twice"');
    expect(spreadsheetCsvField("two\r\nlines")).toBe('"two\r\nlines"');
    expect(spreadsheetCsvField("plain")).toBe("plain");
    expect(spreadsheetCsvField("a;b", ";")).toBe('"a;b"');
    // OWASP first, RFC 4180 second: the quote goes inside the enclosing double quotes
    expect(spreadsheetCsvField('=HYPERLINK("http://x")')).toBe('"\'=HYPERLINK(""http://x"")"');
  });

  it("reads back through an independent RFC 4180 parser (csv-parse) as the neutralised text, field count intact", () => {
    fc.assert(
      fc.property(fc.array(cellText, { minLength: 1, maxLength: 6 }), fc.constantFrom(",", ";"), (cells, delimiter) => {
        const line = cells.map((cell) => spreadsheetCsvField(cell, delimiter)).join(delimiter);
        const records = parse(`${line}\r\n`, { delimiter, relax_column_count: false, bom: false, record_delimiter: ["\r\n"] }) as string[][];
        expect(records).toEqual([cells.map(spreadsheetText)]);
      }),
      { numRuns: 2000 },
    );
  });
});

describe("rejectsToCsv (reject report download and CLI --rejects)", () => {
  it("gives line,reason records whose reason cells never start a formula, whatever the reasons say", () => {
    fc.assert(
      fc.property(fc.array(fc.record({ line: fc.nat({ max: 1e7 }), reason: cellText }), { maxLength: 20 }), (rejects) => {
        const records = parse(rejectsToCsv(rejects), { record_delimiter: ["\r\n"] }) as string[][];
        expect(records[0]).toEqual(["line", "reason"]);
        expect(records.slice(1)).toEqual(rejects.map((reject) => [String(reject.line), spreadsheetText(reject.reason)]));
        for (const record of records) for (const cell of record) expect(FORMULA_TRIGGERS.includes(cell.charAt(0))).toBe(false);
      }),
      { numRuns: 1000 },
    );
  });
});
