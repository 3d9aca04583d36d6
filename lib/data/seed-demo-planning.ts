// The demo site's planning set-up: invented economics, crews, a turnaround, a blackout and exclusion groups.
import type { Prisma } from "../../generated/prisma/client";

/** Outage days and lost production per outage day by demo unit (invented demo values, not check values). */
const DEMO_UNIT_ECONOMICS: Record<string, { outageDays: number; lostProductionCentsPerDay: number }> = {
  "CDU-1": { outageDays: 4, lostProductionCentsPerDay: 0 },
  "HTU-2": { outageDays: 6, lostProductionCentsPerDay: 1_500_000 },
  "RDC-3": { outageDays: 3, lostProductionCentsPerDay: 0 },
};

/** Exchangers sharing a bypass or a train in the demo (invented). */
const DEMO_GROUPS: { name: string; tags: string[] }[] = [
  { name: "CDU-1 cold train bypass", tags: ["E-1101", "E-1102", "E-1103"] },
  { name: "CDU-1 hot train bypass", tags: ["E-1106", "E-1107", "E-1108"] },
  { name: "HTU-2 feed/effluent train", tags: ["E-2201", "E-2202"] },
];

/**
 * seedDemoPlanning: gives the demo site its planning settings (2 crews, 52 weeks, P10 deadlines, 90 days between
 * cleanings), a spring turnaround, a year-end blackout, exclusion groups, and per-unit outage and lost-production
 * figures on the demo assets (cleaning cost stays the area-based demo figure). Invented values for the demo only.
 */
export async function seedDemoPlanning(tx: Prisma.TransactionClient, siteId: number, cleaningCostCents: (areaM2: number) => number): Promise<void> {
  await tx.planSettings.upsert({
    where: { siteId },
    create: { siteId, crewCapacity: 2, horizonWeeks: 52, deadlineQuantile: "p10", minimumDaysBetweenCleanings: 90, timeLimitSeconds: 30, updatedBy: "demo" },
    update: {},
  });
  await tx.calendarWindow.createMany({
    data: [
      { siteId, kind: "blackout", name: "Year-end staffing freeze", startDate: new Date("2026-12-19"), endDate: new Date("2027-01-03"), createdBy: "demo" },
      { siteId, kind: "turnaround", name: "Spring turnaround 2027", startDate: new Date("2027-04-12"), endDate: new Date("2027-05-02"), createdBy: "demo" },
      { siteId, kind: "blackout", name: "Summer peak demand", startDate: new Date("2027-07-19"), endDate: new Date("2027-08-08"), createdBy: "demo" },
    ],
  });
  const assets = await tx.asset.findMany({ where: { unit: { siteId } }, include: { unit: true } });
  for (const asset of assets) {
    const economics = DEMO_UNIT_ECONOMICS[asset.unit.code];
    if (!economics) continue;
    await tx.asset.update({
      where: { id: asset.id },
      data: { cleaningCostCents: cleaningCostCents(asset.areaM2), cleaningOutageDays: economics.outageDays, lostProductionCentsPerDay: economics.lostProductionCentsPerDay },
    });
  }
  const idByTag = new Map(assets.map((asset) => [asset.tag, asset.id]));
  for (const group of DEMO_GROUPS) {
    const members = group.tags.flatMap((tag) => (idByTag.has(tag) ? [{ assetId: idByTag.get(tag) as number }] : []));
    if (members.length >= 2) await tx.exclusionGroup.create({ data: { siteId, name: group.name, members: { create: members } } });
  }
}
