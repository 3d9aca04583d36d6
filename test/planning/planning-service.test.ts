import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Prisma } from "../../generated/prisma/client";
import { refreshAssessment } from "../../lib/data/refresh-assessment";
import { refreshDataQuality } from "../../lib/data/refresh-data-quality";
import { seedDemoFleetIfEmpty } from "../../lib/data/seed-demo-fleet";
import { disconnectPrisma } from "../../lib/db";
import type { Assessment } from "../../lib/core/assessment";
import { rate } from "../../lib/core/thermal";
import { arrangementFromColumns } from "../../lib/data/asset-columns";
import { assetHeatCapacities } from "../../lib/data/exchanger-model";
import { acceptProposals, listBookings, moveBooking, releaseBooking } from "../../lib/planning/bookings";
import { economicsSummary } from "../../lib/planning/economics-summary";
import { fleetHealth } from "../../lib/data/fleet-health";
import { exportPlan } from "../../lib/planning/export-plan";
import { loadPlanInput, PlanningError } from "../../lib/planning/load-plan-input";
import { runPlan } from "../../lib/planning/run-plan";
import { addCalendarWindow, setExclusionGroup, updatePlanSettings } from "../../lib/planning/site-calendar";
import { createTestDatabase, type TestDatabase } from "../support/test-database";

let database: TestDatabase;
const TAGS = ["E-1101", "E-1102", "E-1103", "E-2201"];
// "Now" of these tests: Tuesday 2026-12-01, so the horizon starts Monday 2026-12-07.
const NOW = Date.UTC(2026, 11, 1, 12);
const actor = { userId: null, name: "test:planner" };

beforeAll(async () => {
  database = await createTestDatabase();
  await seedDemoFleetIfEmpty(database.prisma, { tags: TAGS });
  for (const tag of TAGS) {
    await refreshDataQuality(database.prisma, tag);
    await refreshAssessment(database.prisma, tag);
  }
}, 600_000);
afterAll(async () => {
  await disconnectPrisma();
  await database.drop();
});

async function assetWithSite(tag: string) {
  return database.prisma.asset.findUniqueOrThrow({ where: { tag }, include: { unit: { include: { site: true } }, assessment: true } });
}

