import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { assessmentDocument, toAssessmentDocument } from "../../lib/data/assessment-document";
import { listAlerts } from "../../lib/data/list-alerts";
import { recordCleaning } from "../../lib/data/record-cleaning";
import { getStoredAssessment, refreshAssessment } from "../../lib/data/refresh-assessment";
import { refreshDataQuality } from "../../lib/data/refresh-data-quality";
import { seedDemoFleetIfEmpty } from "../../lib/data/seed-demo-fleet";
import { disconnectPrisma } from "../../lib/db";
import { simulateDemoFleet } from "../../lib/demo";
import { createTestDatabase, type TestDatabase } from "../support/test-database";
import { authenticatedRequest } from "../support/authenticated-request";

let database: TestDatabase;
const TAG = "E-1101";

beforeAll(async () => {
  database = await createTestDatabase();
  await seedDemoFleetIfEmpty(database.prisma, { tags: [TAG] });
  await refreshDataQuality(database.prisma, TAG);
});
afterAll(async () => {
  await disconnectPrisma();
  await database.drop();
});

describe("refreshAssessment", () => {
  it("stores an assessment whose duty forecast brackets the simulator's true crossing date", async () => {
    const assessment = await refreshAssessment(database.prisma, TAG);
    const [truth] = simulateDemoFleet({ assets: [TAG] });
    const trueCrossing = truth?.trueCrossingMs ?? 0;
    const duty = assessment?.forecasts.duty;
    expect(duty?.status).toBe("ahead");
    // simulation with known truth: the true crossing lies between P10 and P90
    expect(duty?.p10Ms ?? Infinity).toBeLessThanOrEqual(trueCrossing);
    expect(duty?.p90Ms ?? -Infinity).toBeGreaterThanOrEqual(trueCrossing);
    expect(await database.prisma.assetAssessment.count()).toBe(1);
  });

  it("records the fouling removed by each demo cleaning near the simulated effectiveness", async () => {
    const [truth] = simulateDemoFleet({ assets: [TAG] });
    const cleanings = await database.prisma.cleaning.findMany({ where: { asset: { tag: TAG } }, orderBy: { date: "asc" } });
    expect(cleanings).toHaveLength(truth?.result.cleanings.length ?? -1);
    for (const [index, cleaning] of cleanings.entries()) {
      // simulation truth (lib/demo): effectiveness of this cleaning; tolerance 0.1 absolute for noise in the medians
      expect(Math.abs((cleaning.effectiveness ?? -1) - (truth?.result.cleanings[index]?.effectiveness ?? 0))).toBeLessThan(0.1);
    }
  });
});

describe("assessmentDocument", () => {
  it("returns the documented shape with SI units, forecasts as ISO dates and the advisory notice", async () => {
    const lookup = await assessmentDocument(database.prisma, TAG);
    expect(lookup.kind).toBe("assessed");
    if (lookup.kind !== "assessed") return;
    const document = lookup.document;
    expect(document.tag).toBe(TAG);
    expect(document.units.foulingResistance).toBe("m2.K/W");
    expect(document.cleanModel?.parameters.map((parameter) => parameter.name)).toEqual([
      "hotFilmResistanceAtReferenceFlow", "coldFilmResistanceAtReferenceFlow", "wallResistance", "hotFlowExponent", "coldFlowExponent",
    ]);
    expect(document.forecasts.duty.p50).toMatch(/^\d{4}-\d{2}-\d{2}T/);
    expect(document.advisory).toMatch(/^Advisory only/);
    expect(document.series).toBeUndefined();
    const detailed = await assessmentDocument(database.prisma, TAG, { detail: true });
    expect(detailed.kind === "assessed" && (detailed.document.series?.length ?? 0) > 100).toBe(true);
  });

  it("reads without the series the same document as from the whole stored assessment", async () => {
    const full = await getStoredAssessment(database.prisma, TAG);
    if (!full) throw new Error("no stored assessment");
    expect(full.assessment.foulingResistance.series.length).toBeGreaterThan(100);
    const alerts = await listAlerts(database.prisma, { tag: TAG });
    const lookup = await assessmentDocument(database.prisma, TAG);
    expect(lookup).toEqual({ kind: "assessed", document: toAssessmentDocument(TAG, full.computedAt, full.assessment, alerts, false) });
    const detailed = await assessmentDocument(database.prisma, TAG, { detail: true });
    expect(detailed).toEqual({ kind: "assessed", document: toAssessmentDocument(TAG, full.computedAt, full.assessment, alerts, true) });
  });

  it("tells an unknown tag apart", async () => {
    expect(await assessmentDocument(database.prisma, "E-0000")).toEqual({ kind: "unknown-asset" });
  });

  it("is served by GET /api/assets/{tag}/assessment, with 404 for an unknown tag", async () => {
    process.env.DATABASE_URL = database.url;
    const { GET } = await import("../../app/api/assets/[tag]/assessment/route");
    const response = await GET(await authenticatedRequest(`http://localhost/api/assets/${TAG}/assessment`, { role: "viewer" }), { params: Promise.resolve({ tag: TAG }) });
    expect(response.status).toBe(200);
    const body = (await response.json()) as { tag: string; forecasts: { duty: { status: string } } };
    expect(body.tag).toBe(TAG);
    const missing = await GET(await authenticatedRequest("http://localhost/api/assets/E-0000/assessment", { role: "viewer" }), { params: Promise.resolve({ tag: "E-0000" }) });
    expect(missing.status).toBe(404);
    expect(await missing.json()).toEqual({ error: "unknown asset E-0000" });
  });
});

describe("recordCleaning", () => {
  it("records a cleaning, starts a new cycle and reassesses", async () => {
    const before = await database.prisma.assetAssessment.findFirstOrThrow();
    const result = await recordCleaning(database.prisma, { tag: TAG, date: "2026-11-20", endDate: "2026-11-23", method: "hydroblast", cost: 25000 }, "test:frank");
    expect(result.reassessed).toBe(true);
    const after = await database.prisma.assetAssessment.findFirstOrThrow();
    expect(after.computedAt.getTime()).toBeGreaterThan(before.computedAt.getTime());
    const stored = await database.prisma.cleaning.findUniqueOrThrow({ where: { id: result.id } });
    expect(stored).toMatchObject({ method: "hydroblast", costCents: 2_500_000, createdBy: "test:frank" });
  });

  it("refuses an overlapping record, a return before the start, and an unknown asset, naming the problem", async () => {
    await expect(recordCleaning(database.prisma, { tag: TAG, date: "2026-11-21", method: "hydroblast" }, "test")).rejects.toThrow(`${TAG} already has a cleaning recorded on 2026-11-20 that overlaps this one`);
    await expect(recordCleaning(database.prisma, { tag: TAG, date: "2026-10-02", endDate: "2026-10-01", method: "x" }, "test")).rejects.toThrow("endDate: endDate (return to service) must not be before date");
    await expect(recordCleaning(database.prisma, { tag: "E-0000", date: "2026-10-02", method: "x" }, "test")).rejects.toThrow("unknown asset E-0000");
  });
});
