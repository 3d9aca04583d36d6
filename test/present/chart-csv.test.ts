import { describe, expect, it } from "vitest";
import { displayAssetCharts, type AssetChartsSI } from "../../lib/present/asset-charts";
import { chartCsv, closureChartCsv, cyclesChartCsv, dutyChartCsv, foulingChartCsv, uChartCsv } from "../../lib/present/chart-csv";

const DAY = 86_400_000;
const T0 = Date.UTC(2026, 0, 1, 12);

/** A small chart set in SI, values chosen so the conversions are easy to check by hand. */
const SI: AssetChartsSI = {
  asOfMs: T0 + 2 * DAY,
  cleaningsMs: [T0 - DAY],
  u: [{ timeMs: T0, observed: 5.678263, clean: 2 * 5.678263 }],
  fouling: {
    observed: [{ timeMs: T0, rf: 1.761102e-1, cycle: 0 }],
    band: [{ timeMs: T0 + DAY, p10: 1e-4, p50: 2e-4, p90: 3e-4, lower95: 0.5e-4, upper95: 3.5e-4 }],
    criticalRf: 4e-4,
    designRf: 3.5e-4,
  },
  duty: {
    observed: [{ timeMs: T0, duty: 2.930711e5 }],
    band: [{ timeMs: T0 + DAY, central: 1e6, lower80: 0.9e6, upper80: 1.1e6, lower95: 0.8e6, upper95: 1.2e6 }],
    threshold: 8e5,
    clean: 1.3e6,
    crossing: { status: "ahead", p10Ms: T0 + 10 * DAY, p50Ms: T0 + 20 * DAY, p90Ms: T0 + 30 * DAY, crossedAtMs: null },
  },
  closure: {
    points: [
      { timeMs: T0 - DAY / 2, closurePercent: 1.25, usable: true, reason: null, alerts: [] },
      { timeMs: T0 + DAY / 2, closurePercent: -4, usable: false, reason: "=HYPERLINK(\"http://example.invalid\")", alerts: ["@TI-1 bias", "+FI,2 drift"] },
    ],
    alerts: [],
    endMs: T0 + 2 * DAY,
  },
  cycles: [
    { index: 0, startMs: T0 - 10 * DAY, current: false, points: [{ days: 10, rf: 1e-4 }] },
    { index: 1, startMs: T0, current: true, points: [{ days: 0.5, rf: 2e-4 }, { days: 1.5, rf: 2.5e-4 }] },
  ],
};

const lines = (text: string) => text.split("\r\n").filter((line) => line.length > 0);

describe("chart CSV builders", () => {
  it("name the unit of every numeric column in the header row, SI", () => {
    const charts = displayAssetCharts(SI, "si");
    expect(lines(uChartCsv(charts))[0]).toBe("time (UTC ISO-8601),observed U (W/(m2.K)),clean-model U at the day's flows (W/(m2.K)),U as % of clean (%)");
    expect(lines(foulingChartCsv(charts))[0]).toContain("observed Rf (m2.K/W)");
    expect(lines(dutyChartCsv(charts))[0]).toContain("duty from observed Rf (kW)");
    expect(lines(cyclesChartCsv(charts))[0]).toBe("cycle,cycle start (UTC ISO-8601),days since cycle start (d),Rf (m2.K/W)");
  });

  it("converts values to US customary units and says so in the header", () => {
    const charts = displayAssetCharts(SI, "us");
    const u = lines(uChartCsv(charts));
    expect(u[0]).toContain("observed U (Btu/(h.ft2.degF))");
    // NIST SP 811 (2008) B.8: 1 Btu_IT/(h·ft²·°F) = 5.678 263 W/(m²·K); the ratio to clean is unit-free (50 %)
    const [time, observed, clean, percent] = (u[1] ?? "").split(",");
    expect(time).toBe("2026-01-01T12:00:00.000Z");
    expect(Number(observed)).toBeCloseTo(1, 6);
    expect(Number(clean)).toBeCloseTo(2, 6);
    expect(Number(percent)).toBeCloseTo(50, 9);
    // NIST SP 811 (2008) B.8: 1 Btu_IT/h = 0.293 071 1 W, so 2.930 711e5 W = 1 MMBtu/h
    const duty = lines(dutyChartCsv(charts));
    expect(duty[0]).toContain("duty from observed Rf (MMBtu/h)");
    expect(Number(duty[1]?.split(",")[1])).toBeCloseTo(1, 6);
    // NIST SP 811 (2008) B.8: 1 h·ft²·°F/Btu_IT = 0.176 110 2 m²·K/W
    expect(Number(lines(foulingChartCsv(charts))[1]?.split(",")[2])).toBeCloseTo(1, 6);
  });

  it("gives the duty threshold, clean duty and P10/P50/P90 dates once, on the first row", () => {
    const rows = lines(dutyChartCsv(displayAssetCharts(SI, "si"))).map((line) => line.split(","));
    expect(rows[0]?.slice(7)).toEqual(["threshold (kW)", "clean duty (kW)", "threshold status", "threshold P10 (UTC)", "threshold P50 (UTC)", "threshold P90 (UTC)"]);
    expect(rows[1]?.slice(7)).toEqual(["800", "1300", "ahead", "2026-01-11T12:00:00.000Z", "2026-01-21T12:00:00.000Z", "2026-01-31T12:00:00.000Z"]);
    expect(rows[2]?.slice(7).every((cell) => cell === "")).toBe(true);
    // the rectangle: every row as wide as the header
    expect(new Set(rows.map((row) => row.length))).toEqual(new Set([13]));
  });

  it("orders trend rows after observed rows in time and keeps the 80 % and 95 % bands apart", () => {
    const rows = lines(foulingChartCsv(displayAssetCharts(SI, "si"))).map((line) => line.split(","));
    expect(rows[2]).toEqual(["2026-01-02T12:00:00.000Z", "", "", "0.0002", "0.0001", "0.0003", "0.00005", "0.00035"]);
  });

  it("neutralises formula triggers and quotes delimiters in text cells (OWASP CSV injection, RFC 4180)", () => {
    const text = closureChartCsv(displayAssetCharts(SI, "si"));
    const row = lines(text)[2] ?? "";
    // OWASP "CSV Injection": a leading = + - @ gets a single quote; RFC 4180 §2.6-2.7: quotes doubled inside quotes
    expect(row).toContain(`"'=HYPERLINK(""http://example.invalid"")"`);
    expect(row).toContain(`"'@TI-1 bias; +FI,2 drift"`);
    expect(row.startsWith("2026-01-02T00:00:00.000Z,-4,false,")).toBe(true);
    // a negative number stays a number (it is not user text)
    expect(row).not.toContain("'-4");
    expect(text.endsWith("\r\n")).toBe(true);
  });

  it("writes one row per cycle point with days since the cycle start", () => {
    const rows = lines(chartCsv("cycles", displayAssetCharts(SI, "si")));
    expect(rows.slice(1)).toEqual([
      "0,2025-12-22T12:00:00.000Z,10,0.0001",
      "1,2026-01-01T12:00:00.000Z,0.5,0.0002",
      "1,2026-01-01T12:00:00.000Z,1.5,0.00025",
    ]);
  });
});
