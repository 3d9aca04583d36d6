// Fuzzing the operating-data CSV import: the streaming reader alone (many cases, no database) and importReadings
// against a real database (fewer cases): never an exception other than ImportRefusal/ImportFailure, every rejected
// row named by its line and field, and a refused import leaves the readings exactly as they were.
import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { importReadings } from "../../lib/data/import-readings";
import { ImportFailure, ImportRefusal, REFUSAL_STATUS } from "../../lib/import/import-errors";
import { PLAUSIBLE_RANGES } from "../../lib/import/plausible-ranges";
import { createTestDatabase, type TestDatabase } from "../support/test-database";
import { CANONICAL_HEADER, canonicalCsv, createTestAsset, readingsState, textStream } from "../import/support/fixtures";
import { readText } from "../import/support/read-text";

const COLUMNS = CANONICAL_HEADER.split(",");
const START = Date.UTC(2026, 2, 1);

/** A reject reason names what is wrong: the field count, the timestamp, or a column of the header. */
const REASON_START = new RegExp(
  `^(expected \\d+ fields as in the header, found \\d+$|timestamp |duplicate timestamp |no measured values |(${COLUMNS.slice(1).join("|")})[: =])`,
);

// Cells a plant historian export or a hand-edited file can hold, good and bad.
const numberCell = fc.oneof(
  { weight: 60, arbitrary: fc.double({ min: 10, max: 300, noNaN: true }).map((value) => value.toFixed(2)) },
  { weight: 1, arbitrary: fc.double({ min: 10, max: 300, noNaN: true }).map((value) => value.toFixed(2).replace(".", ",")) },
  { weight: 1, arbitrary: fc.constantFrom("NaN", "Infinity", "-Infinity", "1e999", "-1e999", "inf", "0x10", "1,234.5", "1.2.3", "", " ", "#N/A", "Bad", "--", "1e-400") },
  { weight: 1, arbitrary: fc.double({ min: -500, max: -0.001, noNaN: true }).map((value) => value.toFixed(3)) },
  { weight: 1, arbitrary: fc.constantFrom("-273.15", "-300", "5000", "1e6", "0") },
);
const timeCell = (index: number) =>
  fc.oneof(
    { weight: 30, arbitrary: fc.constant(new Date(START + index * 60_000).toISOString()) },
    {
      weight: 1,
      arbitrary: fc.constantFrom(
        "2026-02-30T10:00Z", "2026-13-01T00:00Z", "2026-03-01T24:61Z", "1899-12-31T23:59Z", "2200-01-01T00:00Z", "2026-03-01T10:00+25:00",
        "yesterday", "", "0", "99999999999999999999", "2026-03-29 02:30", "2026-03-01T00:00Z",
      ),
    },
  );
const rowArbitrary = (index: number) =>
  fc.tuple(timeCell(index), fc.array(numberCell, { minLength: 6, maxLength: 6 }), fc.constantFrom(...Array<number>(28).fill(0), 1, -1)).map(([time, cells, extra]) => {
    const fields = [time, ...cells];
    if (extra > 0) fields.push("surplus");
    if (extra < 0) fields.pop();
    return fields;
  });

