import { describe, expect, it } from "vitest";
import type { FleetHealthRow } from "../../lib/data/fleet-health";
import type { FleetStatus } from "../../lib/planning/fleet-status";
import {
  applyFleetQuery,
  DEFAULT_FLEET_PAGE,
  DEFAULT_FLEET_QUERY,
  fleetFilterLink,
  fleetPageHref,
  fleetQueryString,
  fleetTotals,
  pagerItems,
  pageSizeLink,
  parseFleetPage,
  parseFleetQuery,
  sliceFleetPage,
  sortLink,
} from "../../lib/present/fleet-query";

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

describe("parseFleetPage", () => {
  it("gives page 1 of 100 rows for an empty query", () => {
    expect(parseFleetPage({})).toEqual({ page: 1, per: 100 });
    expect(DEFAULT_FLEET_PAGE).toEqual({ page: 1, per: 100 });
  });
  it("reads the page number and each offered page size", () => {
    expect(parseFleetPage(new URLSearchParams("page=3&per=50"))).toEqual({ page: 3, per: 50 });
    expect(parseFleetPage({ per: "200" }).per).toBe(200);
    expect(parseFleetPage({ per: "100" }).per).toBe(100);
    expect(parseFleetPage({ per: "all" }).per).toBe("all");
    expect(parseFleetPage({ per: " ALL " }).per).toBe("all");
  });
  it("falls back to 100 rows for a page size it does not offer", () => {
    for (const per of ["25", "0", "-50", "50.5", "1e2", "every", "", "100000"]) expect(parseFleetPage({ per }).per, per).toBe(100);
  });
  it("falls back to page 1 for anything but a whole number from 1", () => {
    for (const page of ["0", "-2", "2.5", "1e3", "0x10", "two", "", "  "]) expect(parseFleetPage({ page }).page, page).toBe(1);
  });
  it("keeps a page beyond the last (sliceFleetPage clamps it) and bounds an enormous one", () => {
    expect(parseFleetPage({ page: "999" }).page).toBe(999);
    expect(parseFleetPage({ page: "9".repeat(40) }).page).toBe(Number.MAX_SAFE_INTEGER);
  });
  it("takes the first of repeated values, like the filters", () => {
    expect(parseFleetPage({ page: ["4", "2"], per: ["200", "50"] })).toEqual({ page: 4, per: 200 });
  });
  it("leaves the filters and sort as they were, so the API never pages", () => {
    const search = new URLSearchParams("status=watch&page=3&per=50");
    expect(parseFleetQuery(search)).toEqual({ ...DEFAULT_FLEET_QUERY, status: "watch" });
    expect(Object.keys(parseFleetQuery(search))).not.toContain("page");
    expect(Object.keys(parseFleetQuery(search))).not.toContain("per");
  });
});

describe("sliceFleetPage", () => {
  // 250 numbered rows: pages of 100 are 1–100, 101–200 and the partial 201–250.
  const numbers = Array.from({ length: 250 }, (_, index) => index + 1);
  it("gives the rows of a middle page and where they lie", () => {
    const slice = sliceFleetPage(numbers, { page: 2, per: 100 });
    expect(slice).toMatchObject({ page: 2, pageCount: 3, per: 100, firstRow: 101, lastRow: 200, total: 250 });
    expect(slice.rows).toHaveLength(100);
    expect(slice.rows[0]).toBe(101);
    expect(slice.rows.at(-1)).toBe(200);
  });
  it("gives the partial last page", () => {
    const slice = sliceFleetPage(numbers, { page: 3, per: 100 });
    expect(slice).toMatchObject({ page: 3, pageCount: 3, firstRow: 201, lastRow: 250 });
    expect(slice.rows).toEqual(numbers.slice(200));
  });
  it("shows the last page for a page beyond it", () => {
    expect(sliceFleetPage(numbers, { page: 4, per: 100 })).toMatchObject({ page: 3, firstRow: 201, lastRow: 250 });
    expect(sliceFleetPage(numbers, { page: Number.MAX_SAFE_INTEGER, per: 50 })).toMatchObject({ page: 5, pageCount: 5, firstRow: 201, lastRow: 250 });
  });
  it("has exactly full pages when the count divides evenly", () => {
    expect(sliceFleetPage(numbers, { page: 5, per: 50 })).toMatchObject({ pageCount: 5, firstRow: 201, lastRow: 250 });
    expect(sliceFleetPage(numbers.slice(0, 200), { page: 9, per: 200 })).toMatchObject({ page: 1, pageCount: 1, firstRow: 1, lastRow: 200 });
  });
  it("puts every row on one page for all", () => {
    const slice = sliceFleetPage(numbers, { page: 3, per: "all" });
    expect(slice).toMatchObject({ page: 1, pageCount: 1, firstRow: 1, lastRow: 250 });
    expect(slice.rows).toEqual(numbers);
  });
  it("gives one empty page for no rows", () => {
    expect(sliceFleetPage([], { page: 2, per: 100 })).toEqual({ rows: [], page: 1, pageCount: 1, per: 100, firstRow: 0, lastRow: 0, total: 0 });
    expect(sliceFleetPage([], { page: 1, per: "all" })).toMatchObject({ rows: [], pageCount: 1, firstRow: 0, lastRow: 0 });
  });
  it("shows the 24 demo exchangers on one page by default", () => {
    expect(sliceFleetPage(numbers.slice(0, 24), DEFAULT_FLEET_PAGE)).toMatchObject({ page: 1, pageCount: 1, firstRow: 1, lastRow: 24 });
  });
  it("does not change its input", () => {
    const rows = numbers.slice(0, 120);
    const before = [...rows];
    sliceFleetPage(rows, { page: 2, per: 50 });
    expect(rows).toEqual(before);
  });
});

