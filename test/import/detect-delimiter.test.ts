import { describe, expect, it } from "vitest";
import { detectDecimalMark } from "../../lib/import/detect-decimal-mark";
import { detectDelimiter } from "../../lib/import/detect-delimiter";
import { splitCsvSample } from "../../lib/import/split-csv-sample";

describe("detectDelimiter", () => {
  it("finds comma, semicolon and tab from the header and the first rows", () => {
    // each sample is written with the delimiter expected
    expect(detectDelimiter("timestamp,a,b\n2026-03-01T10:00Z,1.5,2\n")).toBe(",");
    expect(detectDelimiter("timestamp;a;b\n01.03.2026 10:00;12,5;13,1\n")).toBe(";");
    expect(detectDelimiter("timestamp\ta\tb\r\n2026-03-01 10:00\t1,5\t2\r\n")).toBe("\t");
  });

  it("is not fooled by decimal commas or quoted delimiters", () => {
    // semicolon file with decimal commas: the header has no comma, so comma gives one header field
    expect(detectDelimiter('"time";"T, hot";"T, cold"\n"01.03.2026";"12,5";"13,1"\n')).toBe(";");
  });

  it("ignores a cut last line of a partial sample and falls back to comma for one column", () => {
    // a one-column file cannot be a valid import; comma lets the import name the one column it found
    expect(detectDelimiter("a;b;c\n1;2;3\n4;5", false)).toBe(";");
    expect(detectDelimiter("just one column\nvalue\n")).toBe(",");
  });
});

describe("detectDecimalMark", () => {
  it("chooses comma when the values are written 12,5", () => {
    // issue: a ";"-delimited file with "12,5" values is decimal comma
    expect(detectDecimalMark(["12,5", "13,25", "7"], ";")).toBe(",");
    expect(detectDecimalMark(["12.5", "13.25", "7"], ";")).toBe(".");
    expect(detectDecimalMark(["7", "8"], ";")).toBe(".");
  });

  it("does not count 1,234 in a comma-delimited file, which is more likely a thousands separator", () => {
    // common practice: spreadsheet exports quote grouped numbers such as "1,234" in comma-delimited files
    expect(detectDecimalMark(["1,234", "2,345"], ",")).toBe(".");
    expect(detectDecimalMark(["1,5", "2,25"], ",")).toBe(",");
  });
});

describe("splitCsvSample", () => {
  it("splits quoted fields, doubled quotes, CRLF and line breaks inside quotes, with start lines", () => {
    // RFC 4180 §2: quotes around fields, "" inside quotes is one quote, line breaks allowed inside quotes
    const records = splitCsvSample('\uFEFFa,b\r\n"x,1","say ""hi""\r\nthere"\r\n\r\n3,4', ",");
    expect(records).toEqual([
      { line: 1, fields: ["a", "b"] },
      { line: 2, fields: ["x,1", 'say "hi"\r\nthere'] },
      { line: 5, fields: ["3", "4"] },
    ]);
  });

  it("drops a record that may be cut when the text is only the start of the file", () => {
    expect(splitCsvSample("a,b\n1,2\n3,", ",", false)).toEqual([{ line: 1, fields: ["a", "b"] }, { line: 2, fields: ["1", "2"] }]);
    expect(splitCsvSample("a,b\n1,2\n", ",", false)).toHaveLength(2);
  });
});
