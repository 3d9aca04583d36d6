// Creates or updates an asset register entry from a validated asset file, in
// one transaction, and records every change (who, when, before and after).
import type { Prisma, PrismaClient } from "../../generated/prisma/client";
import {
  AssetValidationError,
  assetFileSchema,
  describeIssues,
  instrumentUncertaintySI,
  toHeatCapacity,
  type AssetFileParsed,
} from "../validation/asset";
import { arrangementToColumns, heatCapacityToColumns } from "./asset-columns";
import { recordAudit } from "./record-audit";

type Transaction = Prisma.TransactionClient;

export class AssetRegisterError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "AssetRegisterError";
  }
}

/** Parses raw JSON (one asset) into SI, or throws AssetValidationError listing every problem. */
export function parseAssetFile(raw: unknown, label = ""): AssetFileParsed {
  const result = assetFileSchema.safeParse(raw);
  if (!result.success) throw new AssetValidationError(describeIssues(result.error, label));
  return result.data;
}

const cents = (value: number | undefined) => (value === undefined ? null : Math.round(value * 100));

/** The Asset columns (and instruments) an asset file sets. */
function assetData(asset: AssetFileParsed) {
  const hot = heatCapacityToColumns(toHeatCapacity(asset.hotStream.heatCapacity));
  const cold = heatCapacityToColumns(toHeatCapacity(asset.coldStream.heatCapacity));
  const arrangement = asset.arrangement;
  return {
    columns: {
      name: asset.name,
      service: asset.service,
      ...arrangementToColumns(arrangement),
      tubePasses: "tubePasses" in arrangement && arrangement.tubePasses !== undefined ? arrangement.tubePasses : arrangement.kind === "shell-and-tube" ? 2 : 1,
      areaM2: asset.area,
      hotStreamName: asset.hotStream.name,
      hotCpKind: hot.kind,
      hotCpIntercept: hot.intercept,
      hotCpSlope: hot.slope,
      hotCpPressurePa: hot.pressurePa,
      coldStreamName: asset.coldStream.name,
      coldCpKind: cold.kind,
      coldCpIntercept: cold.intercept,
      coldCpSlope: cold.slope,
      coldCpPressurePa: cold.pressurePa,
      designDutyW: asset.designDuty,
      designUWPerM2K: asset.designU,
      designFoulingM2KPerW: asset.designFouling,
      refHotInletK: asset.reference.hotInlet,
      refColdInletK: asset.reference.coldInlet,
      refHotFlowKgPerS: asset.reference.hotFlow,
      refColdFlowKgPerS: asset.reference.coldFlow,
      dutyThresholdW: asset.dutyThreshold,
      minimumOutletK: asset.minimumOutlet?.temperature ?? null,
      minimumOutletStream: asset.minimumOutlet?.stream ?? null,
      fuelPriceCentsPerGJ: cents(asset.economics.fuelPricePerGJ),
      furnaceEfficiency: asset.economics.furnaceEfficiency ?? null,
      co2KgPerGJ: asset.economics.co2KgPerGJ ?? null,
      co2PriceCentsPerTonne: cents(asset.economics.co2PricePerTonne),
      cleaningCostCents: cents(asset.economics.cleaningCost),
      cleaningOutageDays: asset.economics.cleaningOutageDays ?? null,
      lostProductionCentsPerDay: cents(asset.economics.lostProductionPerDay),
      notes: asset.notes,
    },
    instruments: asset.instruments.map((instrument) => ({
      role: instrument.role,
      tag: instrument.tag,
      standardUncertainty: instrumentUncertaintySI(instrument, asset.reference),
    })),
  };
}

async function resolveUnit(tx: Transaction, asset: AssetFileParsed): Promise<{ unitId: number; unitCode: string }> {
  const siteCode = typeof asset.site === "string" ? asset.site : asset.site.code;
  let site = await tx.site.findUnique({ where: { code: siteCode } });
  if (!site) {
    if (typeof asset.site === "string") {
      throw new AssetRegisterError(`unknown site "${siteCode}"; give "site": { "code", "name", "timeZone" } to create it`);
    }
    site = await tx.site.create({ data: { code: asset.site.code, name: asset.site.name, timeZone: asset.site.timeZone } });
  }
  const unitCode = typeof asset.unit === "string" ? asset.unit : asset.unit.code;
  let unit = await tx.processUnit.findUnique({ where: { siteId_code: { siteId: site.id, code: unitCode } } });
  if (!unit) {
    if (typeof asset.unit === "string") {
      throw new AssetRegisterError(`unknown unit "${unitCode}" at site ${siteCode}; give "unit": { "code", "name" } to create it`);
    }
    unit = await tx.processUnit.create({ data: { siteId: site.id, code: unitCode, name: asset.unit.name } });
  }
  return { unitId: unit.id, unitCode };
}

