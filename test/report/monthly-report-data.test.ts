// The monthly report on stored data: one demo exchanger, its month-end snapshots, reuse and recomputation.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ensureMonthEndSnapshots } from "../../lib/data/ensure-month-end-snapshots";
import { loadMonthlyReport, ReportError, resolveReportRequest } from "../../lib/data/monthly-report-data";
import { refreshAssessment } from "../../lib/data/refresh-assessment";
import { refreshDataQuality } from "../../lib/data/refresh-data-quality";
import { seedDemoFleetIfEmpty } from "../../lib/data/seed-demo-fleet";
import { disconnectPrisma } from "../../lib/db";
import type { AssessmentSummary } from "../../lib/planning/assessment-summary";
import { previousMonth } from "../../lib/report/report-month";
import { authenticatedRequest } from "../support/authenticated-request";
import { createTestDatabase, type TestDatabase } from "../support/test-database";

let database: TestDatabase;
const TAG = "E-1101";

beforeAll(async () => {
  database = await createTestDatabase();
  process.env.DATABASE_URL = database.url;
  await seedDemoFleetIfEmpty(database.prisma, { tags: [TAG] });
  await refreshDataQuality(database.prisma, TAG);
  await refreshAssessment(database.prisma, TAG);
}, 300_000);
afterAll(async () => {
  await disconnectPrisma();
  await database.drop();
});

describe("resolveReportRequest", () => {
  it("defaults to the only site and the last whole month of its data", async () => {
    const { site, month } = await resolveReportRequest(database.prisma, {});
    expect(site.code).toBe("BWH");
    // the demo data end with the UTC day 2026-11-30 (lib/demo)
    expect(month.key).toBe("2026-11");
  });

  it("answers 400 for a malformed month and 404 for an unknown site or a month without data", async () => {
    await expect(resolveReportRequest(database.prisma, { site: "BWH", month: "2026-13" })).rejects.toMatchObject({ status: 400, message: 'month must be YYYY-MM, got "2026-13"' });
    await expect(resolveReportRequest(database.prisma, { site: "NOPE" })).rejects.toMatchObject({ status: 404, message: 'unknown site "NOPE"' });
    await expect(resolveReportRequest(database.prisma, { site: "BWH", month: "2019-01" })).rejects.toBeInstanceOf(ReportError);
  });
});

describe("ensureMonthEndSnapshots", () => {
  it("assesses each month end with the data up to it, stores it, and reuses it until the assessment changes", async () => {
    const { month } = await resolveReportRequest(database.prisma, { site: "BWH", month: "2026-11" });
    const monthEnds = [month.endMs, previousMonth(month).endMs];
    const first = await ensureMonthEndSnapshots(database.prisma, { siteCode: "BWH", monthEnds });
    const rows = await database.prisma.monthEndSnapshot.findMany({ orderBy: { monthEnd: "asc" } });
    expect(rows.map((row) => row.monthEnd.getTime())).toEqual([previousMonth(month).endMs, month.endMs]);

    // the November month end sees the same daily periods as the stored assessment (made 1 h later, at the end of the
    // data), so its fouling resistance agrees closely; October's is an assessment of different data
    const asset = await database.prisma.asset.findUniqueOrThrow({ where: { tag: TAG }, include: { assessment: true } });
    const stored = asset.assessment?.summary as unknown as AssessmentSummary;
    const november = first.get(asset.id)?.get(month.endMs);
    const october = first.get(asset.id)?.get(previousMonth(month).endMs);
    expect(november?.summary?.foulingM2KPerW).toBeCloseTo(stored.foulingM2KPerW ?? Number.NaN, 6);
    expect(october?.summary?.asOf).toBe(new Date(previousMonth(month).endMs).toISOString());
    expect(october?.summary?.foulingM2KPerW).not.toBe(november?.summary?.foulingM2KPerW);

    // reused: nothing recomputed
    await ensureMonthEndSnapshots(database.prisma, { siteCode: "BWH", monthEnds });
    const again = await database.prisma.monthEndSnapshot.findMany({ orderBy: { monthEnd: "asc" } });
    expect(again.map((row) => row.computedAt.getTime())).toEqual(rows.map((row) => row.computedAt.getTime()));

    // a newer assessment (new data, a cleaning record) makes them stale: recomputed
    await refreshAssessment(database.prisma, TAG);
    await ensureMonthEndSnapshots(database.prisma, { siteCode: "BWH", monthEnds });
    const recomputed = await database.prisma.monthEndSnapshot.findMany({ orderBy: { monthEnd: "asc" } });
    expect(recomputed).toHaveLength(2);
    recomputed.forEach((row, index) => expect(row.computedAt.getTime()).toBeGreaterThan(rows[index]?.computedAt.getTime() ?? Infinity));
  }, 120_000);
});