describe("economicsSummary", () => {
  it("prices the duty loss at the furnace: ΔQ·86400/(η·1e9)·(fuel + f_CO2·p_CO2/1000) per day", async () => {
    const asset = await assetWithSite("E-1101");
    const result = economicsSummary(asset, asset.unit.site, asset.assessment);
    if (!result.ok) throw new Error(result.reason);
    const { summary } = result;
    const site = asset.unit.site;
    // furnace energy balance (FIELD-NOTES §7): fuel GJ/day = ΔQ·86400/(η·1e9); CO2 per IPCC 2006 Vol. 2 Eq. 2.1
    const fuelGJPerDay = (summary.dutyLossW * 86_400) / (site.furnaceEfficiency * 1e9);
    expect(summary.fuelGJPerDay).toBeCloseTo(fuelGJPerDay, 9);
    const expectedCost = fuelGJPerDay * (site.fuelPriceCentsPerGJ / 100 + (site.co2KgPerGJ * site.co2PriceCentsPerTonne) / 100 / 1000);
    // CDU-1 demo assets carry no lost production, so the cost is energy alone
    expect(summary.lostProductionPerDay).toBe(0);
    expect(summary.costPerDay).toBeCloseTo(expectedCost, 6);
    expect(summary.dutyLossW).toBeGreaterThan(0);
  });

  it("returns an optimal interval where the cost rate equals the average cost rate (Ma & Epstein 1981 criterion)", async () => {
    const asset = await assetWithSite("E-1102");
    const result = economicsSummary(asset, asset.unit.site, asset.assessment);
    if (!result.ok) throw new Error(result.reason);
    const optimum = result.summary.optimalInterval;
    expect(optimum.status).toBe("optimum");
    // at τ*, c(τ*) = J(τ*) (Epstein's optimum condition; tolerance 1e-6 relative)
    expect(Math.abs(optimum.costRateAtIntervalPerDay - optimum.averageCostPerDay) / optimum.averageCostPerDay).toBeLessThan(1e-6);
  });

  it("derives the duty loss from the ε–NTU rating at 1/U = 1/U_clean + Rf, independently recomputed", async () => {
    const asset = await assetWithSite("E-1101");
    const assessment = asset.assessment?.result as unknown as Assessment;
    const result = economicsSummary(asset, asset.unit.site, asset.assessment);
    if (!result.ok || !assessment.cleanModel || !assessment.trend) throw new Error("no assessment");
    const capacities = assetHeatCapacities(asset);
    const duty = (u: number) =>
      rate({
        uWPerM2K: u,
        areaM2: asset.areaM2,
        arrangement: arrangementFromColumns(asset),
        hot: { massFlowKgPerS: asset.refHotFlowKgPerS, heatCapacity: capacities.hot, inletK: asset.refHotInletK },
        cold: { massFlowKgPerS: asset.refColdFlowKgPerS, heatCapacity: capacities.cold, inletK: asset.refColdInletK },
      }).dutyW;
    // resistances in series (Kern 1950, Ch. 6): the loss at the band point nearest the assessment date
    const asOf = assessment.asOfMs;
    const point = assessment.trend.band.reduce((best, candidate) => (Math.abs(candidate.timeMs - asOf) < Math.abs(best.timeMs - asOf) ? candidate : best));
    const uClean = assessment.cleanModel.cleanUAtReferenceWPerM2K;
    const lossAtPoint = duty(uClean) - duty(1 / (1 / uClean + point.p50));
    // the summary's loss is at asOf; the nearest band point is at most 3.5 days away: within 3 % of each other
    expect(Math.abs(result.summary.dutyLossW - lossAtPoint) / lossAtPoint).toBeLessThan(0.03);
  });
});