/** One whole file: rows, then damage of one kind or none. */
const fileArbitrary = fc
  .integer({ min: 0, max: 40 })
  .chain((count) => fc.tuple(fc.tuple(...Array.from({ length: count }, (_, index) => rowArbitrary(index))), fc.constantFrom(",", ";", "\t")))
  .chain(([rows, headerDelimiter]) => fc.tuple(fc.constant(rows), fc.constant(headerDelimiter), fc.oneof({ weight: 9, arbitrary: fc.constant(headerDelimiter) }, { weight: 1, arbitrary: fc.constantFrom(",", ";", "\t") })))
  .chain(([rows, headerDelimiter, rowDelimiter]) =>
    fc.tuple(
      fc.constant(rows as string[][]),
      fc.constant(headerDelimiter),
      fc.constant(rowDelimiter),
      fc.constantFrom("none", "none", "none", "none", "bom", "mid-bom", "open-quote", "stray-quote", "quoted-newline", "huge-field", "crlf", "cr", "nul", "latin1"),
      fc.nat(),
    ),
  )
  .map(([rows, headerDelimiter, rowDelimiter, damage, position]) => {
    const lines = [COLUMNS.join(headerDelimiter), ...rows.map((fields) => fields.join(rowDelimiter))];
    const at = lines.length > 1 ? 1 + (position % (lines.length - 1)) : 0;
    const target = lines[at] ?? "";
    switch (damage) {
      case "bom": lines[0] = `\uFEFF${lines[0]}`; break;
      case "mid-bom": lines[at] = `\uFEFF${target}`; break;
      case "open-quote": lines[at] = `"${target}`; break;
      case "stray-quote": lines[at] = target.replace(rowDelimiter, `${rowDelimiter}12"5`); break;
      case "quoted-newline": lines[at] = target.replace(rowDelimiter, `${rowDelimiter}"12\n5"`); break;
      case "huge-field": lines[at] = `${target}${rowDelimiter}${"9".repeat(70_000)}`; break;
      case "nul": lines[at] = `${target}\0`; break;
      case "latin1": lines[at] = `${target}\u00e9`; break;
    }
    const lineEnd = damage === "crlf" ? "\r\n" : damage === "cr" ? "\r" : "\n";
    const text = lines.join(lineEnd) + lineEnd;
    return damage === "latin1" ? Buffer.from(text, "latin1") : text;
  });

function expectDomainError(error: unknown): asserts error is ImportRefusal | ImportFailure {
  if (!(error instanceof ImportRefusal || error instanceof ImportFailure)) throw error;
  expect(error.message.length).toBeGreaterThan(10);
  if (error instanceof ImportRefusal) expect(REFUSAL_STATUS[error.code]).toBeGreaterThanOrEqual(400);
}

describe("ReadingsCsvReader under fuzzed input", () => {
  it("reads random bytes, with or without a valid header, into readings or a refusal, nothing else", async () => {
    await fc.assert(
      fc.asyncProperty(fc.boolean(), fc.uint8Array({ maxLength: 3000 }), fc.integer({ min: 1, max: 512 }), async (withHeader, bytes, chunkBytes) => {
        const text = withHeader ? Buffer.concat([Buffer.from(`${CANONICAL_HEADER}\n`), Buffer.from(bytes)]) : Buffer.from(bytes);
        try {
          const { reader, rows } = await readText(text, { chunkBytes });
          expect(reader.rowsAccepted + reader.rowsRejected).toBe(reader.rowsRead);
          expect(rows).toHaveLength(reader.rowsAccepted);
        } catch (error) {
          expectDomainError(error);
        }
      }),
      { numRuns: 1500 },
    );
  });

  it("accepts only plausible, finite, time-ordered readings and names the line and field of every rejected row", async () => {
    await fc.assert(
      fc.asyncProperty(fileArbitrary, fc.integer({ min: 7, max: 4096 }), async (text, chunkBytes) => {
        let result: Awaited<ReturnType<typeof readText>>;
        try {
          result = await readText(text, { chunkBytes, trustUnits: true });
        } catch (error) {
          expectDomainError(error);
          return;
        }
        const { reader, rows } = result;
        expect(reader.rowsAccepted + reader.rowsRejected).toBe(reader.rowsRead);
        const physicalLines = String(text).split(/\r\n|\r|\n/).length;
        for (const reject of reader.rejects) {
          expect(reject.line).toBeGreaterThanOrEqual(2);
          expect(reject.line).toBeLessThanOrEqual(physicalLines);
          expect(reject.reason).toMatch(REASON_START);
        }
        for (const [index, row] of rows.entries()) {
          if (index > 0) expect(row.timeMs).toBeGreaterThan((rows[index - 1] as { timeMs: number }).timeMs);
          // plausible ranges of lib/import/plausible-ranges.ts (common practice), in SI
          for (const role of ["hotIn", "hotOut", "coldIn", "coldOut"] as const) {
            const value = row.values[role];
            if (value !== null) expect(value >= PLAUSIBLE_RANGES.temperature.min && value <= PLAUSIBLE_RANGES.temperature.max).toBe(true);
          }
          for (const role of ["hotFlow", "coldFlow"] as const) {
            const value = row.values[role];
            if (value !== null) expect(value >= 0 && value <= PLAUSIBLE_RANGES.massFlow.max).toBe(true);
          }
          expect(Object.values(row.values).some((value) => value !== null)).toBe(true);
        }
      }),
      { numRuns: 1500 },
    );
  });

  it("rejects exactly the rows with a negative flow and keeps temperature crosses, naming the column", async () => {
    await fc.assert(
      fc.asyncProperty(fc.integer({ min: 2, max: 30 }), fc.nat(), fc.double({ min: -1e4, max: -1e-3, noNaN: true }), async (count, pick, negative) => {
        const lines = canonicalCsv(count, START).trimEnd().split("\n");
        const bad = 1 + (pick % count);
        const fields = (lines[bad] as string).split(",");
        fields[5] = String(negative);
        lines[bad] = fields.join(",");
        // a temperature cross on another row: hot outlet (30 °C) below cold inlet (25 °C)... and cold outlet above hot
        // outlet; physically possible in counterflow, so the import keeps it for the screening to judge
        const cross = bad === 1 ? 2 : 1;
        if (cross <= count) {
          const crossed = (lines[cross] as string).split(",");
          crossed[2] = "24";
          crossed[4] = "70";
          lines[cross] = crossed.join(",");
        }
        const { reader, rows } = await readText(`${lines.join("\n")}\n`, { trustUnits: true });
        // the message format of docs/import.md, "negative flow"
        expect(reader.rejects).toEqual([{ line: bad + 1, reason: `hot_flow_kg_s = ${String(negative)}: a mass flow cannot be negative` }]);
        expect(rows).toHaveLength(count - 1);
      }),
      { numRuns: 300 },
    );
  });
});

