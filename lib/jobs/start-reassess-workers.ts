// The worker side of the reassessment queue: `concurrency` fetch loops in this process, each taking one job at a
// time. Any number of processes, on this machine or others sharing the database, may run workers: pg-boss hands
// each job to exactly one of them (SELECT … FOR UPDATE SKIP LOCKED), so they split the fleet between them.
import pg from "pg";
import type PgBoss from "pg-boss";
import type { PrismaClient } from "../../generated/prisma/client";
import { REASSESS_QUEUE, type ReassessJobData } from "./open-job-queue";
import { reassessAsset, type ReassessOutcome } from "./reassess-asset";

export interface ReassessWorkerOptions {
  /** Jobs processed at the same time in this process (default 1). The pipeline is CPU-bound JavaScript, so more than
   * one per process only overlaps database waits; to use more cores, run more processes. */
  concurrency?: number;
  /** Seconds between polls of an idle worker (pg-boss minimum 0.5; default 2). */
  pollingIntervalSeconds?: number;
  /** Called after each job with its outcome and wall time. */
  onJob?: (outcome: ReassessOutcome, milliseconds: number) => void;
  /** Called when a job fails (pg-boss then retries it, up to the queue's retry limit). */
  onFailure?: (data: ReassessJobData, error: unknown) => void;
}

export interface ReassessWorkers {
  /** Stops fetching, waits for the jobs in progress (at most `timeoutMs`), and closes the lock pool; idempotent. */
  stop(timeoutMs?: number): Promise<void>;
}

/** startReassessWorkers: registers the workers on an open queue (see openJobQueue) and returns a handle to stop them. */
export async function startReassessWorkers(boss: PgBoss, prisma: PrismaClient, url: string, options: ReassessWorkerOptions = {}): Promise<ReassessWorkers> {
  const concurrency = options.concurrency ?? 1;
  if (!Number.isInteger(concurrency) || concurrency < 1) throw new Error(`worker concurrency must be a whole number of at least 1, got ${concurrency}`);
  const locks = new pg.Pool({ connectionString: url, max: concurrency, application_name: "foulcast worker locks" });
  locks.on("error", () => undefined); // an idle lock connection that the server closes is simply dropped
  let inProgress = 0;
  const handler = async (jobs: PgBoss.Job<ReassessJobData>[]): Promise<ReassessOutcome[]> => {
    inProgress += 1;
    try {
      return await runJobs(jobs);
    } finally {
      inProgress -= 1;
    }
  };
  const runJobs = async (jobs: PgBoss.Job<ReassessJobData>[]): Promise<ReassessOutcome[]> => {
    const outcomes: ReassessOutcome[] = [];
    for (const job of jobs) {
      const started = performance.now();
      try {
        const outcome = await reassessAsset(prisma, locks, job.data.assetId);
        options.onJob?.(outcome, performance.now() - started);
        outcomes.push(outcome);
      } catch (error) {
        options.onFailure?.(job.data, error);
        throw error;
      }
    }
    return outcomes;
  };
  const ids: string[] = [];
  for (let index = 0; index < concurrency; index += 1) {
    ids.push(await boss.work<ReassessJobData>(REASSESS_QUEUE, { batchSize: 1, pollingIntervalSeconds: options.pollingIntervalSeconds ?? 2 }, handler));
  }
  let stopping: Promise<void> | null = null;
  return {
    stop: (timeoutMs = 60_000) =>
      (stopping ??= (async () => {
        for (const id of ids) await boss.offWork({ id });
        // offWork returns at once; wait until no job of ours is in progress.
        const deadline = Date.now() + timeoutMs;
        while (inProgress > 0 && Date.now() < deadline) await new Promise((resolve) => setTimeout(resolve, 100));
        await locks.end();
      })()),
  };
}