describe("plan runs on stored data", () => {
  it("reads the calendar into weeks and refuses bad settings with the field named", async () => {
    await updatePlanSettings(database.prisma, "BWH", { crewCapacity: 1, horizonWeeks: 26 }, actor);
    await addCalendarWindow(database.prisma, "BWH", { kind: "blackout", name: "Test freeze", startDate: "2026-12-19", endDate: "2027-01-03" }, actor);
    await expect(updatePlanSettings(database.prisma, "BWH", { crewCapacity: -1 }, actor)).rejects.toThrow(/crewCapacity/);
    await expect(addCalendarWindow(database.prisma, "BWH", { kind: "turnaround", name: "x", startDate: "2027-02-10", endDate: "2027-02-01" }, actor)).rejects.toThrow(/endDate/);
    await expect(setExclusionGroup(database.prisma, "BWH", "bad", ["E-1101", "E-9999"], actor)).rejects.toThrow(/E-9999/);
    const loaded = await loadPlanInput(database.prisma, "BWH", { nowMs: NOW });
    expect(loaded.input.horizon.weeks).toBe(26);
    expect(new Date(loaded.input.horizon.startMs).toISOString().slice(0, 10)).toBe("2026-12-07");
    // the demo's own year-end freeze plus the test freeze: Dec 19 – Jan 3 touches weeks 1, 2 and 3
    expect(loaded.input.site.blackoutWeeks).toEqual(expect.arrayContaining([1, 2, 3]));
    expect(loaded.input.assets.map((asset) => asset.tag).sort()).toEqual([...TAGS].sort());
    await expect(loadPlanInput(database.prisma, "NOPE", { nowMs: NOW })).rejects.toBeInstanceOf(PlanningError);
  });

  it("stores a plan that keeps crews, blackouts and exclusion groups, and audits it", async () => {
    await setExclusionGroup(database.prisma, "BWH", "Test pair", ["E-1101", "E-1102"], actor);
    const document = await runPlan(database.prisma, { siteCode: "BWH", actor, nowMs: NOW });
    expect(document.status).toBe("optimal");
    expect(document.cleanings.length).toBeGreaterThan(0);
    for (const week of document.weeks) {
      expect(week.crewLoad).toBeLessThanOrEqual(week.crewCapacity);
      if (week.blackout) expect(week.crewLoad).toBe(0);
      expect(week.out.filter((tag) => tag === "E-1101" || tag === "E-1102").length).toBeLessThanOrEqual(1);
    }
    expect(document.cleanings.every((cleaning) => cleaning.explanation.length >= 3)).toBe(true);
    expect(document.totals.saving).toBeCloseTo(document.totals.noCleaningCost - document.totals.planCost, 6);
    expect(await database.prisma.auditEvent.count({ where: { action: "plan.run" } })).toBe(1);
  }, 120_000);

  it("keeps a moved week in the re-plan and reports what changed and the cost difference", async () => {
    const before = await runPlan(database.prisma, { siteCode: "BWH", actor, nowMs: NOW });
    const unchanged = before.comparison;
    expect(unchanged?.changes).toEqual([]); // same inputs, same plan
    const first = before.cleanings.find((cleaning) => cleaning.tag === "E-2201");
    const target = first && first.week >= 8 ? "2027-01-11" : "2027-03-01";
    await moveBooking(database.prisma, "E-2201", target, actor, { nowMs: NOW });
    const after = await runPlan(database.prisma, { siteCode: "BWH", actor, nowMs: NOW });
    const moved = after.cleanings.find((cleaning) => cleaning.tag === "E-2201" && cleaning.state === "booked");
    expect(moved?.start).toBe(target);
    const change = after.comparison?.changes.find((entry) => entry.tag === "E-2201");
    expect(change?.to).toContain(target);
    // forcing a week can only cost more than the optimum (up to the solver's gap)
    expect(after.comparison?.costDifference ?? -1).toBeGreaterThanOrEqual(-1e-4 * Math.abs(before.totals.planCost));
    await releaseBooking(database.prisma, "E-2201", actor, { nowMs: NOW });
    expect(await listBookings(database.prisma, "BWH", NOW)).toEqual([]);
    await expect(releaseBooking(database.prisma, "E-2201", actor, { nowMs: NOW })).rejects.toThrow(/no booked cleaning/);
    await expect(moveBooking(database.prisma, "E-2201", "2026-11-02", actor, { nowMs: NOW })).rejects.toThrow(/planning starts on 2026-12-07/);
  }, 180_000);

  it("books accepted proposals as locks", async () => {
    const plan = await runPlan(database.prisma, { siteCode: "BWH", actor, nowMs: NOW });
    const made = await acceptProposals(database.prisma, "BWH", ["E-1103"], actor);
    const proposed = plan.cleanings.filter((cleaning) => cleaning.tag === "E-1103").map((cleaning) => cleaning.start);
    expect(made.map((entry) => entry.weekStart)).toEqual(proposed);
    const replanned = await runPlan(database.prisma, { siteCode: "BWH", actor, nowMs: NOW });
    expect(replanned.cleanings.filter((cleaning) => cleaning.tag === "E-1103").every((cleaning) => cleaning.state === "booked")).toBe(true);
    expect(await database.prisma.auditEvent.count({ where: { action: "booking.accept" } })).toBe(1);
  }, 180_000);

  it("runs a what-if with dearer fuel as its own run compared with a fresh baseline", async () => {
    const whatIf = await runPlan(database.prisma, { siteCode: "BWH", actor, nowMs: NOW, scenario: { fuelPriceFactor: 2 } });
    expect(whatIf.kind).toBe("what-if");
    expect(whatIf.scenario).toEqual({ fuelPriceFactor: 2 });
    // doubling the fuel price raises the cost of doing nothing
    const baseline = await database.prisma.planRun.findUniqueOrThrow({ where: { id: whatIf.comparison?.previousRunId ?? -1 } });
    expect(whatIf.totals.noCleaningCost).toBeGreaterThan(baseline.noCleaningCost);
    const latest = await database.prisma.planRun.findFirstOrThrow({ where: { kind: "plan" }, orderBy: { id: "desc" } });
    expect(latest.id).toBe(baseline.id);
  }, 180_000);

  it("exports iCalendar with one event per cleaning, CSV and XLSX", async () => {
    const run = await database.prisma.planRun.findFirstOrThrow({ where: { kind: "plan" }, orderBy: { id: "desc" } });
    const cleanings = (run.result as { cleanings: unknown[] }).cleanings.length;
    const ics = (await exportPlan(run, "ics", NOW)).body.toString("utf8");
    // RFC 5545 §3.4/§3.6.1: one VCALENDAR, one VEVENT per cleaning, CRLF line ends
    expect(ics.startsWith("BEGIN:VCALENDAR\r\n")).toBe(true);
    expect(ics.match(/BEGIN:VEVENT/g)?.length).toBe(cleanings);
    const csv = (await exportPlan(run, "csv", NOW)).body.toString("utf8");
    expect(csv.trim().split("\r\n")).toHaveLength(cleanings + 1);
    const xlsx = await exportPlan(run, "xlsx", NOW);
    // an XLSX file is a ZIP archive (ECMA-376 Part 2): local file header signature "PK\x03\x04"
    expect(xlsx.body.subarray(0, 4).toString("latin1")).toBe("PK\u0003\u0004");
    expect(xlsx.fileName).toMatch(/^cleaning-plan-bwh-\d+\.xlsx$/);
  });

  it("lists every exchanger with its stored summary, category and next cleaning for the fleet table", async () => {
    const rows = await fleetHealth(database.prisma, { siteCode: "BWH", nowMs: NOW });
    expect(rows.map((row) => row.tag).sort()).toEqual([...TAGS].sort());
    for (const row of rows) {
      expect(row.summary?.economics?.costPerDay ?? -1).toBeGreaterThan(0);
      expect(row.summary?.sparkline.length ?? 0).toBeGreaterThan(5);
      expect(row.summary?.sparkline.length ?? 99).toBeLessThanOrEqual(41);
    }
    // one site's rows only, in the same order
    expect((await fleetHealth(database.prisma, { siteCode: "BWH", nowMs: NOW })).map((row) => row.tag)).toEqual(rows.map((row) => row.tag));
    expect(await fleetHealth(database.prisma, { siteCode: "NOPE", nowMs: NOW })).toEqual([]);
    // E-1103's proposals were booked above
    expect(rows.find((row) => row.tag === "E-1103")?.nextCleaning?.booked).toBe(true);
    // an assessment stored without its summary (from before summaries existed) gets one computed and stored
    const e1102 = await assetWithSite("E-1102");
    const storedSummary = e1102.assessment?.summary as { foulingM2KPerW: number; economics: { costPerDay: number } } | undefined;
    await database.prisma.assetAssessment.update({ where: { assetId: e1102.id }, data: { summary: Prisma.DbNull } });
    expect((await assetWithSite("E-1102")).assessment?.summary).toBeNull();
    const backfilled = (await fleetHealth(database.prisma, { nowMs: NOW })).find((row) => row.tag === "E-1102");
    expect(backfilled?.summary?.foulingM2KPerW).toBe(storedSummary?.foulingM2KPerW);
    // equal to the last digit or so: the stored copy went through PostgreSQL jsonb
    expect(backfilled?.summary?.economics?.costPerDay).toBeCloseTo(storedSummary?.economics.costPerDay ?? Number.NaN, 6);
    const restored = (await assetWithSite("E-1102")).assessment?.summary as typeof storedSummary;
    expect(restored?.economics.costPerDay).toBeCloseTo(storedSummary?.economics.costPerDay ?? Number.NaN, 6);
    // the stored summary holds the same cost per day as a fresh economics summary
    const asset = await assetWithSite("E-1101");
    const fresh = economicsSummary(asset, asset.unit.site, asset.assessment);
    expect(rows.find((row) => row.tag === "E-1101")?.summary?.economics?.costPerDay).toBeCloseTo(fresh.ok ? fresh.summary.costPerDay : NaN, 6);
  });
});
