import { describe, expect, it } from "vitest";
import type { AssessmentSummary } from "../../lib/planning/assessment-summary";
import type { FleetStatus } from "../../lib/planning/fleet-status";
import { monthlyReport, type MonthlyReportInput } from "../../lib/report/monthly-report";
import { reportMonth } from "../../lib/report/report-month";

const ZONE = "Europe/Amsterdam";
const NOVEMBER = reportMonth("2026-11", ZONE);
const at = (iso: string) => Date.parse(iso);

function summary(costPerDay: number | null, dutyLossW: number | null, percentOfClean: number | null = 80): AssessmentSummary {
  return {
    asOf: "2026-11-30T23:00:00.000Z",
    currentUWPerM2K: 300,
    percentOfClean,
    foulingM2KPerW: 4e-4,
    cleanDutyW: 5e6,
    dutyLossW,
    threshold: { status: "ahead", p10: null, p50: null, p90: null, crossedAt: null },
    trendModel: "linear",
    economics: costPerDay === null ? null : { currency: "EUR", costPerDay, cycleCostToDate: 0, optimalIntervalDays: null },
    economicsNote: costPerDay === null ? "no economics" : null,
    sparkline: [],
  };
}

function asset(tag: string, unitCode: string, now: [FleetStatus, number | null, number | null], before: [FleetStatus, number | null, number | null]) {
  return {
    tag,
    name: `Exchanger ${tag}`,
    unitCode,
    unitName: `Unit ${unitCode}`,
    atMonthEnd: { status: now[0], summary: now[1] === null && now[2] === null ? null : summary(now[1], now[2]) },
    atPreviousMonthEnd: { status: before[0], summary: before[1] === null && before[2] === null ? null : summary(before[1], before[2]) },
  };
}

function input(overrides: Partial<MonthlyReportInput> = {}): MonthlyReportInput {
  return {
    site: { code: "TST", name: "Test site", timeZone: ZONE, currency: "EUR" },
    month: NOVEMBER,
    generatedAtMs: at("2026-12-01T08:00:00Z"),
    dataEndMs: at("2026-12-01T00:00:00Z"),
    assets: [
      asset("A-1", "U1", ["act-now", 900, 3e5], ["plan-cleaning", 700, 2.5e5]),
      asset("A-2", "U1", ["good", 100, 1e4], ["good", 120, 1.2e4]),
      asset("B-1", "U2", ["watch", 400, 1e5], ["good", 300, 0.8e5]),
      asset("B-2", "U2", ["no-estimate", null, null], ["no-estimate", null, null]),
    ],
    cleanings: [],
    alerts: [],
    plan: null,
    ...overrides,
  };
}

