// Loads the invented demo fleet: site, units, assets, instruments, cleanings,
// hourly readings from the physics simulator, and the simulator's ground truth.
import type { PrismaClient, Prisma } from "../../generated/prisma/client";
import { demoFleet, simulateDemoFleet } from "../demo";
import type { ExchangerSpec, SimulationPlan, SimulationResult } from "../core/simulate";
import { seedDemoPlanning } from "./seed-demo-planning";
import { arrangementToColumns, heatCapacityToColumns } from "./asset-columns";
import { insertReadings } from "./insert-readings";

export interface SeedResult {
  assets: number;
  readings: number;
}

export interface SeedOptions {
  log?: (message: string) => void;
  /** Only these tags (tests use a few assets to stay fast). */
  tags?: string[];
}

/** Serialisation lock so two processes never load the demo at the same time. */
const SEED_LOCK_KEY = 0x466f756c; // "Foul"
const DAY_MS = 86_400_000;

/**
 * Invented cost of a demo cleaning: a fixed mobilisation part plus a part growing with area
 * (EUR 15,000 + 60 per m², in cents; demo data only, not a check value).
 */
function demoCleaningCostCents(areaM2: number): number {
  return Math.round((15_000 + 60 * areaM2) * 100);
}

/** Ground truth kept in the database: plan, faults, cleanings, and one true value per day at 00:00 UTC. */
function truthRecord(plan: SimulationPlan, result: SimulationResult, thresholdCrossingMs: number | null) {
  const daily = result.truth.filter((point) => point.timeMs % DAY_MS === 0);
  return {
    plan,
    faults: result.faults,
    cleanings: result.cleanings,
    grossErrorCount: result.grossErrors.length,
    thresholdCrossingMs,
    daily: {
      timeMs: daily.map((point) => point.timeMs),
      foulingM2KPerW: daily.map((point) => point.foulingM2KPerW),
      cleanUWPerM2K: daily.map((point) => point.cleanUWPerM2K),
      uWPerM2K: daily.map((point) => point.uWPerM2K),
      referenceDutyW: daily.map((point) => point.referenceDutyW),
    },
  };
}

async function loadFleet(tx: Prisma.TransactionClient, options: SeedOptions): Promise<SeedResult> {
  const log = options.log ?? (() => undefined);
  const fleet = demoFleet();
  const wanted = options.tags ? new Set(options.tags) : null;
  const site = await tx.site.create({ data: { code: fleet.site.code, name: fleet.site.name, timeZone: fleet.site.timeZone } });
  const unitIds = new Map<string, number>();
  for (const unit of fleet.units) {
    const created = await tx.processUnit.create({ data: { siteId: site.id, code: unit.code, name: unit.name } });
    unitIds.set(unit.code, created.id);
  }
  let readings = 0;
  let assets = 0;
  const simulated = simulateDemoFleet(wanted ? { assets: [...wanted] } : undefined);
  for (const { asset: { spec, plan }, result, trueCrossingMs } of simulated) {
    const hotCp = heatCapacityToColumns(spec.hotStream.heatCapacity);
    const coldCp = heatCapacityToColumns(spec.coldStream.heatCapacity);
    const unitId = unitIds.get(spec.unitCode);
    if (unitId === undefined) throw new Error(`Demo asset ${spec.tag} names unknown unit ${spec.unitCode}`);
    const created = await tx.asset.create({
      data: {
        tag: spec.tag,
        name: spec.name,
        unitId,
        service: spec.service,
        ...arrangementToColumns(spec.arrangement),
        tubePasses: spec.tubePasses,
        areaM2: spec.areaM2,
        hotStreamName: spec.hotStream.name,
        hotCpKind: hotCp.kind,
        hotCpIntercept: hotCp.intercept,
        hotCpSlope: hotCp.slope,
        hotCpPressurePa: hotCp.pressurePa,
        coldStreamName: spec.coldStream.name,
        coldCpKind: coldCp.kind,
        coldCpIntercept: coldCp.intercept,
        coldCpSlope: coldCp.slope,
        coldCpPressurePa: coldCp.pressurePa,
        designDutyW: spec.designDutyW,
        designUWPerM2K: spec.designUWPerM2K,
        designFoulingM2KPerW: spec.designFoulingM2KPerW,
        refHotInletK: spec.reference.hotInletK,
        refColdInletK: spec.reference.coldInletK,
        refHotFlowKgPerS: spec.reference.hotFlowKgPerS,
        refColdFlowKgPerS: spec.reference.coldFlowKgPerS,
        dutyThresholdW: spec.dutyThresholdW,
        instruments: { create: spec.instruments.map((instrument) => ({ ...instrument })) },
        cleanings: {
          create: result.cleanings.map((cleaning) => ({
            date: new Date(cleaning.startMs),
            endDate: new Date(cleaning.endMs),
            method: cleaning.method,
            costCents: demoCleaningCostCents(spec.areaM2),
            notes: "Demo record",
            createdBy: "demo",
          })),
        },
        demoTruth: { create: { truth: truthRecord(plan, result, trueCrossingMs) as unknown as Prisma.InputJsonValue } },
      },
    });
    readings += await insertReadings(tx, created.id, result.readings);
    assets += 1;
    log(`  ${spec.tag}: ${result.readings.length} readings`);
  }
  await seedDemoPlanning(tx, site.id, demoCleaningCostCents);
  return { assets, readings };
}

/** Loads the demo fleet when the database holds no asset; returns null when it already holds some. */
export async function seedDemoFleetIfEmpty(prisma: PrismaClient, options: SeedOptions = {}): Promise<SeedResult | null> {
  return prisma.$transaction(
    async (tx) => {
      await tx.$executeRaw`select pg_advisory_xact_lock(${SEED_LOCK_KEY})`;
      if ((await tx.asset.count()) > 0 || (await tx.site.count()) > 0) return null;
      options.log?.("Loading the demo fleet (simulated operating data)...");
      return loadFleet(tx, options);
    },
    { timeout: 15 * 60_000, maxWait: 60_000 },
  );
}

/** Deletes every site, unit, asset and reading, then loads the demo fleet, all in one transaction. */
export async function resetDemoFleet(prisma: PrismaClient, options: SeedOptions = {}): Promise<SeedResult> {
  return prisma.$transaction(
    async (tx) => {
      await tx.$executeRaw`select pg_advisory_xact_lock(${SEED_LOCK_KEY})`;
      await tx.$executeRaw`truncate "Reading", "Cleaning", "Instrument", "DemoTruth", "Asset", "ProcessUnit", "Site", "PlanRun", "CleaningBooking", "CalendarWindow", "ExclusionGroup", "PlanSettings" restart identity cascade`;
      options.log?.("Loading the demo fleet (simulated operating data)...");
      return loadFleet(tx, options);
    },
    { timeout: 15 * 60_000, maxWait: 60_000 },
  );
}
