// The process-wide job queue used for sending jobs (like lib/db.ts for the Prisma client): opened on first use
// when FOULCAST_QUEUE=on, else absent and callers reassess inline.
import type PgBoss from "pg-boss";
import { databaseTarget } from "../database/connection-settings";
import { jobQueueSettings } from "./job-queue-settings";
import { openJobQueue } from "./open-job-queue";

const globalForQueue = globalThis as unknown as { foulcastJobQueue?: Promise<PgBoss> };

/** sharedJobQueue: the open queue of this process (DATABASE_URL or the embedded server), or null when FOULCAST_QUEUE is off. */
export async function sharedJobQueue(): Promise<PgBoss | null> {
  if (!jobQueueSettings().enqueue) return null;
  globalForQueue.foulcastJobQueue ??= openJobQueue(databaseTarget().url).catch((error: unknown) => {
    globalForQueue.foulcastJobQueue = undefined; // try again on the next call
    throw error;
  });
  return globalForQueue.foulcastJobQueue;
}

/** Stops the shared queue if this process opened it (closes its connections). */
export async function closeSharedJobQueue(): Promise<void> {
  const queue = globalForQueue.foulcastJobQueue;
  globalForQueue.foulcastJobQueue = undefined;
  if (queue) await (await queue).stop({ graceful: false, wait: true, timeout: 5_000 });
}
