import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { ImportFailure, ImportRefusal } from "../../lib/import/import-errors";
import { columnMappingSchema } from "../../lib/validation/column-mapping";
import { CANONICAL_HEADER } from "./support/fixtures";
import { readText, refusalOf } from "./support/read-text";

const HEADER = CANONICAL_HEADER;

function row(minute: number, hotIn = "150"): string {
  return `2026-03-01T10:${String(minute).padStart(2, "0")}:00Z,${hotIn},90,25,60,10,12.5`;
}

function file(count: number, lineEnd = "\n"): string {
  return [HEADER, ...Array.from({ length: count }, (_, index) => row(index))].join(lineEnd) + lineEnd;
}

describe("ReadingsCsvReader", () => {
  it("reads a BOM, CRLF, quoted fields with line breaks, blank and trailing lines, and lists extra columns", async () => {
    // physical lines: 1 header, 2 row, 3–4 one row (quoted line break), 5 blank, 6 row, 7 empty fields only, 8–9 blank
    const text = `\uFEFF${HEADER},note\r\n${row(0)},plain\r\n${row(1)},"two\r\nlines"\r\n\r\n"2026-03-01T10:02:00Z","150",90,25,60,10,12.5,\r\n,,,,,,,\r\n\r\n\r\n`;
    const { reader, rows } = await readText(text);
    expect(rows.map((reading) => reading.line)).toEqual([2, 3, 6]);
    expect(reader.rowsRead).toBe(3);
    expect(reader.ignoredColumns).toEqual(["note"]);
    // 150 °C = 423.15 K; NIST SP 811 B.9
    expect(rows[2]?.values.hotIn).toBeCloseTo(423.15, 12);
    expect(rows[2]?.values.hotPressureDrop).toBeNull();
    expect(reader.settings).toMatchObject({ delimiter: ",", decimalMark: ".", timestampFormat: "iso", mappingSource: "canonical" });
  });

  it("gives every rejected row its physical line and reason, and keeps the rest", async () => {
    // reasons as specified in the issue
    const text = [HEADER, row(0), row(1, "abc"), row(1), row(0), `${row(2).replace(",10,", ",-3.2,")}`, "2026-03-01T10:03Z,,NaN,#N/A,Bad,I/O Timeout,", row(4).slice(0, 30), row(5)].join("\n");
    const { reader, rows } = await readText(text, { limits: { maxRejectShare: 1 } });
    expect(rows.map((reading) => reading.line)).toEqual([2, 4, 9]);
    expect(reader.rejects).toEqual([
      { line: 3, reason: 'hot_in_C: "abc" is not a number' },
      { line: 5, reason: "timestamp earlier than line 4's; rows must be in time order" },
      { line: 6, reason: "hot_flow_kg_s = -3.2: a mass flow cannot be negative" },
      { line: 7, reason: "no measured values in the row (every mapped cell is empty or marks a missing value)" },
      { line: 8, reason: "expected 7 fields as in the header, found 4" },
    ]);
    expect(reader.rowsRejected).toBe(5);
  });

  it("reads the same rows however the bytes are cut into chunks", async () => {
    // property: chunk boundaries (inside records, quotes, CRLF pairs, multi-byte characters) never change the result
    const text = `\uFEFF${HEADER},note\r\n${Array.from({ length: 30 }, (_, index) => `${row(index)},"ü ${index}\r\n→"`).join("\r\n")}\r\n`;
    const expected = (await readText(text)).rows;
    await fc.assert(
      fc.asyncProperty(fc.integer({ min: 1, max: 97 }), async (chunkBytes) => {
        expect((await readText(text, { chunkBytes })).rows).toEqual(expected);
      }),
      { numRuns: 40 },
    );
  });

  it("reads a semicolon file with decimal commas and day-first local times in the site's zone", async () => {
    // CET = UTC+1 on 1 March 2026 (IANA tz database); 12,5 °C = 285.65 K (NIST SP 811 B.9); 36 t/h = 10 kg/s (B.8)
    const mapping = columnMappingSchema.parse({
      timestamp: { column: "Zeit" },
      columns: {
        hotIn: { column: "T1", unit: "degC" }, hotOut: { column: "T2", unit: "degC" }, coldIn: { column: "T3", unit: "degC" },
        coldOut: { column: "T4", unit: "degC" }, hotFlow: { column: "F1", unit: "t/h" }, coldFlow: { column: "F2", unit: "t/h" },
      },
    });
    const text = "Zeit;T1;T2;T3;T4;F1;F2\n01.03.2026 10:00;112,5;80,25;12,5;40;36;40,5\n01.03.2026 10:01;112,6;80,25;12,5;40;36;40,5\n";
    const { reader, rows } = await readText(text, { mapping, mappingSource: "explicit", defaultTimeZone: "Europe/Amsterdam" });
    expect(reader.settings).toMatchObject({ delimiter: ";", decimalMark: ",", timestampFormat: "DD.MM.YYYY HH:mm[:ss]", timeZone: "Europe/Amsterdam" });
    expect(rows[0]?.timeMs).toBe(Date.UTC(2026, 2, 1, 9));
    expect(rows[0]?.values.coldIn).toBeCloseTo(285.65, 12);
    expect(rows[0]?.values.hotFlow).toBeCloseTo(10, 12);
  });

  it("lists at most maxRejectsKept rejects but counts them all", async () => {
    const text = [HEADER, ...Array.from({ length: 40 }, (_, index) => row(index, index % 2 ? "x" : "150"))].join("\n");
    const { reader } = await readText(text, { limits: { maxRejectsKept: 5, maxRejectShare: 1 } });
    expect(reader.rowsRejected).toBe(20);
    expect(reader.rejects).toHaveLength(5);
  });

  it("uses canonical headers when the saved mapping does not fit and the header is canonical", async () => {
    const saved = columnMappingSchema.parse({
      timestamp: { column: "Zeit" },
      columns: Object.fromEntries(["hotIn", "hotOut", "coldIn", "coldOut"].map((role) => [role, { column: role, unit: "C" }]).concat([["hotFlow", { column: "f1", unit: "kg/s" }], ["coldFlow", { column: "f2", unit: "kg/s" }]])),
    });
    const { reader } = await readText(file(3), { mapping: saved, mappingSource: "saved", fallbackToCanonical: true });
    expect(reader.settings?.mappingSource).toBe("canonical");
    const refused = await refusalOf(file(3), { mapping: saved, mappingSource: "saved" });
    expect(refused.message).toMatch(/^no column "Zeit" \(timestamp\), "hotIn" \(hot inlet temperature, hotIn\).*\(the asset's saved column mapping was used; give a mapping for this file\)$/);
  });
});

describe("ReadingsCsvReader refusals", () => {
  it("refuses an empty file and a file with only a header", async () => {
    // message from the issue: the file has no data rows
    expect(await refusalOf("")).toEqual({ code: "empty", message: "the file has no data rows (it is empty)" });
    expect(await refusalOf("\uFEFF\r\n\r\n")).toEqual({ code: "empty", message: "the file has no data rows (it is empty)" });
    expect(await refusalOf(`${HEADER}\r\n\r\n,,,,,,\r\n`)).toEqual({ code: "empty", message: "the file has no data rows (only a header)" });
  });

  it("refuses missing columns and unknown units in the header", async () => {
    const missing = await refusalOf(file(2).replace("cold_out_C", "outlet_cold"));
    expect(missing.code).toBe("missing-columns");
    expect(missing.message).toContain("no column for cold outlet temperature (coldOut); columns found: timestamp, hot_in_C, hot_out_C, cold_in_C, outlet_cold, hot_flow_kg_s, cold_flow_kg_s");
    expect(await refusalOf(file(2).replace("hot_in_C", "hot_in_X"))).toEqual({ code: "unknown-unit", message: 'column "hot_in_X": unknown unit "X" for the hot inlet temperature; allowed: C, F, K, R' });
  });

  it("refuses a column whose values evidently are in another unit, unless the units are trusted", async () => {
    // °C values (150) in a column named as kelvin: 150 K is at the plausible minimum; use 60 °C, well below 150 K
    const text = file(5).replace("hot_in_C", "hot_in_K").replaceAll(",150,", ",60,");
    const refused = await refusalOf(text);
    expect(refused.code).toBe("implausible-unit");
    expect(refused.message).toContain('values of "hot_in_K" (hot inlet temperature) look like °C or °F, not K');
    // trusted units: every row then fails the plausible range 150–1200 K and the file is refused for its rejects
    expect((await refusalOf(text, { trustUnits: true })).code).toBe("too-many-rejects");
  });

  it("refuses a file over the size limit while reading it", async () => {
    // limit given small on purpose (FOULCAST_MAX_IMPORT_BYTES in production)
    expect(await refusalOf(file(50), { limits: { maxBytes: 500 }, chunkBytes: 100 })).toEqual({
      code: "too-large",
      message: "the file is larger than the limit of 500 bytes (FOULCAST_MAX_IMPORT_BYTES); split it into smaller files",
    });
  });

  it("refuses a file when more than half of the first rows are rejected, and hints at descending order", async () => {
    // default share 50 % (issue); 3 of 4 rows are bad
    const bad = [HEADER, row(0), row(1, "x"), row(2, "y"), row(3, "z")].join("\n");
    const refused = await refusalOf(bad);
    expect(refused.code).toBe("too-many-rejects");
    expect(refused.message).toBe(
      '3 of the 4 rows were rejected (more than 50 %): the column mapping, units, decimal mark or timestamp format are probably wrong. First reasons: line 3: hot_in_C: "x" is not a number; line 4: hot_in_C: "y" is not a number; line 5: hot_in_C: "z" is not a number',
    );
    const descending = [HEADER, ...Array.from({ length: 20 }, (_, index) => row(59 - index))].join("\n");
    expect((await refusalOf(descending)).message).toContain("the rows seem to be in descending time order; sort the file oldest first");
  });

  it("judges the share on the first 1000 rows of a long file", async () => {
    // rejectSampleRows default 1000 (issue); 600 bad rows among the first 1000 make 60 %
    const lines = [HEADER];
    for (let index = 0; index < 1500; index++) lines.push(`${new Date(Date.UTC(2026, 0, 1) + index * 60_000).toISOString()},${index < 600 ? "x" : "150"},90,25,60,10,12.5`);
    expect((await refusalOf(lines.join("\n"))).message).toMatch(/^600 of the first 1000 rows were rejected/);
  });

  it("refuses text it cannot read: an unclosed quote, UTF-16, a workbook, an ambiguous date order", async () => {
    expect(await refusalOf(`${HEADER}\n${row(0)}\n"${row(1)}\n${row(2)}\n`)).toEqual({
      code: "unreadable",
      message: "line 3: a quoted field opened here is never closed (the file ends inside quotes)",
    });
    // deep in a CRLF file, after a quoted field with a line break, read in small chunks: lines 1 header, 2–3 one
    // row, 4–201 rows, 202 the unclosed quote
    const deep = `${HEADER},note\r\n${row(0)},"a\r\nb"\r\n${Array.from({ length: 198 }, (_, index) => `${new Date(Date.UTC(2026, 2, 2) + index * 60_000).toISOString()},150,90,25,60,10,12.5,`).join("\r\n")}\r\n"2026-03-03T00:00Z,150,90,25,60,10,12.5,\r\n`;
    expect((await refusalOf(deep, { chunkBytes: 333 })).message).toBe("line 202: a quoted field opened here is never closed (the file ends inside quotes)");
    expect((await refusalOf(`${HEADER}\n${row(0)}\n"${"x".repeat(70_000)}\n`)).message).toBe("line 3: a row longer than 65,536 characters (is a quote not closed?)");
    expect((await refusalOf(Buffer.from([0xff, 0xfe, 0x74, 0x00]))).message).toContain("UTF-16");
    expect((await refusalOf(Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x14, 0x00]))).message).toContain("zip archive");
    const slashed = [HEADER, "01/03/2026 10:00,150,90,25,60,10,12.5", "02/03/2026 10:00,150,90,25,60,10,12.5"].join("\n");
    expect(await refusalOf(slashed)).toEqual({
      code: "timestamp-format",
      message: 'column "timestamp": timestamps such as "01/03/2026 10:00", "02/03/2026 10:00" can be read as DD/MM/YYYY or as MM/DD/YYYY; give the timestamp format',
    });
  });

  it("never throws anything but ImportRefusal or ImportFailure on malformed text, and what it reads is consistent", async () => {
    // property (a): arbitrary text built from CSV-significant pieces, with or without a canonical header
    const piece = fc.constantFrom(",", ";", "\t", '"', "\n", "\r\n", "\r", "\uFEFF", "2026-03-01T10:00Z", "2026-03-01 10:0", "150", "-3", "12,5", "NaN", "x", " ", "1e999", "1.5", "#N/A");
    const body = fc.array(piece, { maxLength: 60 }).map((pieces) => pieces.join(""));
    await fc.assert(
      fc.asyncProperty(fc.boolean(), body, fc.integer({ min: 1, max: 64 }), async (withHeader, text, chunkBytes) => {
        try {
          const { reader, rows } = await readText(withHeader ? `${HEADER}\n${text}` : text, { chunkBytes });
          expect(reader.rowsAccepted + reader.rowsRejected).toBe(reader.rowsRead);
          expect(rows).toHaveLength(reader.rowsAccepted);
          for (let index = 1; index < rows.length; index++) {
            expect((rows[index] as { timeMs: number }).timeMs).toBeGreaterThan((rows[index - 1] as { timeMs: number }).timeMs);
          }
          for (const reading of rows) for (const value of Object.values(reading.values)) expect(value === null || Number.isFinite(value)).toBe(true);
        } catch (error) {
          expect(error instanceof ImportRefusal || error instanceof ImportFailure).toBe(true);
        }
      }),
      { numRuns: 300 },
    );
  });
});

describe("ReadingsCsvReader with an expected size", () => {
  it("fails an upload that ends short of its declared size, and accepts one that arrives whole", async () => {
    const text = file(3);
    const bytes = Buffer.byteLength(text);
    await expect(readText(text, { expectedBytes: bytes + 10 })).rejects.toThrow(`the file arrived incomplete: ${bytes} of ${bytes + 10} bytes (was the upload interrupted?); nothing was imported`);
    expect((await readText(text, { expectedBytes: bytes })).rows).toHaveLength(3);
  });
});
