import { describe, expect, it } from "vitest";
import type { FleetHealthRow } from "../../lib/data/fleet-health";
import type { FleetStatus } from "../../lib/planning/fleet-status";
import { applyFleetQuery, DEFAULT_FLEET_QUERY, fleetQueryString, fleetTotals, parseFleetQuery, sortLink } from "../../lib/present/fleet-query";

function row(tag: string, fields: { status?: FleetStatus; unit?: string; site?: string; service?: string; cost?: number | null; p50?: string | null; alerts?: number; fouling?: number | null; currency?: string }): FleetHealthRow {
  return {
    tag,
    name: `Exchanger ${tag}`,
    siteCode: fields.site ?? "BRK",
    siteName: "Brakwater",
    siteTimeZone: "Europe/Amsterdam",
    unitCode: fields.unit ?? "CDU",
    unitName: "Crude unit",
    service: fields.service ?? "crude preheat",
    status: fields.status ?? "good",
    summary:
      fields.fouling === null
        ? null
        : {
            asOf: "2026-06-01T00:00:00.000Z",
            currentUWPerM2K: 300,
            percentOfClean: 80,
            foulingM2KPerW: fields.fouling ?? 3e-4,
            cleanDutyW: 5e6,
            dutyLossW: 4e5,
            threshold: { status: "ahead", p10: null, p50: fields.p50 ?? null, p90: null, crossedAt: null },
            trendModel: "linear",
            economics: fields.cost === null || fields.cost === undefined ? null : { currency: fields.currency ?? "EUR", costPerDay: fields.cost, cycleCostToDate: 0, optimalIntervalDays: null },
            economicsNote: null,
            sparkline: [],
          },
    openAlerts: fields.alerts ?? 0,
    lastCleaning: null,
    nextCleaning: null,
  };
}

const ROWS: FleetHealthRow[] = [
  row("E-102", { status: "watch", cost: 500, p50: "2026-12-01T00:00:00Z", alerts: 2 }),
  row("E-101", { status: "act-now", cost: 1500, p50: "2026-07-01T00:00:00Z", unit: "VDU" }),
  row("E-201", { status: "good", cost: null, p50: null, service: "product cooler" }),
  row("E-301", { status: "no-estimate", fouling: null }),
  row("X-9", { status: "plan-cleaning", cost: 900, p50: "2026-09-01T00:00:00Z", site: "NRD", currency: "USD", alerts: 1 }),
];

describe("parseFleetQuery", () => {
  it("reads every filter and the sort from the URL", () => {
    const query = parseFleetQuery(new URLSearchParams("site=BRK&unit=CDU&service=crude+preheat&status=watch&q=e-1&sort=cost&dir=asc"));
    expect(query).toEqual({ site: "BRK", unit: "CDU", service: "crude preheat", status: "watch", q: "e-1", sort: "cost", dir: "asc" });
  });
  it("gives the defaults for an empty query", () => {
    expect(parseFleetQuery({})).toEqual(DEFAULT_FLEET_QUERY);
  });
  it("ignores an unknown sort key, direction and status instead of failing", () => {
    const query = parseFleetQuery({ sort: "drop table", dir: "sideways", status: "on-fire" });
    expect(query.sort).toBe("status");
    expect(query.dir).toBe("asc");
    expect(query.status).toBeNull();
  });
  it("opens money and loss columns worst-first when no direction is given", () => {
    expect(parseFleetQuery({ sort: "cost" }).dir).toBe("desc");
    expect(parseFleetQuery({ sort: "tag" }).dir).toBe("asc");
  });
  it("takes the first of repeated values, trims, drops control characters and bounds the length", () => {
    const query = parseFleetQuery({ unit: ["VDU", "CDU"], q: `  E-1\u0000\n  `, site: "x".repeat(500) });
    expect(query.unit).toBe("VDU");
    expect(query.q).toBe("E-1");
    expect(query.site).toHaveLength(100);
  });
  it("treats blank values as no filter", () => {
    expect(parseFleetQuery({ site: "", q: "   " })).toMatchObject({ site: null, q: null });
  });
});

