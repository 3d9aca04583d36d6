// Puts assets on the reassessment queue, one job per asset, keyed by the asset so an asset already waiting is not
// queued a second time.
import type PgBoss from "pg-boss";
import { REASSESS_QUEUE, type ReassessJobData } from "./open-job-queue";

export interface EnqueueResult {
  /** Jobs created. */
  queued: number;
  /** Assets that already had a job waiting (the waiting job will read the newest data). */
  alreadyQueued: number;
}

/** The singleton key of an asset's reassessment job. */
export function reassessSingletonKey(assetId: number): string {
  return `asset:${assetId}`;
}

/** enqueueReassessment: one "reassess-asset" job per asset; pg-boss refuses a second queued job with the same key. */
export async function enqueueReassessment(boss: PgBoss, assets: readonly { id: number; tag: string }[]): Promise<EnqueueResult> {
  let queued = 0;
  for (const asset of assets) {
    const data: ReassessJobData = { assetId: asset.id, tag: asset.tag };
    const id = await boss.send(REASSESS_QUEUE, data, { singletonKey: reassessSingletonKey(asset.id) });
    if (id !== null) queued += 1;
  }
  return { queued, alreadyQueued: assets.length - queued };
}
