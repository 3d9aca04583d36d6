// One import batch with its reject list and the options it used.
import type { PrismaClient } from "../../generated/prisma/client";
import type { RejectedRow } from "../import/import-errors";
import { IMPORT_BATCH_ROW_SELECT, importBatchRow, type ImportBatchRow } from "./list-import-batches";

export interface ImportBatchDetail extends ImportBatchRow {
  /** The first 10,000 rejected rows; rowsRejected has the count. */
  rejects: RejectedRow[];
  /** Mapping and options the import used (see lib/data/import-readings.ts). */
  options: unknown;
}

function asRejects(value: unknown): RejectedRow[] {
  if (!Array.isArray(value)) return [];
  return value.flatMap((entry: unknown) => {
    const candidate = entry as { line?: unknown; reason?: unknown };
    return typeof candidate?.line === "number" && typeof candidate.reason === "string" ? [{ line: candidate.line, reason: candidate.reason }] : [];
  });
}

/** The batch with this id, or null. */
export async function getImportBatch(prisma: PrismaClient, id: number): Promise<ImportBatchDetail | null> {
  if (!Number.isSafeInteger(id) || id <= 0 || id > 2_147_483_647) return null;
  const batch = await prisma.importBatch.findUnique({ where: { id }, select: { ...IMPORT_BATCH_ROW_SELECT, rejects: true, options: true } });
  if (!batch) return null;
  return { ...importBatchRow(batch), rejects: asRejects(batch.rejects), options: batch.options };
}