describe("importReadings under fuzzed input, against the database", () => {
  let database: TestDatabase;
  let asset: { id: number; tag: string };

  beforeAll(async () => {
    database = await createTestDatabase();
    asset = await createTestAsset(database.prisma, "E-FUZZ-DB", "UTC");
    await importReadings(database.prisma, { assetTag: asset.tag, source: "cli", createdBy: "test", fileName: "base.csv", stream: textStream(canonicalCsv(60, START, 0.5)) });
  });

  afterAll(async () => {
    await database.drop();
  });

  it("either completes with counts that match the stored rows or changes nothing, and records the attempt", async () => {
    let refused = 0;
    let completed = 0;
    await fc.assert(
      fc.asyncProperty(fileArbitrary, async (text) => {
        const before = await readingsState(database.prisma, asset.id);
        const batchesBefore = await database.prisma.importBatch.count({ where: { assetId: asset.id } });
        try {
          const summary = await importReadings(database.prisma, { assetTag: asset.tag, source: "api", createdBy: "fuzz", fileName: "fuzz.csv", stream: textStream(String(text)), options: { trustUnits: true } });
          completed += 1;
          const after = await readingsState(database.prisma, asset.id);
          expect(after.count).toBe(before.count + summary.rowsNew);
          if (summary.rowsNew + summary.rowsChanged === 0) expect(after).toEqual(before);
          expect(await database.prisma.importBatch.findUnique({ where: { id: summary.batchId }, select: { status: true } })).toEqual({ status: "completed" });
        } catch (error) {
          expectDomainError(error);
          refused += 1;
          // all or nothing: count and checksum of every stored value exactly as before
          expect(await readingsState(database.prisma, asset.id)).toEqual(before);
          const failed = await database.prisma.importBatch.findUniqueOrThrow({ where: { id: error.batchId ?? -1 } });
          expect(failed).toMatchObject({ status: "failed", error: error.message });
        }
        expect(await database.prisma.importBatch.count({ where: { assetId: asset.id } })).toBe(batchesBefore + 1);
        // nothing is left running
        expect(await database.prisma.importBatch.count({ where: { assetId: asset.id, status: "running" } })).toBe(0);
      }),
      { numRuns: 300 },
    );
    if (process.env.FOULCAST_FUZZ_REPORT) console.info(`importReadings fuzz: ${completed} completed, ${refused} refused`);
    // the generator must exercise both outcomes, or the property proves little
    expect(refused).toBeGreaterThan(5);
    expect(completed).toBeGreaterThan(5);
  }, 120_000);
});