describe("fleetQueryString and sortLink", () => {
  it("round-trips a query through the URL, leaving defaults out", () => {
    const query = parseFleetQuery({ status: "act-now", q: "E 1&2", sort: "cost", dir: "asc" });
    const text = fleetQueryString(query);
    expect(text).toBe("?status=act-now&q=E+1%262&sort=cost&dir=asc");
    expect(parseFleetQuery(new URLSearchParams(text.slice(1)))).toEqual(query);
    expect(fleetQueryString(DEFAULT_FLEET_QUERY)).toBe("");
  });
  it("flips the direction of the active column and keeps the filters", () => {
    const query = parseFleetQuery({ sort: "cost", unit: "CDU" });
    expect(sortLink(query, "cost")).toBe("/?unit=CDU&sort=cost&dir=asc");
    expect(sortLink(query, "tag")).toBe("/?unit=CDU&sort=tag");
  });
});

describe("applyFleetQuery", () => {
  const tags = (rows: FleetHealthRow[]) => rows.map((entry) => entry.tag);
  it("sorts by condition, most urgent first, by default", () => {
    expect(tags(applyFleetQuery(ROWS, DEFAULT_FLEET_QUERY))).toEqual(["E-101", "X-9", "E-102", "E-201", "E-301"]);
  });
  it("sorts by cost both ways with uncosted exchangers last either way", () => {
    expect(tags(applyFleetQuery(ROWS, parseFleetQuery({ sort: "cost" })))).toEqual(["E-101", "X-9", "E-102", "E-201", "E-301"]);
    expect(tags(applyFleetQuery(ROWS, parseFleetQuery({ sort: "cost", dir: "asc" })))).toEqual(["E-102", "X-9", "E-101", "E-201", "E-301"]);
  });
  it("sorts by threshold date and by tag", () => {
    expect(tags(applyFleetQuery(ROWS, parseFleetQuery({ sort: "threshold" }))).slice(0, 3)).toEqual(["E-101", "X-9", "E-102"]);
    expect(tags(applyFleetQuery(ROWS, parseFleetQuery({ sort: "tag", dir: "desc" })))).toEqual(["X-9", "E-301", "E-201", "E-102", "E-101"]);
  });
  it("filters by site, unit, service, status and a case-insensitive tag search", () => {
    expect(tags(applyFleetQuery(ROWS, parseFleetQuery({ site: "NRD" })))).toEqual(["X-9"]);
    expect(tags(applyFleetQuery(ROWS, parseFleetQuery({ unit: "VDU" })))).toEqual(["E-101"]);
    expect(tags(applyFleetQuery(ROWS, parseFleetQuery({ service: "product cooler" })))).toEqual(["E-201"]);
    expect(tags(applyFleetQuery(ROWS, parseFleetQuery({ status: "watch" })))).toEqual(["E-102"]);
    expect(tags(applyFleetQuery(ROWS, parseFleetQuery({ q: "e-10", sort: "tag" })))).toEqual(["E-101", "E-102"]);
    expect(applyFleetQuery(ROWS, parseFleetQuery({ q: "nothing like it" }))).toEqual([]);
  });
  it("does not change its input", () => {
    const before = tags(ROWS);
    applyFleetQuery(ROWS, parseFleetQuery({ sort: "cost" }));
    expect(tags(ROWS)).toEqual(before);
  });
});

describe("fleetTotals", () => {
  it("counts per condition and sums cost per currency and alerts", () => {
    const totals = fleetTotals(ROWS);
    expect(totals.byStatus).toEqual({ "act-now": 1, "plan-cleaning": 1, watch: 1, good: 1, "no-estimate": 1 });
    expect(totals.costPerDayByCurrency).toEqual([
      { currency: "EUR", costPerDay: 2000, assets: 2 },
      { currency: "USD", costPerDay: 900, assets: 1 },
    ]);
    expect(totals).toMatchObject({ count: 5, openAlerts: 3, assetsWithAlerts: 2 });
  });
});