describe("fleetPageHref, fleetFilterLink, sortLink and pageSizeLink", () => {
  const query = parseFleetQuery({ unit: "CDU", q: "E-1", sort: "cost" });
  it("keeps the filters and sort on page links and adds only non-default paging", () => {
    expect(fleetPageHref(query, { page: 3, per: 50 })).toBe("/?unit=CDU&q=E-1&sort=cost&per=50&page=3");
    expect(fleetPageHref(query, { page: 2, per: 100 })).toBe("/?unit=CDU&q=E-1&sort=cost&page=2");
    expect(fleetPageHref(query, { page: 1, per: 100 })).toBe("/?unit=CDU&q=E-1&sort=cost");
  });
  it("leaves the default view at /", () => {
    expect(fleetPageHref(DEFAULT_FLEET_QUERY, DEFAULT_FLEET_PAGE)).toBe("/");
    expect(fleetPageHref(parseFleetQuery({}), parseFleetPage({ page: "1", per: "100" }))).toBe("/");
  });
  it("never puts a page number on all", () => {
    expect(fleetPageHref(DEFAULT_FLEET_QUERY, { page: 4, per: "all" })).toBe("/?per=all");
  });
  it("round-trips filters, sort and paging through the address", () => {
    const href = fleetPageHref(query, { page: 2, per: 200 });
    const search = new URLSearchParams(href.slice(2));
    expect(parseFleetQuery(search)).toEqual(query);
    expect(parseFleetPage(search)).toEqual({ page: 2, per: 200 });
  });
  it("drops the page on filter links and keeps the page size", () => {
    // as the page builds a condition tile's link while on page 3 of 50 rows
    const paging = parseFleetPage({ page: "3", per: "50" });
    const href = fleetFilterLink({ ...query, status: "act-now" }, paging.per);
    expect(href).toBe("/?unit=CDU&status=act-now&q=E-1&sort=cost&per=50");
    expect(parseFleetPage(new URLSearchParams(href.slice(2))).page).toBe(1);
    expect(fleetFilterLink(DEFAULT_FLEET_QUERY, 100)).toBe("/");
  });
  it("drops the page on sort links and keeps the filters and page size", () => {
    expect(sortLink(query, "cost", 200)).toBe("/?unit=CDU&q=E-1&sort=cost&dir=asc&per=200");
    expect(sortLink(query, "tag", "all")).toBe("/?unit=CDU&q=E-1&sort=tag&per=all");
    expect(sortLink(query, "tag")).toBe("/?unit=CDU&q=E-1&sort=tag");
    expect(sortLink(query, "tag")).not.toContain("page=");
  });
  it("keeps the first row shown in view when the page size changes", () => {
    // row 201 is on page 5 of 50 rows, page 2 of 200, and page 3 of 100
    expect(pageSizeLink(query, 201, 50)).toBe("/?unit=CDU&q=E-1&sort=cost&per=50&page=5");
    expect(pageSizeLink(query, 201, 200)).toBe("/?unit=CDU&q=E-1&sort=cost&per=200&page=2");
    expect(pageSizeLink(query, 201, 100)).toBe("/?unit=CDU&q=E-1&sort=cost&page=3");
    expect(pageSizeLink(query, 201, "all")).toBe("/?unit=CDU&q=E-1&sort=cost&per=all");
    expect(pageSizeLink(DEFAULT_FLEET_QUERY, 0, 50)).toBe("/?per=50");
  });
});

describe("pagerItems", () => {
  it("lists every page up to seven", () => {
    expect(pagerItems(1, 1)).toEqual([1]);
    expect(pagerItems(3, 5)).toEqual([1, 2, 3, 4, 5]);
    expect(pagerItems(7, 7)).toEqual([1, 2, 3, 4, 5, 6, 7]);
  });
  it("keeps the first, last, current and neighbouring pages of ten, seven items in all", () => {
    expect(pagerItems(1, 10)).toEqual([1, 2, 3, 4, 5, "gap", 10]);
    expect(pagerItems(4, 10)).toEqual([1, 2, 3, 4, 5, "gap", 10]);
    expect(pagerItems(5, 10)).toEqual([1, "gap", 4, 5, 6, "gap", 10]);
    expect(pagerItems(6, 10)).toEqual([1, "gap", 5, 6, 7, "gap", 10]);
    expect(pagerItems(7, 10)).toEqual([1, "gap", 6, 7, 8, 9, 10]);
    expect(pagerItems(10, 10)).toEqual([1, "gap", 6, 7, 8, 9, 10]);
  });
  it("never leaves a gap for a single page", () => {
    expect(pagerItems(5, 8)).toEqual([1, "gap", 4, 5, 6, 7, 8]);
    expect(pagerItems(4, 8)).toEqual([1, 2, 3, 4, 5, "gap", 8]);
  });
  it("stays seven items long for a hundred pages", () => {
    expect(pagerItems(50, 100)).toEqual([1, "gap", 49, 50, 51, "gap", 100]);
    expect(pagerItems(100, 100)).toEqual([1, "gap", 96, 97, 98, 99, 100]);
  });
});
