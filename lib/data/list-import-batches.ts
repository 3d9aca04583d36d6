// Recent imports of one asset, newest first (without their reject lists).
import type { PrismaClient } from "../../generated/prisma/client";

export interface ImportBatchRow {
  id: number;
  assetTag: string;
  source: string;
  fileName: string;
  fileBytes: number;
  status: string;
  startedAt: string;
  finishedAt: string | null;
  rowsRead: number;
  rowsNew: number;
  rowsChanged: number;
  rowsUnchanged: number;
  rowsRejected: number;
  firstTime: string | null;
  lastTime: string | null;
  error: string | null;
  createdBy: string;
}

export const IMPORT_BATCH_ROW_SELECT = {
  id: true, source: true, fileName: true, fileBytes: true, status: true, startedAt: true, finishedAt: true, rowsRead: true,
  rowsNew: true, rowsChanged: true, rowsUnchanged: true, rowsRejected: true, firstTime: true, lastTime: true, error: true,
  createdBy: true, asset: { select: { tag: true } },
} as const;

type SelectedBatch = {
  id: number; source: string; fileName: string; fileBytes: bigint; status: string; startedAt: Date; finishedAt: Date | null;
  rowsRead: number; rowsNew: number; rowsChanged: number; rowsUnchanged: number; rowsRejected: number;
  firstTime: Date | null; lastTime: Date | null; error: string | null; createdBy: string; asset: { tag: string };
};

/** Plain JSON-ready row: ISO 8601 times, byte count as a number. */
export function importBatchRow(batch: SelectedBatch): ImportBatchRow {
  return {
    id: batch.id,
    assetTag: batch.asset.tag,
    source: batch.source,
    fileName: batch.fileName,
    fileBytes: Number(batch.fileBytes),
    status: batch.status,
    startedAt: batch.startedAt.toISOString(),
    finishedAt: batch.finishedAt?.toISOString() ?? null,
    rowsRead: batch.rowsRead,
    rowsNew: batch.rowsNew,
    rowsChanged: batch.rowsChanged,
    rowsUnchanged: batch.rowsUnchanged,
    rowsRejected: batch.rowsRejected,
    firstTime: batch.firstTime?.toISOString() ?? null,
    lastTime: batch.lastTime?.toISOString() ?? null,
    error: batch.error,
    createdBy: batch.createdBy,
  };
}

/** The asset's last `limit` import batches, newest first; null when the tag is unknown. */
export async function listImportBatches(prisma: PrismaClient, assetTag: string, limit = 20): Promise<ImportBatchRow[] | null> {
  const asset = await prisma.asset.findUnique({ where: { tag: assetTag }, select: { id: true } });
  if (!asset) return null;
  const batches = await prisma.importBatch.findMany({
    where: { assetId: asset.id },
    orderBy: [{ startedAt: "desc" }, { id: "desc" }],
    take: limit,
    select: IMPORT_BATCH_ROW_SELECT,
  });
  return batches.map(importBatchRow);
}
