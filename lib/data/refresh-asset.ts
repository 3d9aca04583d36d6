// After a change to an asset's stored data (an import, a cleaning record), recompute its derived results: inline, or
// as a job on the reassessment queue when this process has one (FOULCAST_QUEUE=on, set by `npm start` for its web
// server; see lib/jobs). The one place that makes this decision.
import type PgBoss from "pg-boss";
import type { PrismaClient } from "../../generated/prisma/client";
import { enqueueReassessment } from "../jobs/enqueue-reassessment";
import { sharedJobQueue } from "../jobs/shared-job-queue";
import { refreshAssessment } from "./refresh-assessment";
import { refreshFleet } from "./refresh-fleet";

export interface RefreshAssetOptions {
  /** The queue to send the job to; default: the process's shared queue (null when FOULCAST_QUEUE is off). null: inline. */
  queue?: PgBoss | null;
  /**
   * What to recompute inline: "all" (default; screening, instrument alerts, assessment, after readings changed) or
   * "assessment" (after a cleaning record, which leaves the screened periods as they are). A queued job always runs
   * the whole pipeline (lib/jobs/reassess-asset.ts).
   */
  inline?: "all" | "assessment";
}

export interface AssetRefresh {
  /** Recomputed inline (with `inline: "assessment"`: and the asset has an assessment, i.e. usable data). */
  reassessed: boolean;
  /** A reassessment job for the asset is waiting (new, or one already queued: pg-boss keeps one per asset). */
  queued: boolean;
}

/** refreshAsset: queues the asset's reassessment when there is a queue (and the asset exists), else recomputes it inline. */
export async function refreshAsset(prisma: PrismaClient, tag: string, options: RefreshAssetOptions = {}): Promise<AssetRefresh> {
  const queue = options.queue !== undefined ? options.queue : await sharedJobQueue();
  if (queue) {
    const asset = await prisma.asset.findUnique({ where: { tag }, select: { id: true, tag: true } });
    if (asset) {
      await enqueueReassessment(queue, [asset]);
      return { reassessed: false, queued: true };
    }
  }
  if (options.inline === "assessment") return { reassessed: (await refreshAssessment(prisma, tag)) !== null, queued: false };
  await refreshFleet(prisma, { tags: [tag] });
  return { reassessed: true, queued: false };
}
