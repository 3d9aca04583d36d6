import { describe, expect, it } from "vitest";
import { mappingFromCanonicalHeaders, readCanonicalHeader } from "../../lib/import/canonical-header";

const CANONICAL = ["timestamp", "hot_in_C", "hot_out_C", "cold_in_C", "cold_out_C", "hot_flow_kg_s", "cold_flow_kg_s"];

describe("readCanonicalHeader", () => {
  it("reads <role>_<unit> names in any letter case", () => {
    // header grammar of docs/import.md
    expect(readCanonicalHeader("Hot_In_C")).toEqual({ kind: "measurement", role: "hotIn", unit: "degC" });
    expect(readCanonicalHeader(" COLD_OUT_F ")).toEqual({ kind: "measurement", role: "coldOut", unit: "degF" });
    expect(readCanonicalHeader("hot_flow_T_H")).toEqual({ kind: "measurement", role: "hotFlow", unit: "t/h" });
    expect(readCanonicalHeader("cold_flow_lb_h")).toEqual({ kind: "measurement", role: "coldFlow", unit: "lb/h" });
    expect(readCanonicalHeader("hot_dp_kpa")).toEqual({ kind: "measurement", role: "hotPressureDrop", unit: "kPa" });
    expect(readCanonicalHeader("cold_dp_psi")).toEqual({ kind: "measurement", role: "coldPressureDrop", unit: "psi" });
    expect(readCanonicalHeader("TimeStamp")).toEqual({ kind: "timestamp" });
    expect(readCanonicalHeader("operator_note")).toEqual({ kind: "other" });
  });

  it("reports a known role with a unit of the wrong quantity or an unknown unit", () => {
    // allowed temperature tokens of the grammar: C, F, K, R
    expect(readCanonicalHeader("hot_in_kg_s")).toEqual({
      kind: "unknown-unit",
      role: "hotIn",
      message: 'column "hot_in_kg_s": unknown unit "kg_s" for the hot inlet temperature; allowed: C, F, K, R',
    });
  });
});

describe("mappingFromCanonicalHeaders", () => {
  it("maps the canonical header with no mapping at all", () => {
    // canonical header from the issue
    const result = mappingFromCanonicalHeaders(CANONICAL);
    expect(result).toEqual({
      ok: true,
      mapping: {
        timestamp: { column: "timestamp", format: "auto" },
        delimiter: "auto",
        decimalMark: "auto",
        columns: {
          hotIn: { column: "hot_in_C", unit: "degC" },
          hotOut: { column: "hot_out_C", unit: "degC" },
          coldIn: { column: "cold_in_C", unit: "degC" },
          coldOut: { column: "cold_out_C", unit: "degC" },
          hotFlow: { column: "hot_flow_kg_s", unit: "kg/s" },
          coldFlow: { column: "cold_flow_kg_s", unit: "kg/s" },
        },
      },
    });
  });

  it("names the missing roles and lists the columns found", () => {
    // message format from the issue: no column for cold outlet temperature (coldOut); columns found: ...
    const result = mappingFromCanonicalHeaders(CANONICAL.filter((name) => name !== "cold_out_C"));
    expect(result.ok ? "" : result.message).toMatch(
      /^no column for cold outlet temperature \(coldOut\); columns found: timestamp, hot_in_C, hot_out_C, cold_in_C, hot_flow_kg_s, cold_flow_kg_s\./,
    );
    const none = mappingFromCanonicalHeaders(["time", "a"]);
    expect(none.ok ? "" : none.message).toContain("no column for the timestamp or hot inlet temperature (hotIn), hot outlet temperature (hotOut)");
  });

  it("refuses two columns for one role", () => {
    const result = mappingFromCanonicalHeaders([...CANONICAL, "hot_in_F"]);
    expect(result).toEqual({ ok: false, code: "duplicate-columns", message: 'two columns for the hot inlet temperature (hotIn): "hot_in_C" and "hot_in_F"' });
  });
});
