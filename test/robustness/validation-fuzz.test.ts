// Fuzzing the input schemas at the edges: whatever arrives, the answer is a parsed value or the project's own error
// naming the field (zod issue path, AssetValidationError problem, UnitError quantity) — never another exception.
import fs from "node:fs";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { parseUnit, UnitError, UNIT_TABLE, type Quantity } from "../../lib/core/units";
import { parseAssetFile } from "../../lib/data/save-asset";
import { parseImportRequestOptions } from "../../lib/import/import-request-options";
import { AssetValidationError } from "../../lib/validation/asset";
import { cleaningSchema } from "../../lib/validation/cleaning";
import { columnMappingSchema, describeMappingIssues } from "../../lib/validation/column-mapping";
import { quantitySchema } from "../../lib/validation/quantity";

const QUANTITIES = Object.keys(UNIT_TABLE) as Quantity[];

// Values that break naive code: non-finite numbers, huge and odd strings, prototype keys, deep nesting.
const nasty = fc.oneof(
  fc.constantFrom(Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, -0, Number.MAX_VALUE, Number.MIN_VALUE, 1e308, -1e308, 2 ** 53 + 1),
  fc.constantFrom("", " ", "\0", "\u202e", "NaN", "Infinity", "1e999", "__proto__", "constructor", "x".repeat(100_000), "°", "degC", "kg/s", "=1+1"),
  fc.constantFrom(null, undefined, true, false, [], {}, { __proto__: { polluted: 1 } }, Object.create(null) as object),
);
const anyJson = fc.oneof({ weight: 3, arbitrary: fc.jsonValue({ maxDepth: 4 }) }, { weight: 1, arbitrary: nasty }, { weight: 1, arbitrary: fc.anything({ maxDepth: 3 }) });

const example = JSON.parse(fs.readFileSync("docs/examples/asset-e-4101.json", "utf8")) as Record<string, unknown>;

/** Paths (key lists) of every value inside the example asset file, to replace one at a time. */
function leafPaths(value: unknown, prefix: (string | number)[] = []): (string | number)[][] {
  if (value === null || typeof value !== "object") return [prefix];
  const entries = Array.isArray(value) ? value.map((item, index) => [index, item] as const) : Object.entries(value);
  return [prefix, ...entries.flatMap(([key, item]) => leafPaths(item, [...prefix, key]))];
}
const PATHS = leafPaths(example).filter((keys) => keys.length > 0);

function replaced(document: unknown, keys: readonly (string | number)[], value: unknown): unknown {
  if (keys.length === 0) return value;
  const [head, ...rest] = keys as [string | number, ...(string | number)[]];
  const copy: Record<string | number, unknown> = Array.isArray(document) ? [...document] as unknown as Record<number, unknown> : { ...(document as Record<string, unknown>) };
  copy[head] = replaced(copy[head], rest, value);
  return copy;
}

describe("parseAssetFile (asset files and the register form)", () => {
  it("accepts the documented example and refuses any one field replaced by junk only with AssetValidationError naming that field", () => {
    expect(() => parseAssetFile(example)).not.toThrow();
    let refused = 0;
    fc.assert(
      fc.property(fc.constantFrom(...PATHS), anyJson, (keys, value) => {
        try {
          parseAssetFile(replaced(example, keys, value));
        } catch (error) {
          if (!(error instanceof AssetValidationError)) throw error;
          refused += 1;
          expect(error.problems.length).toBeGreaterThan(0);
          // each problem is "path: message"; one of them names the replaced field or a field that depends on it
          // (reference conditions, duty limits) or the document as a whole (unknown keys)
          for (const problem of error.problems) expect(problem).toMatch(/^([A-Za-z0-9_.]+: |[A-Za-z].{5,})/);
          const top = String(keys[0]);
          expect(error.problems.some((problem) => problem.startsWith(top) || /^(reference|designDuty|dutyThreshold)/.test(problem) || !problem.includes(":"))).toBe(true);
        }
      }),
      { numRuns: 3000 },
    );
    expect(refused).toBeGreaterThan(1000);
  });

  it("never throws anything but AssetValidationError on arbitrary JSON documents", () => {
    fc.assert(
      fc.property(anyJson, (document) => {
        try {
          parseAssetFile(document);
        } catch (error) {
          if (!(error instanceof AssetValidationError)) throw error;
          expect(error.message.length).toBeGreaterThan(0);
        }
      }),
      { numRuns: 1000 },
    );
  });
});

