// Records a cleaning of an asset and recomputes its assessment (a cleaning starts a new fouling cycle): inline, or as a
// job on the reassessment queue when this process has one (refreshAsset decides, as for imports).
import type { PrismaClient } from "../../generated/prisma/client";
import { recordAudit } from "./record-audit";
import { refreshAsset, type AssetRefresh, type RefreshAssetOptions } from "./refresh-asset";
import { cleaningSchema, type CleaningInput } from "../validation/cleaning";

export class CleaningRecordError extends Error {}

export type RecordCleaningOptions = Pick<RefreshAssetOptions, "queue">;

/**
 * `userId`: the signed-in user, null for the CLI. The cleaning and its audit event are written together. Then the
 * assessment: `reassessed` when recomputed inline (and the asset has usable data), `queued` when a reassessment job
 * for the asset is waiting (`queue`: default the process's shared queue, null: inline).
 */
export async function recordCleaning(prisma: PrismaClient, input: CleaningInput, createdBy: string, userId: string | null = null, options: RecordCleaningOptions = {}): Promise<{ id: number } & AssetRefresh> {
  const parsed = cleaningSchema.safeParse(input);
  if (!parsed.success) throw new CleaningRecordError(parsed.error.issues.map((issue) => `${issue.path.join(".") || "cleaning"}: ${issue.message}`).join("; "));
  const cleaning = parsed.data;
  const asset = await prisma.asset.findUnique({ where: { tag: cleaning.tag }, select: { id: true } });
  if (!asset) throw new CleaningRecordError(`unknown asset ${cleaning.tag}`);
  const overlapping = await prisma.cleaning.findFirst({
    where: { assetId: asset.id, date: { lte: cleaning.endDate ?? cleaning.date }, OR: [{ endDate: { gte: cleaning.date } }, { endDate: null, date: { gte: cleaning.date } }] },
  });
  if (overlapping) throw new CleaningRecordError(`${cleaning.tag} already has a cleaning recorded on ${overlapping.date.toISOString().slice(0, 10)} that overlaps this one`);
  const created = await prisma.$transaction(async (tx) => {
    const row = await tx.cleaning.create({
      data: {
        assetId: asset.id,
        date: cleaning.date,
        endDate: cleaning.endDate ?? null,
        method: cleaning.method,
        costCents: cleaning.cost === undefined ? null : Math.round(cleaning.cost * 100),
        notes: cleaning.notes,
        createdBy,
      },
    });
    const day = row.date.toISOString().slice(0, 10);
    await recordAudit(tx, {
      userId,
      actor: createdBy,
      action: "cleaning.record",
      entity: "cleaning",
      entityId: String(row.id),
      summary: `recorded a ${cleaning.method} cleaning of ${cleaning.tag} on ${day}`,
      details: { tag: cleaning.tag, date: row.date.toISOString(), endDate: row.endDate?.toISOString() ?? null, method: row.method, costCents: row.costCents },
    });
    return row;
  });
  const { reassessed, queued } = await refreshAsset(prisma, cleaning.tag, { queue: options.queue, inline: "assessment" });
  return { id: created.id, reassessed, queued };
}
