import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { acknowledgeAlert } from "../../lib/data/acknowledge-alert";
import { listAlerts } from "../../lib/data/list-alerts";
import { listAssets } from "../../lib/data/list-assets";
import { refreshDataQuality } from "../../lib/data/refresh-data-quality";
import { seedDemoFleetIfEmpty } from "../../lib/data/seed-demo-fleet";
import { DEMO_END_MS, DEMO_START_MS } from "../../lib/demo";
import { createTestDatabase, type TestDatabase } from "../support/test-database";

let database: TestDatabase;
const DAY_MS = 86_400_000;

beforeAll(async () => {
  database = await createTestDatabase();
  // E-3104: cooling-water flow meter stuck 2026-07-06 to 2026-08-24 (simulation with known truth); E-1101: no fault.
  await seedDemoFleetIfEmpty(database.prisma, { tags: ["E-3104", "E-1101"] });
});
afterAll(async () => {
  await database.drop();
});

describe("refreshDataQuality", () => {
  it("stores one screened period per day and the stuck flow meter as an alert near its true start and end", async () => {
    const result = await refreshDataQuality(database.prisma, "E-3104");
    expect(result.periods).toBe(Math.ceil((DEMO_END_MS - DEMO_START_MS + 3_600_000) / DAY_MS));
    expect(result.sampleCounts.total).toBe(result.sampleCounts.used + Object.values(result.sampleCounts.excluded).reduce((a, b) => a + b, 0));
    const [alert] = await listAlerts(database.prisma, { tag: "E-3104" });
    expect(alert).toMatchObject({ role: "coldFlow", kind: "stuck", instrumentTag: "FI-3104B" });
    // simulation truth: stuck from 2026-07-06 to 2026-08-24 (lib/demo); named within one day of each
    expect(Math.abs(Date.parse(alert?.start ?? "") - Date.UTC(2026, 6, 6))).toBeLessThan(DAY_MS);
    expect(Math.abs(Date.parse(alert?.end ?? "") - Date.UTC(2026, 7, 24))).toBeLessThan(DAY_MS);
    const stored = await database.prisma.operatingPeriod.findMany({ where: { asset: { tag: "E-3104" }, start: { gte: new Date(Date.UTC(2026, 6, 10)), lt: new Date(Date.UTC(2026, 7, 20)) } } });
    // every day inside the fault is excluded from U estimation
    expect(stored.every((period) => !period.usable)).toBe(true);
  });

  it("raises no alert on the fault-free asset", async () => {
    await refreshDataQuality(database.prisma, "E-1101");
    expect(await listAlerts(database.prisma, { tag: "E-1101", includeAcknowledged: true })).toEqual([]);
  });

  it("updates the same alert when run again instead of adding a duplicate", async () => {
    const again = await refreshDataQuality(database.prisma, "E-3104");
    expect(again.alerts).toEqual({ new: 0, updated: 1 });
    expect(await database.prisma.instrumentAlert.count()).toBe(1);
    expect(await database.prisma.operatingPeriod.count({ where: { asset: { tag: "E-3104" } } })).toBe(again.periods);
  });

  it("keeps an acknowledged alert listed with who acknowledged it, out of the open list and the fleet count", async () => {
    const [alert] = await listAlerts(database.prisma, { tag: "E-3104" });
    expect((await listAssets(database.prisma)).find((row) => row.tag === "E-3104")?.openAlerts).toBe(1);
    await acknowledgeAlert(database.prisma, alert?.id ?? 0, "test:dana", "meter replaced");
    expect(await listAlerts(database.prisma, { tag: "E-3104" })).toEqual([]);
    const [kept] = await listAlerts(database.prisma, { tag: "E-3104", includeAcknowledged: true });
    expect(kept).toMatchObject({ acknowledgedBy: "test:dana", note: "meter replaced" });
    expect((await listAssets(database.prisma)).find((row) => row.tag === "E-3104")?.openAlerts).toBe(0);
    await expect(acknowledgeAlert(database.prisma, alert?.id ?? 0, "test:erin")).rejects.toThrow(`alert ${alert?.id} was already acknowledged by test:dana`);
    // refreshing again does not reopen it
    await refreshDataQuality(database.prisma, "E-3104");
    expect(await listAlerts(database.prisma, { tag: "E-3104" })).toEqual([]);
  });
});
