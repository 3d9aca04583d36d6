// After an import that changed stored readings, recompute the asset's derived
// results (screened periods, instrument alerts, assessment): inline, or as a
// job on the reassessment queue when this process has one (FOULCAST_QUEUE=on,
// set by `npm start` for its web server; see lib/jobs).
import type PgBoss from "pg-boss";
import type { PrismaClient } from "../../generated/prisma/client";
import { enqueueReassessment } from "../jobs/enqueue-reassessment";
import { sharedJobQueue } from "../jobs/shared-job-queue";
import type { ImportSummary } from "./import-readings";
import { refreshFleet } from "./refresh-fleet";

export interface RefreshAfterImportOptions {
  /** The queue to send the job to; default: the process's shared queue (null when FOULCAST_QUEUE is off). null: inline. */
  queue?: PgBoss | null;
}

/** `reassessed`: recomputed inline; `queued`: a reassessment job for the asset is waiting (new, or one already queued). */
export async function refreshAfterImport(prisma: PrismaClient, summary: ImportSummary, options: RefreshAfterImportOptions = {}): Promise<{ reassessed: boolean; queued: boolean }> {
  if (summary.rowsNew + summary.rowsChanged === 0) return { reassessed: false, queued: false };
  const queue = options.queue !== undefined ? options.queue : await sharedJobQueue();
  if (queue) {
    const asset = await prisma.asset.findUnique({ where: { tag: summary.assetTag }, select: { id: true, tag: true } });
    if (asset) {
      await enqueueReassessment(queue, [asset]);
      return { reassessed: false, queued: true };
    }
  }
  await refreshFleet(prisma, { tags: [summary.assetTag] });
  return { reassessed: true, queued: false };
}
