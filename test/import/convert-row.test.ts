import { describe, expect, it } from "vitest";
import { RowConverter } from "../../lib/import/convert-row";
import type { ResolvedColumns } from "../../lib/import/resolve-columns";

const COLUMNS: ResolvedColumns = {
  timestamp: { column: "timestamp", index: 0 },
  measurements: [
    { role: "hotIn", quantity: "temperature", column: "hot_in_C", index: 1, unit: "degC" },
    { role: "hotOut", quantity: "temperature", column: "hot_out_K", index: 2, unit: "K" },
    { role: "hotFlow", quantity: "massFlow", column: "hot_flow_kg_s", index: 3, unit: "kg/s" },
    { role: "hotPressureDrop", quantity: "pressureDrop", column: "hot_dp_kPa", index: 4, unit: "kPa" },
  ],
  ignoredColumns: [],
  headerCount: 5,
};

function converter(timeZone = "UTC", decimalMark: "." | "," = ".", format: "iso" | "YYYY-MM-DD HH:mm[:ss]" = "iso") {
  return new RowConverter({ columns: COLUMNS, timestampFormat: format, timeZone, decimalMark });
}

describe("RowConverter", () => {
  it("converts a row to SI and keeps missing cells as null", () => {
    // NIST SP 811 (2008) B.9: T/K = t/°C + 273.15; B.8: 1 kPa = 1000 Pa
    expect(converter().convert(["2026-03-01T10:00Z", "100", "350.5", "", "12.5"], 2)).toEqual({
      ok: true,
      timeMs: Date.UTC(2026, 2, 1, 10),
      values: [373.15, 350.5, null, 12_500],
    });
  });

  it("rejects a wrong field count, tolerating empty trailing fields", () => {
    // message format: expected N fields as in the header, found M (common practice of CSV validators)
    const rows = converter();
    expect(rows.convert(["2026-03-01T10:00Z", "100", "350"], 2)).toEqual({ ok: false, reason: "expected 5 fields as in the header, found 3" });
    expect(rows.convert(["2026-03-01T10:00Z", "100", "350", "10", "1", "x"], 3)).toEqual({ ok: false, reason: "expected 5 fields as in the header, found 6" });
    expect(rows.convert(["2026-03-01T10:00Z", "100", "350", "10", "1", ""], 4).ok).toBe(true);
  });

  it("names the column of a value that is not a number, with a hint about the decimal mark", () => {
    const rows = converter();
    expect(rows.convert(["2026-03-01T10:00Z", "abc", "350", "10", "1"], 2)).toEqual({ ok: false, reason: 'hot_in_C: "abc" is not a number' });
    expect(rows.convert(["2026-03-01T10:00Z", "12,5", "350", "10", "1"], 3)).toEqual({ ok: false, reason: 'hot_in_C: "12,5" is not a number with the decimal mark "."' });
  });

  it("rejects a negative flow, a temperature at or below absolute zero and values outside the plausible range", () => {
    // message for a negative flow from the issue; ranges from lib/import/plausible-ranges.ts (common practice)
    const rows = converter();
    expect(rows.convert(["2026-03-01T10:00Z", "100", "350", "-3.2", "1"], 2)).toEqual({ ok: false, reason: "hot_flow_kg_s = -3.2: a mass flow cannot be negative" });
    // −300 °C is below −273.15 °C = 0 K (NIST SP 811 B.9)
    expect(rows.convert(["2026-03-01T10:00Z", "-300", "350", "10", "1"], 3)).toEqual({ ok: false, reason: "hot_in_C = -300: a temperature at or below absolute zero (0 K) is impossible" });
    // 1500 °C = 1773.15 K > 1200 K
    expect(rows.convert(["2026-03-01T10:00Z", "1500", "350", "10", "1"], 4)).toEqual({
      ok: false,
      reason: "hot_in_C = 1500 (1773.15 K): outside the plausible range 150–1200 K for a temperature",
    });
    expect(rows.convert(["2026-03-01T10:00Z", "100", "350", "200000", "1"], 5)).toEqual({
      ok: false,
      reason: "hot_flow_kg_s = 200000 (200000 kg/s): above the plausible maximum 100000 kg/s for a mass flow",
    });
    expect(rows.convert(["2026-03-01T10:00Z", "100", "350", "10", "-1"], 6)).toEqual({ ok: false, reason: "hot_dp_kPa = -1: a pressure drop cannot be negative" });
  });

  it("rejects a row whose every mapped cell is missing", () => {
    expect(converter().convert(["2026-03-01T10:00Z", "", "NaN", "#N/A", "Bad"], 2)).toEqual({
      ok: false,
      reason: "no measured values in the row (every mapped cell is empty or marks a missing value)",
    });
  });

  it("rejects a duplicate timestamp naming the first line, and a time going backwards", () => {
    // messages from the issue
    const rows = converter();
    expect(rows.convert(["2026-03-01T10:00Z", "100", "350", "10", "1"], 12).ok).toBe(true);
    expect(rows.convert(["2026-03-01T10:00Z", "101", "350", "10", "1"], 13)).toEqual({ ok: false, reason: "duplicate timestamp 2026-03-01T10:00Z, first at line 12" });
    expect(rows.convert(["2026-03-01T10:05Z", "101", "350", "10", "1"], 40).ok).toBe(true);
    expect(rows.convert(["2026-03-01T10:01Z", "101", "350", "10", "1"], 41)).toEqual({ ok: false, reason: "timestamp earlier than line 40's; rows must be in time order" });
  });

  it("lists every problem of a row, and a rejected row does not move the time order on", () => {
    const rows = converter();
    expect(rows.convert(["2026-03-01T10:00Z", "abc", "350", "-1", "1"], 2)).toEqual({
      ok: false,
      reason: 'hot_in_C: "abc" is not a number; hot_flow_kg_s = -1: a mass flow cannot be negative',
    });
    expect(rows.convert(["2026-03-01T10:00Z", "100", "350", "10", "1"], 3).ok).toBe(true);
  });

  it("reads a repeated local hour in order: the earlier offset first, the later one when time would go back", () => {
    // Europe/Amsterdam, 2026-10-25: 02:00–02:59 occurs at 00:00–00:59Z (CEST) and again at 01:00–01:59Z (CET)
    // (EU Directive 2000/84/EC: summer time ends at 01:00 UTC on the last Sunday of October)
    const rows = converter("Europe/Amsterdam", ".", "YYYY-MM-DD HH:mm[:ss]");
    const times = ["2026-10-25 01:30", "2026-10-25 02:00", "2026-10-25 02:30", "2026-10-25 02:00", "2026-10-25 02:30", "2026-10-25 03:00"].map(
      (text, index) => rows.convert([text, "100", "350", "10", "1"], index + 2),
    );
    expect(times.map((row) => (row.ok ? new Date(row.timeMs).toISOString().slice(11, 16) : row.reason))).toEqual(["23:30", "00:00", "00:30", "01:00", "01:30", "02:00"]);
  });

  it("reads decimal commas when the file uses them", () => {
    // 12,5 °C = 285.65 K (NIST SP 811 B.9)
    const row = converter("UTC", ",").convert(["2026-03-01T10:00Z", "12,5", "350", "1,25", ""], 2);
    expect(row.ok && row.values[0]).toBeCloseTo(285.65, 12);
    expect(row.ok && row.values[2]).toBe(1.25);
  });
});