describe("loadMonthlyReport", () => {
  it("reports the exchanger, and a cleaning at 00:30 local time on 1 November under November", async () => {
    const asset = await database.prisma.asset.findUniqueOrThrow({ where: { tag: TAG } });
    await database.prisma.cleaning.create({ data: { assetId: asset.id, date: new Date("2026-10-31T23:30:00Z"), method: "report test wash", costCents: 1_234_500 } });
    const { site, month } = await resolveReportRequest(database.prisma, { site: "BWH", month: "2026-11" });
    const report = await loadMonthlyReport(database.prisma, { site, month, nowMs: Date.parse("2026-12-01T08:00:00Z") });
    expect(report.assetCount).toBe(1);
    expect(report.categories.reduce((sum, category) => sum + category.count, 0)).toBe(1);
    expect(report.cleaningsDone).toEqual([expect.objectContaining({ tag: TAG, outOfService: "2026-11-01", method: "report test wash", cost: 12_345 })]);
    const october = await loadMonthlyReport(database.prisma, { site, month: previousMonth(month) });
    expect(october.cleaningsDone.some((cleaning) => cleaning.method === "report test wash")).toBe(false);
  }, 120_000);
});

describe("GET /api/reports/monthly.pdf", () => {
  type Handler = (request: Request, context: unknown) => Promise<Response>;
  const call = async (query: string): Promise<Response> => {
    const { GET } = (await import("../../app/api/reports/monthly.pdf/route")) as { GET: Handler };
    return GET(await authenticatedRequest(`http://localhost:3000/api/reports/monthly.pdf${query}`, { role: "viewer" }), {});
  };

  it("names what is wrong with the request before starting a browser", async () => {
    const badPaper = await call("?site=BWH&month=2026-11&paper=a3");
    expect(badPaper.status).toBe(400);
    expect(await badPaper.json()).toEqual({ code: "bad-request", error: 'paper must be one of a4, letter, got "a3"' });
    const unknownSite = await call("?site=XYZ");
    expect(unknownSite.status).toBe(404);
    expect(await unknownSite.json()).toMatchObject({ code: "not-found", error: 'unknown site "XYZ"' });
  });

  it("answers 503 with the reason when Chromium is missing, before any month-end assessment", async () => {
    const saved = process.env.CHROMIUM_PATH;
    process.env.CHROMIUM_PATH = "/nonexistent/chromium";
    try {
      // a month with no snapshots yet: none may be made for a PDF that cannot be printed
      const before = await database.prisma.monthEndSnapshot.count();
      const response = await call("?site=BWH&month=2026-06&paper=letter");
      expect(await database.prisma.monthEndSnapshot.count()).toBe(before);
      expect(response.status).toBe(503);
      const body = (await response.json()) as { code: string; error: string };
      expect(body.code).toBe("chromium-unavailable");
      expect(body.error).toContain("Chromium is not installed at /nonexistent/chromium");
    } finally {
      if (saved === undefined) delete process.env.CHROMIUM_PATH;
      else process.env.CHROMIUM_PATH = saved;
    }
  }, 60_000);
});
