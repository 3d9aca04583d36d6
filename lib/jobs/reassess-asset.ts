// One reassessment job: the pipeline that runs after readings change (lib/data/refresh-fleet.ts does the same for a
// list of assets inline): screening and instrument alerts, then the fouling assessment.
import type pg from "pg";
import type { PrismaClient } from "../../generated/prisma/client";
import { refreshAssessment } from "../data/refresh-assessment";
import { refreshDataQuality } from "../data/refresh-data-quality";

/**
 * First key of the per-asset advisory lock (pg_advisory_lock(int4, int4), the second key is the asset id): "Fc".
 * The two-key form never collides with the one-key locks of the migration runner and the demo seeding.
 */
export const REASSESS_LOCK_CLASS = 0x4663;

export interface ReassessOutcome {
  assetId: number;
  /** null when the asset was deleted after the job was queued (nothing to do). */
  tag: string | null;
  periods: number;
  usablePeriods: number;
  assessed: boolean;
}

/**
 * reassessAsset: screens and assesses one asset while holding a PostgreSQL advisory lock on it, so two workers (in
 * one process or on different machines) never recompute the same asset at the same time — the second waits and then
 * recomputes from the newer data. The lock is a session lock on a connection from `locks`; it is released at the
 * end, or by the server when that connection is lost.
 */
export async function reassessAsset(prisma: PrismaClient, locks: pg.Pool, assetId: number): Promise<ReassessOutcome> {
  const client = await locks.connect();
  try {
    await client.query("select pg_advisory_lock($1, $2)", [REASSESS_LOCK_CLASS, assetId]);
    try {
      const asset = await prisma.asset.findUnique({ where: { id: assetId }, select: { tag: true } });
      if (!asset) return { assetId, tag: null, periods: 0, usablePeriods: 0, assessed: false };
      const quality = await refreshDataQuality(prisma, asset.tag);
      const assessment = await refreshAssessment(prisma, asset.tag);
      return { assetId, tag: asset.tag, periods: quality.periods, usablePeriods: quality.usablePeriods, assessed: assessment !== null };
    } finally {
      await client.query("select pg_advisory_unlock($1, $2)", [REASSESS_LOCK_CLASS, assetId]);
    }
  } finally {
    client.release();
  }
}
