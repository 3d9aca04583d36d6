import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { fromSI } from "../../lib/core/units";
import { importReadings, type ImportReadingsRequest } from "../../lib/data/import-readings";
import { ImportFailure, ImportRefusal } from "../../lib/import/import-errors";
import { PASCALS_PER_PSI } from "../../lib/import/pressure-units";
import type { ColumnMappingInput } from "../../lib/validation/column-mapping";
import { createTestDatabase, type TestDatabase } from "../support/test-database";
import { CANONICAL_HEADER, canonicalCsv, createTestAsset, readingsState, textStream } from "../import/support/fixtures";

let database: TestDatabase;

beforeAll(async () => {
  database = await createTestDatabase();
});

afterAll(async () => {
  await database.drop();
});

const START = Date.UTC(2026, 2, 1);

function request(assetTag: string, text: string, extra: Partial<ImportReadingsRequest> = {}): ImportReadingsRequest {
  return { assetTag, source: "cli", createdBy: "test", fileName: "data.csv", stream: textStream(text), ...extra };
}

async function refusal(promise: Promise<unknown>): Promise<ImportRefusal> {
  try {
    await promise;
  } catch (error) {
    if (error instanceof ImportRefusal) return error;
    throw error;
  }
  throw new Error("expected a refusal");
}

const PLANT_MAPPING: ColumnMappingInput = {
  timestamp: { column: "Zeit", format: "DD.MM.YYYY HH:mm[:ss]" },
  delimiter: ";",
  decimalMark: ",",
  columns: {
    hotIn: { column: "TI-101", unit: "degC" },
    hotOut: { column: "TI-102", unit: "degC" },
    coldIn: { column: "TI-103", unit: "degC" },
    coldOut: { column: "TI-104", unit: "degC" },
    hotFlow: { column: "FI-101", unit: "t/h" },
    coldFlow: { column: "FI-102", unit: "t/h" },
    coldPressureDrop: { column: "PDI-102", unit: "bar" },
  },
};

function plantFile(rows: number, hotIn = "150,5"): string {
  const lines = ["Zeit;TI-101;TI-102;TI-103;TI-104;FI-101;FI-102;PDI-102;Kommentar"];
  for (let index = 0; index < rows; index++) lines.push(`01.03.2026 ${String(10 + Math.floor(index / 60)).padStart(2, "0")}:${String(index % 60).padStart(2, "0")};${hotIn};90;25;60,25;36;45;0,35;ok`);
  return `${lines.join("\r\n")}\r\n`;
}