describe("quantitySchema and parseUnit", () => {
  it("refuses a finite value that overflows in conversion (found by this fuzz test: it gave Infinity J/(kg·K))", () => {
    // 1 Btu/(lb·°F) = 4186.8 J/(kg·K) (NIST SP 811 B.8, International Table Btu), so 1e308 of them exceeds the largest double
    const parsed = quantitySchema("specificHeat").safeParse({ value: 1e308, unit: "Btu/lb/F" });
    expect(parsed.success ? "" : parsed.error.issues[0]?.message).toBe("value 1e+308 Btu/lb/F is out of range: it is not a finite number in J/(kg.K)");
  });

  it("turns any input into a finite SI number or an issue that names the quantity's shape or unit", () => {
    const unitText = fc.oneof(fc.string({ maxLength: 12 }), fc.constantFrom(...QUANTITIES.flatMap((quantity) => UNIT_TABLE[quantity].flatMap((unit) => [unit.id, unit.label, ...unit.spellings]))));
    const input = fc.oneof(fc.double(), fc.record({ value: fc.oneof(fc.double(), nasty), unit: fc.oneof(unitText, nasty) }), anyJson);
    fc.assert(
      fc.property(fc.constantFrom(...QUANTITIES), input, (quantity, value) => {
        const parsed = quantitySchema(quantity).safeParse(value);
        if (parsed.success) expect(Number.isFinite(parsed.data)).toBe(true);
        else for (const issue of parsed.error.issues) expect(issue.message).toMatch(/number|value|unit|required|key/);
      }),
      { numRuns: 3000 },
    );
  });

  it("parseUnit returns a unit of the quantity or throws UnitError listing the allowed units", () => {
    fc.assert(
      fc.property(fc.constantFrom(...QUANTITIES), fc.oneof(fc.string({ maxLength: 20 }), fc.string({ unit: "binary", maxLength: 20 })), (quantity, text) => {
        try {
          const id = parseUnit(quantity, text);
          expect(UNIT_TABLE[quantity].map((unit) => unit.id)).toContain(id);
        } catch (error) {
          if (!(error instanceof UnitError)) throw error;
          expect(error.quantity).toBe(quantity);
          expect(error.message).toContain("allowed: ");
        }
      }),
      { numRuns: 3000 },
    );
  });
});

describe("columnMappingSchema", () => {
  const goodMapping = {
    timestamp: { column: "Zeit", format: "DD.MM.YYYY HH:mm[:ss]" },
    timeZone: "Europe/Amsterdam",
    delimiter: ";",
    decimalMark: ",",
    columns: {
      hotIn: { column: "TI-101", unit: "degC" }, hotOut: { column: "TI-102", unit: "degC" }, coldIn: { column: "TI-103", unit: "degC" },
      coldOut: { column: "TI-104", unit: "degC" }, hotFlow: { column: "FI-101", unit: "t/h" }, coldFlow: { column: "FI-102", unit: "t/h" },
    },
  };
  const mappingPaths = leafPaths(goodMapping).filter((keys) => keys.length > 0);

  it("parses or names the path of every problem, for any one field replaced by junk and for arbitrary JSON", () => {
    expect(columnMappingSchema.safeParse(goodMapping).success).toBe(true);
    fc.assert(
      fc.property(fc.oneof(fc.tuple(fc.constantFrom(...mappingPaths), anyJson).map(([keys, value]) => replaced(goodMapping, keys, value)), anyJson), (mapping) => {
        const parsed = columnMappingSchema.safeParse(mapping);
        if (parsed.success) return;
        const text = describeMappingIssues(parsed.error);
        expect(text.length).toBeGreaterThan(0);
        // every issue but a wrong top-level type carries a path: "columns.hotIn.unit: …"
        for (const issue of parsed.error.issues) if (typeof mapping === "object" && mapping !== null && !Array.isArray(mapping)) expect(issue.path.length + (issue.code === "unrecognized_keys" ? 1 : 0)).toBeGreaterThan(0);
      }),
      { numRuns: 3000 },
    );
  });
});

