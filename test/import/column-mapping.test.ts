import { describe, expect, it } from "vitest";
import { columnMappingSchema, describeMappingIssues, hasUnknownUnitIssue } from "../../lib/validation/column-mapping";

const MAPPING = {
  timestamp: { column: "Time" },
  columns: {
    hotIn: { column: "TI-101", unit: "°C" },
    hotOut: { column: "TI-102", unit: "C" },
    coldIn: { column: "TI-103", unit: "degF" },
    coldOut: { column: "TI-104", unit: "K" },
    hotFlow: { column: "FI-101", unit: "t/h" },
    coldFlow: { column: "FI-102", unit: "lb/hr" },
    hotPressureDrop: { column: "PDI-101", unit: "bar" },
  },
};

describe("columnMappingSchema", () => {
  it("fills defaults and turns unit spellings into unit ids", () => {
    // unit spellings of lib/core/units UNIT_TABLE; defaults documented in lib/validation/column-mapping.ts
    const parsed = columnMappingSchema.parse(MAPPING);
    expect(parsed.timestamp).toEqual({ column: "Time", format: "auto" });
    expect(parsed.delimiter).toBe("auto");
    expect(parsed.decimalMark).toBe("auto");
    expect(parsed.timeZone).toBeUndefined();
    expect(Object.values(parsed.columns).map((entry) => entry?.unit)).toEqual(["degC", "degC", "degF", "K", "t/h", "lb/h", "bar"]);
  });

  it("refuses an unknown unit, marking the issue as such", () => {
    const result = columnMappingSchema.safeParse({ ...MAPPING, columns: { ...MAPPING.columns, hotIn: { column: "TI-101", unit: "degX" } } });
    expect(result.success).toBe(false);
    if (result.success) return;
    expect(hasUnknownUnitIssue(result.error)).toBe(true);
    expect(describeMappingIssues(result.error)).toBe('columns.hotIn.unit: hotIn: unknown temperature unit "degX"; allowed: K, °C, °F, °R');
  });

  it("refuses a missing required role, a shared column, an unknown time zone and unknown keys", () => {
    const { coldFlow: _omitted, ...withoutColdFlow } = MAPPING.columns;
    expect(columnMappingSchema.safeParse({ ...MAPPING, columns: withoutColdFlow }).success).toBe(false);
    const shared = columnMappingSchema.safeParse({ ...MAPPING, columns: { ...MAPPING.columns, hotOut: { column: "ti-101", unit: "C" } } });
    expect(shared.success ? "" : describeMappingIssues(shared.error)).toBe('columns.hotOut.column: column "ti-101" is mapped to both hotIn and hotOut');
    const zone = columnMappingSchema.safeParse({ ...MAPPING, timeZone: "Europe/Atlantis" });
    expect(zone.success ? "" : describeMappingIssues(zone.error)).toBe("timeZone: unknown time zone; give an IANA name such as Europe/Amsterdam or UTC");
    expect(columnMappingSchema.safeParse({ ...MAPPING, sheet: 1 }).success).toBe(false);
  });
});