describe("importReadings", () => {
  it("imports a canonical file and changes nothing when the same file comes again", async () => {
    const asset = await createTestAsset(database.prisma, "E-IDEM");
    const text = canonicalCsv(12_000, START);
    const first = await importReadings(database.prisma, request(asset.tag, text));
    expect(first).toMatchObject({ status: "completed", rowsRead: 12_000, rowsNew: 12_000, rowsChanged: 0, rowsUnchanged: 0, rowsRejected: 0, mappingSource: "canonical" });
    expect(first.firstTime).toBe("2026-03-01T00:00:00.000Z");
    const before = await readingsState(database.prisma, asset.id);
    const second = await importReadings(database.prisma, request(asset.tag, text));
    expect(second).toMatchObject({ rowsRead: 12_000, rowsNew: 0, rowsChanged: 0, rowsUnchanged: 12_000 });
    expect(await readingsState(database.prisma, asset.id)).toEqual(before);
    // the readings keep the batch that wrote them
    expect(await database.prisma.reading.count({ where: { assetId: asset.id, importBatchId: first.batchId } })).toBe(12_000);
  });

  it("counts new, changed and unchanged rows of an overlapping file and updates by timestamp", async () => {
    const asset = await createTestAsset(database.prisma, "E-OVERLAP");
    await importReadings(database.prisma, request(asset.tag, canonicalCsv(100, START)));
    // rows 50–149: 50 overlap, of which rows with index % 17 == 3 get a different hot inlet value
    const lines = canonicalCsv(150, START).trimEnd().split("\n").slice(51);
    const changedLines = lines.map((line, offset) => {
      const index = 50 + offset;
      return index < 100 && index % 17 === 3 ? line.replace(/^([^,]+),([^,]+),/, (_, time: string) => `${time},199.5,`) : line;
    });
    const summary = await importReadings(database.prisma, request(asset.tag, `${CANONICAL_HEADER}\n${changedLines.join("\n")}\n`));
    // indexes 50..99 with index % 17 == 3: 54, 71, 88
    expect(summary).toMatchObject({ rowsRead: 100, rowsNew: 50, rowsChanged: 3, rowsUnchanged: 47 });
    const changed = await database.prisma.reading.findUnique({ where: { assetId_time: { assetId: asset.id, time: new Date(START + 71 * 60_000) } } });
    // 199.5 °C = 472.65 K (NIST SP 811 B.9)
    expect(changed?.hotInK).toBeCloseTo(472.65, 12);
    expect(changed?.importBatchId).toBe(summary.batchId);
    expect(await database.prisma.reading.count({ where: { assetId: asset.id } })).toBe(150);
  });

  it("leaves columns the file does not map as they are, and overwrites a value with a missing cell", async () => {
    const asset = await createTestAsset(database.prisma, "E-PARTIAL");
    await importReadings(database.prisma, request(asset.tag, "timestamp,hot_in_C,hot_out_C,cold_in_C,cold_out_C,hot_flow_kg_s,cold_flow_kg_s,hot_dp_kPa\n2026-03-01T00:00Z,150,90,25,60,10,12,40\n"));
    const summary = await importReadings(database.prisma, request(asset.tag, `${CANONICAL_HEADER}\n2026-03-01T00:00Z,150,90,,60,10,12\n`));
    expect(summary).toMatchObject({ rowsChanged: 1 });
    const row = await database.prisma.reading.findFirst({ where: { assetId: asset.id } });
    // 40 kPa = 40 000 Pa (NIST SP 811 B.8), kept because this file has no hot_dp column
    expect(row?.hotPressureDropPa).toBe(40_000);
    expect(row?.coldInK).toBeNull();
  });

  it("imports a semicolon file with decimal commas through a mapping, saves the mapping and reuses it", async () => {
    const asset = await createTestAsset(database.prisma, "E-MAPPED");
    const first = await importReadings(database.prisma, request(asset.tag, plantFile(30), { mapping: PLANT_MAPPING }));
    expect(first).toMatchObject({ rowsNew: 30, mappingSource: "explicit", mappingSaved: true, decimalMark: ",", delimiter: ";", ignoredColumns: ["Kommentar"], timeZone: "Europe/Amsterdam" });
    const row = await database.prisma.reading.findFirst({ where: { assetId: asset.id }, orderBy: { time: "asc" } });
    // 01.03.2026 10:00 CET = 09:00Z (IANA tz database); 150,5 °C = 423.65 K; 36 t/h = 10 kg/s; 0,35 bar = 35 000 Pa (NIST SP 811)
    expect(row?.time.toISOString()).toBe("2026-03-01T09:00:00.000Z");
    expect(row?.hotInK).toBeCloseTo(423.65, 12);
    expect(row?.hotFlowKgPerS).toBeCloseTo(10, 12);
    expect(row?.coldPressureDropPa).toBeCloseTo(35_000, 9);
    const saved = await database.prisma.columnMapping.findUnique({ where: { assetId: asset.id } });
    expect(saved?.mapping).toMatchObject({ timestamp: { column: "Zeit" }, columns: { hotFlow: { column: "FI-101", unit: "t/h" } } });
    // no mapping given: the saved one is used
    const second = await importReadings(database.prisma, request(asset.tag, plantFile(31, "151")));
    expect(second).toMatchObject({ mappingSource: "saved", mappingSaved: false, rowsNew: 1, rowsChanged: 30 });
    // a mapping given explicitly replaces the saved one
    const renamed = { ...PLANT_MAPPING, columns: { ...PLANT_MAPPING.columns, coldPressureDrop: undefined } };
    await importReadings(database.prisma, request(asset.tag, plantFile(2), { mapping: renamed }));
    const replaced = await database.prisma.columnMapping.findUnique({ where: { assetId: asset.id } });
    expect((replaced?.mapping as { columns: Record<string, unknown> }).columns.coldPressureDrop).toBeUndefined();
    // a file with canonical headers still imports (the saved mapping does not fit it)
    expect((await importReadings(database.prisma, request(asset.tag, canonicalCsv(3, START + 86_400_000)))).mappingSource).toBe("canonical");
  });

  it("refuses an unknown asset tag, writing nothing and recording nothing", async () => {
    const batchesBefore = await database.prisma.importBatch.count();
    const refused = await refusal(importReadings(database.prisma, request("E-NOPE", canonicalCsv(3, START))));
    expect(refused.code).toBe("unknown-asset");
    expect(refused.message).toBe('no asset with tag "E-NOPE"');
    expect(await database.prisma.importBatch.count()).toBe(batchesBefore);
  });

  it("refuses files as a whole, leaves the readings exactly as they were and records a failed batch", async () => {
    const asset = await createTestAsset(database.prisma, "E-REFUSE");
    await importReadings(database.prisma, request(asset.tag, canonicalCsv(500, START)));
    const before = await readingsState(database.prisma, asset.id);
    const cases: [string, string, Partial<ImportReadingsRequest>][] = [
      ["empty", "", {}],
      ["missing-columns", canonicalCsv(5, START).replace("cold_out_C", "outlet"), {}],
      ["unknown-unit", canonicalCsv(5, START).replace("hot_in_C", "hot_in_Q"), {}],
      ["implausible-unit", canonicalCsv(5, START).replace("cold_in_C", "cold_in_K"), {}],
      ["too-large", canonicalCsv(2000, START), { options: { limits: { maxBytes: 4096 } } }],
      // every row's cold flow is "x": all of the first 1000 rows are rejected
      ["too-many-rejects", canonicalCsv(1500, START).replace(/,12\.5\n/g, ",x\n"), {}],
      ["unknown-unit", canonicalCsv(5, START), { mapping: { ...PLANT_MAPPING, columns: { ...PLANT_MAPPING.columns, hotIn: { column: "a", unit: "furlong" } } } }],
      ["invalid-mapping", canonicalCsv(5, START), { options: { timeZone: "Europe/Atlantis" } }],
    ];
    for (const [code, text, extra] of cases) {
      const refused = await refusal(importReadings(database.prisma, request(asset.tag, text, extra)));
      expect(refused.code, text.slice(0, 60)).toBe(code);
      expect(refused.batchId).not.toBeNull();
      const batch = await database.prisma.importBatch.findUnique({ where: { id: refused.batchId as number } });
      expect(batch).toMatchObject({ status: "failed", error: refused.message });
      expect(await readingsState(database.prisma, asset.id)).toEqual(before);
    }
    expect(await database.prisma.importBatch.count({ where: { assetId: asset.id, status: "running" } })).toBe(0);
  });

  it("records a completed batch with counts, rejects, options, times, file size, source and creator", async () => {
    const asset = await createTestAsset(database.prisma, "E-BATCH");
    const text = `${canonicalCsv(10, START)}2026-03-01T00:05Z,150,90,25,60,10,12.5\n`;
    const summary = await importReadings(database.prisma, request(asset.tag, text, { source: "api", createdBy: "operator", fileName: "march.csv" }));
    const batch = await database.prisma.importBatch.findUnique({ where: { id: summary.batchId } });
    expect(batch).toMatchObject({
      status: "completed", source: "api", createdBy: "operator", fileName: "march.csv", fileBytes: BigInt(Buffer.byteLength(text)),
      rowsRead: 11, rowsNew: 10, rowsRejected: 1, rejects: [{ line: 12, reason: "timestamp earlier than line 11's; rows must be in time order" }],
    });
    expect(batch?.firstTime?.toISOString()).toBe("2026-03-01T00:00:00.000Z");
    expect(batch?.lastTime?.toISOString()).toBe("2026-03-01T00:09:00.000Z");
    expect(batch?.finishedAt).not.toBeNull();
    expect(batch?.options).toMatchObject({ mappingSource: "canonical", delimiter: ",", decimalMark: ".", timestampFormat: "iso", timeZone: "Europe/Amsterdam" });
  });

  it("serialises concurrent imports into one asset: both complete and the counts add up", async () => {
    const asset = await createTestAsset(database.prisma, "E-CONCURRENT");
    const first = canonicalCsv(3000, START);
    const second = canonicalCsv(3000, START + 1500 * 60_000, 1);
    const [a, b] = await Promise.all([importReadings(database.prisma, request(asset.tag, first)), importReadings(database.prisma, request(asset.tag, second))]);
    // 4500 distinct times; the 1500 shared ones were written by both, the later import changing them (shift 1 °C)
    expect(a.rowsNew + b.rowsNew).toBe(4500);
    expect(a.rowsChanged + b.rowsChanged).toBe(1500);
    expect(await database.prisma.reading.count({ where: { assetId: asset.id } })).toBe(4500);
  });

  it("never throws anything but the documented errors on malformed text, and writes all or nothing", async () => {
    // property (a) against the database: each case either completes (readings then match its counts) or leaves the
    // readings exactly as before
    const asset = await createTestAsset(database.prisma, "E-FUZZ");
    await importReadings(database.prisma, request(asset.tag, canonicalCsv(50, START)));
    const piece = fc.constantFrom(",", ";", '"', "\n", "\r\n", "2026-03-01T00:0", "1Z", "150", "-3", "12,5", "NaN", "x", "60", "10");
    const line = fc.array(piece, { maxLength: 12 }).map((pieces) => pieces.join(""));
    await fc.assert(
      fc.asyncProperty(fc.array(line, { maxLength: 8 }), async (lines) => {
        const before = await readingsState(database.prisma, asset.id);
        try {
          const summary = await importReadings(database.prisma, request(asset.tag, `${CANONICAL_HEADER}\n${lines.join("\n")}`));
          const after = await readingsState(database.prisma, asset.id);
          expect(after.count).toBe(before.count + summary.rowsNew);
          if (summary.rowsNew + summary.rowsChanged === 0) expect(after).toEqual(before);
        } catch (error) {
          expect(error instanceof ImportRefusal || error instanceof ImportFailure).toBe(true);
          expect(await readingsState(database.prisma, asset.id)).toEqual(before);
        }
      }),
      { numRuns: 30 },
    );
  });

  it("stores SI values equal to generated readings written in random units, formats and delimiters", async () => {
    // property (b): round trip SI -> unit text -> import -> SI, relative tolerance 1e-9 (decimal text of doubles is
    // exact to ~1e-15; the margin covers the unit factors' rounding)
    const temperatureUnits = ["K", "degC", "degF", "degR"] as const;
    const flowUnits = ["kg/s", "kg/h", "t/h", "lb/h", "lb/s"] as const;
    const pressureUnits = [["Pa", 1], ["kPa", 1e3], ["bar", 1e5], ["psi", PASCALS_PER_PSI]] as const;
    const formats = ["iso", "YYYY-MM-DD HH:mm[:ss]", "DD.MM.YYYY HH:mm[:ss]", "MM/DD/YYYY HH:mm[:ss]", "epoch-seconds", "epoch-ms"] as const;
    // fixed-offset zones only: in a zone with daylight saving a local time inside the repeated hour cannot say which
    // instant it was (that rule is tested in the parser tests)
    const zones = ["UTC", "Asia/Kolkata", "America/Bogota", "Etc/GMT-3"] as const;
    const readingArbitrary = fc.record({
      hotInK: fc.double({ min: 250, max: 900, noNaN: true }),
      hotOutK: fc.double({ min: 250, max: 900, noNaN: true }),
      coldInK: fc.double({ min: 250, max: 900, noNaN: true }),
      coldOutK: fc.option(fc.double({ min: 250, max: 900, noNaN: true }), { nil: null }),
      hotFlow: fc.double({ min: 0, max: 500, noNaN: true }),
      coldFlow: fc.double({ min: 0.01, max: 500, noNaN: true }),
      dropPa: fc.double({ min: 0, max: 5e5, noNaN: true }),
    });
    let caseNumber = 0;
    await fc.assert(
      fc.asyncProperty(
        fc.array(readingArbitrary, { minLength: 1, maxLength: 25 }),
        fc.constantFrom(...temperatureUnits),
        fc.constantFrom(...flowUnits),
        fc.constantFrom(...pressureUnits),
        fc.constantFrom(...formats),
        fc.constantFrom(...zones),
        fc.constantFrom(",", ";", "\t"),
        fc.boolean(),
        fc.integer({ min: 0, max: 10_000_000 }),
        async (readings, temperatureUnit, flowUnit, [pressureUnit, pascals], format, zone, delimiter, commaDecimal, startMinute) => {
          caseNumber += 1;
          const asset = await createTestAsset(database.prisma, `E-ROUND-${caseNumber}`, zone);
          const decimalMark = delimiter === "," ? "." : commaDecimal ? "," : ".";
          const number = (value: number) => (decimalMark === "," ? String(value).replace(".", ",") : String(value));
          const startMs = Date.UTC(2020, 0, 1) + startMinute * 60_000;
          const offsetMs = (timeMs: number) => {
            const parts = new Intl.DateTimeFormat("en-US", { timeZone: zone, timeZoneName: "longOffset" }).format(new Date(timeMs)).split("GMT")[1] ?? "";
            const match = /([+-])(\d\d):(\d\d)/.exec(parts);
            return match ? (match[1] === "-" ? -1 : 1) * (Number(match[2]) * 60 + Number(match[3])) * 60_000 : 0;
          };
          const stamp = (timeMs: number) => {
            const local = new Date(timeMs + offsetMs(timeMs)).toISOString();
            const [date = "", time = ""] = local.split("T");
            const [year, month, day] = date.split("-");
            const clock = time.slice(0, 8);
            switch (format) {
              case "iso": return local.replace("Z", "").slice(0, 19);
              case "YYYY-MM-DD HH:mm[:ss]": return `${date} ${clock}`;
              case "DD.MM.YYYY HH:mm[:ss]": return `${day}.${month}.${year} ${clock}`;
              case "MM/DD/YYYY HH:mm[:ss]": return `${month}/${day}/${year} ${clock}`;
              case "epoch-seconds": return String(timeMs / 1000);
              case "epoch-ms": return String(timeMs);
            }
          };
          const header = ["when", "a", "b", "c", "d", "e", "f", "g"].join(delimiter);
          const lines = readings.map((reading, index) => {
            const timeMs = startMs + index * 60_000;
            return [
              stamp(timeMs),
              number(fromSI("temperature", reading.hotInK, temperatureUnit)),
              number(fromSI("temperature", reading.hotOutK, temperatureUnit)),
              number(fromSI("temperature", reading.coldInK, temperatureUnit)),
              reading.coldOutK === null ? "" : number(fromSI("temperature", reading.coldOutK, temperatureUnit)),
              number(fromSI("massFlow", reading.hotFlow, flowUnit)),
              number(fromSI("massFlow", reading.coldFlow, flowUnit)),
              number(reading.dropPa / pascals),
            ].join(delimiter);
          });
          const mapping: ColumnMappingInput = {
            timestamp: { column: "when", format },
            delimiter: "auto",
            decimalMark: "auto",
            columns: {
              hotIn: { column: "a", unit: temperatureUnit }, hotOut: { column: "b", unit: temperatureUnit },
              coldIn: { column: "c", unit: temperatureUnit }, coldOut: { column: "d", unit: temperatureUnit },
              hotFlow: { column: "e", unit: flowUnit }, coldFlow: { column: "f", unit: flowUnit },
              hotPressureDrop: { column: "g", unit: pressureUnit },
            },
          };
          const summary = await importReadings(database.prisma, request(asset.tag, `${header}\r\n${lines.join("\r\n")}\r\n`, { mapping, options: { trustUnits: true, decimalMark } }));
          expect(summary.rowsRejected).toBe(0);
          const stored = await database.prisma.reading.findMany({ where: { assetId: asset.id }, orderBy: { time: "asc" } });
          expect(stored).toHaveLength(readings.length);
          const close = (actual: number | null, expected: number | null) => {
            if (expected === null) return expect(actual).toBeNull();
            expect(Math.abs((actual ?? Number.NaN) - expected)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(expected)));
          };
          stored.forEach((row, index) => {
            const reading = readings[index] as (typeof readings)[number];
            expect(row.time.getTime()).toBe(startMs + index * 60_000);
            close(row.hotInK, reading.hotInK);
            close(row.hotOutK, reading.hotOutK);
            close(row.coldInK, reading.coldInK);
            close(row.coldOutK, reading.coldOutK);
            close(row.hotFlowKgPerS, reading.hotFlow);
            close(row.coldFlowKgPerS, reading.coldFlow);
            close(row.hotPressureDropPa, reading.dropPa);
          });
        },
      ),
      { numRuns: 25 },
    );
  });
});
