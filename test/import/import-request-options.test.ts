import { describe, expect, it } from "vitest";
import { parseImportRequestOptions } from "../../lib/import/import-request-options";
import { resolveImportLimits } from "../../lib/import/import-limits";

describe("parseImportRequestOptions", () => {
  it("reads mapping=saved|canonical, the overrides and the file name", () => {
    // query parameters documented in docs/import.md
    expect(parseImportRequestOptions({ mapping: "canonical", timeZone: "UTC", decimal: ",", delimiter: "tab", trustUnits: "true", fileName: "a.csv" })).toEqual({
      ok: true,
      value: {
        mapping: undefined,
        fileName: "a.csv",
        source: "api",
        options: { mappingSource: "canonical", timeZone: "UTC", decimalMark: ",", delimiter: "\t", timestampFormat: undefined, trustUnits: true },
      },
    });
  });

  it("reads a mapping given as JSON, query parameters before multipart fields", () => {
    const result = parseImportRequestOptions({ mapping: '{"timestamp":{"column":"t"}}' }, { mapping: "saved", decimal: "," });
    expect(result.ok && result.value.mapping).toEqual({ timestamp: { column: "t" } });
    expect(result.ok && result.value.options.decimalMark).toBe(",");
  });

  it("names the parameter that is wrong", () => {
    expect(parseImportRequestOptions({ decimal: ";" })).toMatchObject({ ok: false, message: expect.stringContaining("decimal:") });
    expect(parseImportRequestOptions({ mapping: "{oops" })).toEqual({ ok: false, message: 'mapping: give "auto", "saved", "canonical" or a column mapping as JSON' });
    expect(parseImportRequestOptions({ source: "cli" })).toMatchObject({ ok: false });
  });
});

describe("resolveImportLimits", () => {
  it("uses the defaults, then the environment, then the caller's values", () => {
    // defaults from the issue: 200 MB, 50 % of the first 1000 rows, 10,000 listed rejects
    expect(resolveImportLimits({}, {})).toMatchObject({ maxBytes: 200 * 1024 * 1024, maxRejectShare: 0.5, rejectSampleRows: 1000, maxRejectsKept: 10_000 });
    expect(resolveImportLimits({}, { FOULCAST_MAX_IMPORT_BYTES: "1000", FOULCAST_IMPORT_MAX_REJECT_SHARE: "0.2" })).toMatchObject({ maxBytes: 1000, maxRejectShare: 0.2 });
    expect(resolveImportLimits({ maxBytes: 10 }, { FOULCAST_MAX_IMPORT_BYTES: "1000" }).maxBytes).toBe(10);
    expect(() => resolveImportLimits({}, { FOULCAST_MAX_IMPORT_BYTES: "lots" })).toThrow('FOULCAST_MAX_IMPORT_BYTES must be a positive whole number, got "lots"');
  });
});