describe("cleaningSchema (web form and CLI)", () => {
  it("parses to a past or present cleaning with a non-negative finite cost, or names the field", () => {
    const dateText = fc.oneof(fc.date({ noInvalidDate: false }).map((date) => (Number.isNaN(date.getTime()) ? "not a date" : date.toISOString())), fc.constantFrom("2026-02-30", "2026-13-01", "yesterday", "", "0", "-1", "9999-12-31", "+275760-09-13T00:00:00.000Z"), nasty);
    const input = fc.record({ tag: fc.oneof(fc.string(), nasty), date: dateText, endDate: fc.option(dateText, { nil: undefined }), method: fc.oneof(fc.string({ maxLength: 120 }), nasty), cost: fc.option(fc.oneof(fc.double(), nasty), { nil: undefined }), notes: fc.option(fc.oneof(fc.string({ maxLength: 2100 }), nasty), { nil: undefined }) }, { requiredKeys: [] });
    fc.assert(
      fc.property(fc.oneof(input, anyJson), (value) => {
        const parsed = cleaningSchema.safeParse(value);
        if (parsed.success) {
          expect(Number.isNaN(parsed.data.date.getTime())).toBe(false);
          expect(parsed.data.date.getTime()).toBeLessThanOrEqual(Date.now() + 86_400_000);
          if (parsed.data.cost !== undefined) expect(Number.isFinite(parsed.data.cost) && parsed.data.cost >= 0).toBe(true);
          if (parsed.data.endDate !== undefined) expect(parsed.data.endDate.getTime()).toBeGreaterThanOrEqual(parsed.data.date.getTime());
          return;
        }
        expect(parsed.error).toBeInstanceOf(z.ZodError);
        if (typeof value === "object" && value !== null && !Array.isArray(value)) for (const issue of parsed.error.issues) expect(issue.path.length + (issue.code === "unrecognized_keys" ? 1 : 0)).toBeGreaterThan(0);
      }),
      { numRuns: 3000 },
    );
  });
});

describe("parseImportRequestOptions (query parameters and multipart fields of the HTTP import)", () => {
  it("answers ok or a message naming the parameter, for any strings in any parameter", () => {
    const keys = fc.constantFrom("mapping", "timeZone", "decimal", "delimiter", "timestampFormat", "trustUnits", "fileName", "source", "__proto__", "other");
    const value = fc.oneof(fc.string({ maxLength: 40 }), fc.string({ unit: "binary", maxLength: 300 }), fc.constantFrom("{", "{}", "null", "[]", '{"columns":1}', "x".repeat(300), "\0"), fc.jsonValue({ maxDepth: 2 }).map((json) => JSON.stringify(json) ?? ""));
    fc.assert(
      fc.property(fc.dictionary(keys, value, { maxKeys: 6 }), fc.dictionary(keys, value, { maxKeys: 3 }), (query, fields) => {
        const parsed = parseImportRequestOptions(query, fields);
        if (parsed.ok) {
          expect(parsed.value.fileName.length).toBeGreaterThan(0);
          expect(["api", "web"]).toContain(parsed.value.source);
        } else {
          expect(parsed.message).toMatch(/^(mapping|timeZone|decimal|delimiter|timestampFormat|trustUnits|fileName|source|query)\b/);
        }
      }),
      { numRuns: 3000 },
    );
  });
});