type Snapshot = Record<string, unknown>;

/** Equal values, with numbers equal to 1e-9 relative (unit conversions round-trip to about 1e-15). */
function same(a: unknown, b: unknown): boolean {
  if (typeof a === "number" && typeof b === "number") return a === b || Math.abs(a - b) <= 1e-9 * Math.max(Math.abs(a), Math.abs(b));
  if (Array.isArray(a) && Array.isArray(b)) return a.length === b.length && a.every((item, index) => same(item, b[index]));
  if (a && b && typeof a === "object" && typeof b === "object") {
    const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
    return [...keys].every((key) => same((a as Snapshot)[key] ?? null, (b as Snapshot)[key] ?? null));
  }
  return a === b;
}

function difference(before: Snapshot, after: Snapshot): Record<string, { before: unknown; after: unknown }> {
  const changes: Record<string, { before: unknown; after: unknown }> = {};
  for (const key of new Set([...Object.keys(before), ...Object.keys(after)])) {
    if (!same(before[key] ?? null, after[key] ?? null)) changes[key] = { before: before[key] ?? null, after: after[key] ?? null };
  }
  return changes;
}

export interface SaveAssetResult {
  tag: string;
  action: "created" | "updated" | "unchanged";
  changedFields: string[];
}

/** Creates a new asset; refuses a tag that exists. `userId`: the signed-in user, null for the CLI. */
export async function createAsset(prisma: PrismaClient, asset: AssetFileParsed, changedBy: string, userId: string | null = null): Promise<SaveAssetResult> {
  const data = assetData(asset);
  return prisma.$transaction(async (tx) => {
    if (await tx.asset.findUnique({ where: { tag: asset.tag } })) {
      throw new AssetRegisterError(`asset ${asset.tag} already exists; use update to change it`);
    }
    const { unitId, unitCode } = await resolveUnit(tx, asset);
    const created = await tx.asset.create({ data: { tag: asset.tag, unitId, ...data.columns, instruments: { create: data.instruments } } });
    const changes = difference({}, { unit: unitCode, ...data.columns, instruments: data.instruments });
    await tx.assetRevision.create({ data: { assetId: created.id, changedBy, action: "created", changes: changes as Prisma.InputJsonValue } });
    await recordAudit(tx, { userId, actor: changedBy, action: "asset.create", entity: "asset", entityId: asset.tag, summary: `created asset ${asset.tag} (${asset.name})`, details: { fields: Object.keys(changes) } });
    return { tag: asset.tag, action: "created", changedFields: Object.keys(changes) };
  });
}

/** Replaces an existing asset's register entry with the file's values; records what changed. */
export async function updateAsset(prisma: PrismaClient, asset: AssetFileParsed, changedBy: string, userId: string | null = null): Promise<SaveAssetResult> {
  const data = assetData(asset);
  return prisma.$transaction(async (tx) => {
    const existing = await tx.asset.findUnique({ where: { tag: asset.tag }, include: { unit: true, instruments: { orderBy: { role: "asc" } } } });
    if (!existing) throw new AssetRegisterError(`asset ${asset.tag} does not exist; use add to create it`);
    const { unitId, unitCode } = await resolveUnit(tx, asset);
    const before: Snapshot = { unit: existing.unit.code, instruments: existing.instruments.map(({ role, tag, standardUncertainty }) => ({ role, tag, standardUncertainty })) };
    for (const key of Object.keys(data.columns)) before[key] = existing[key as keyof typeof existing];
    const sortedInstruments = [...data.instruments].sort((a, b) => a.role.localeCompare(b.role));
    const changes = difference(before, { unit: unitCode, ...data.columns, instruments: sortedInstruments });
    if (Object.keys(changes).length === 0) return { tag: asset.tag, action: "unchanged", changedFields: [] };
    await tx.asset.update({ where: { id: existing.id }, data: { unitId, ...data.columns } });
    if (changes.instruments) {
      await tx.instrument.deleteMany({ where: { assetId: existing.id } });
      await tx.instrument.createMany({ data: data.instruments.map((instrument) => ({ ...instrument, assetId: existing.id })) });
    }
    await tx.assetRevision.create({ data: { assetId: existing.id, changedBy, action: "updated", changes: changes as Prisma.InputJsonValue } });
    await recordAudit(tx, { userId, actor: changedBy, action: "asset.update", entity: "asset", entityId: asset.tag, summary: `updated asset ${asset.tag}: ${Object.keys(changes).join(", ")}`, details: { changes } });
    return { tag: asset.tag, action: "updated", changedFields: Object.keys(changes) };
  });
}