describe("monthlyReport", () => {
  it("counts each category at both month ends and lists the exchangers that changed", () => {
    const report = monthlyReport(input());
    const counts = Object.fromEntries(report.categories.map((category) => [category.status, [category.previousCount, category.count]]));
    expect(counts).toEqual({ "act-now": [0, 1], "plan-cleaning": [1, 0], watch: [0, 1], good: [2, 1], "no-estimate": [1, 1] });
    expect(report.categories.reduce((sum, category) => sum + category.count, 0)).toBe(4);
    // most urgent new category first
    expect(report.categoryChanges.map((change) => [change.tag, change.from, change.to])).toEqual([
      ["A-1", "plan-cleaning", "act-now"],
      ["B-1", "good", "watch"],
    ]);
  });

  it("sums cost per day and duty loss over the exchangers that have them, and per unit", () => {
    const report = monthlyReport(input());
    expect(report.totals).toEqual({ costPerDay: 1400, previousCostPerDay: 1120, costedAssets: 3, previousCostedAssets: 3, dutyLossW: 4.1e5, previousDutyLossW: 3.42e5 });
    expect(report.units.map((unit) => [unit.code, unit.assets, unit.costPerDay, unit.previousCostPerDay])).toEqual([
      ["U1", 2, 1000, 820],
      ["U2", 2, 400, 300],
    ]);
  });

  it("ranks the ten costliest exchangers by cost per day, ties by tag, leaving out those without a cost", () => {
    const assets = Array.from({ length: 14 }, (_, index) =>
      asset(`X-${String(index).padStart(2, "0")}`, "U1", ["watch", index === 13 ? null : [50, 400, 400, 30, 900, 10, 0, 700, 5, 60, 70, 80, 90][index] ?? 0, 1e4], ["watch", 1, 1]),
    );
    const report = monthlyReport(input({ assets }));
    expect(report.topAssets).toHaveLength(10);
    expect(report.topAssets.map((row) => row.tag)).toEqual(["X-04", "X-07", "X-01", "X-02", "X-12", "X-11", "X-10", "X-09", "X-00", "X-03"]);
    expect(report.topAssets.map((row) => row.rank)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
    expect(report.topAssets[0]).toMatchObject({ costPerDay: 900, previousCostPerDay: 1, dutyLossW: 1e4, percentOfClean: 80 });
    // zero cost and no economics never enter the table
    expect(report.topAssets.some((row) => row.tag === "X-06" || row.tag === "X-13")).toBe(false);
  });

  it("counts a cleaning in the site month in which the exchanger went out of service", () => {
    const cleaning = (tag: string, iso: string) => ({ tag, dateMs: at(iso), endDateMs: at(iso) + 4 * 86_400_000, method: "hydroblast", costCents: 2_500_000, effectiveness: 0.8 });
    const report = monthlyReport(
      input({
        cleanings: [
          // 00:30 on 1 November in Amsterdam (UTC+1)
          cleaning("A-1", "2026-10-31T23:30:00Z"),
          // 00:30 on 1 December in Amsterdam
          cleaning("A-2", "2026-11-30T23:30:00Z"),
          // 23:30 on 31 October in Amsterdam
          cleaning("B-1", "2026-10-31T22:30:00Z"),
          { ...cleaning("B-2", "2026-11-12T06:00:00Z"), costCents: null },
        ],
      }),
    );
    expect(report.cleaningsDone.map((row) => [row.tag, row.outOfService])).toEqual([
      ["A-1", "2026-11-01"],
      ["B-2", "2026-11-12"],
    ]);
    expect(report.cleaningsDoneCost).toEqual({ total: 25_000, unknownCost: 1 });
    expect(report.cleaningsDone[0]?.returnToService).toBe("2026-11-05");
  });

  it("lists the plan's cleanings of the next three months only", () => {
    const planned = (tag: string, start: string) => ({ tag, start, state: "proposed" as const, window: "routine", method: "routine cleaning", outageDays: 5, cost: 30_000, saving: 12_000 });
    const report = monthlyReport(
      input({
        plan: {
          id: 7,
          createdAt: "2026-12-01T09:00:00.000Z",
          horizonStart: "2026-11-30",
          cleanings: [planned("A-1", "2026-11-30"), planned("A-2", "2027-02-28"), planned("B-1", "2026-12-07"), planned("B-2", "2027-03-01")],
        },
      }),
    );
    expect(report.planned.from).toBe("2026-12-01");
    expect(report.planned.to).toBe("2027-02-28");
    expect(report.planned.cleanings.map((row) => row.tag)).toEqual(["B-1", "A-2"]);
    expect(report.planned.totalCost).toBe(60_000);
    expect(monthlyReport(input({ plan: null })).planned.plan).toBeNull();
  });

  it("sorts alerts into opened, open at month end and acknowledged in the month", () => {
    const alert = (id: number, start: string, acknowledged: string | null) => ({
      id,
      tag: "A-1",
      instrumentTag: `TI-${id}`,
      role: "hotIn",
      kind: "drift",
      startMs: at(start),
      endMs: null,
      acknowledgedAtMs: acknowledged === null ? null : at(acknowledged),
      acknowledgedBy: acknowledged === null ? null : "engineer@test.example",
    });
    const report = monthlyReport(
      input({
        alerts: [
          alert(1, "2026-08-10T05:00:00Z", null), // older, still open
          alert(2, "2026-11-05T00:00:00Z", null), // new and open
          alert(3, "2026-11-06T00:00:00Z", "2026-11-20T10:00:00Z"), // new, acknowledged in the month
          alert(4, "2026-07-01T00:00:00Z", "2026-10-02T00:00:00Z"), // closed before the month: left out
          alert(5, "2026-12-02T00:00:00Z", null), // after the month: left out
          alert(6, "2026-09-01T00:00:00Z", "2026-12-03T00:00:00Z"), // acknowledged only after the month: open at its end
        ],
      }),
    );
    expect(report.alerts.rows.map((row) => row.instrumentTag)).toEqual(["TI-1", "TI-6", "TI-2", "TI-3"]);
    expect([report.alerts.opened, report.alerts.openAtMonthEnd, report.alerts.acknowledged]).toEqual([2, 3, 1]);
  });

  it("says whether the data reach the month end and leaves its input untouched", () => {
    const frozen = input();
    const copy = structuredClone(frozen);
    expect(monthlyReport(frozen).data).toEqual({ complete: true, lastDay: "2026-11-30" });
    expect(frozen).toEqual(copy);
    expect(monthlyReport(input({ dataEndMs: at("2026-11-20T00:00:00Z") })).data).toEqual({ complete: false, lastDay: "2026-11-19" });
  });
});
