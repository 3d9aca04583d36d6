// A complete worker for one process: its own queue connection (with pg-boss maintenance), its own Prisma client,
// and `concurrency` fetch loops. Used by `npm run worker` and by the worker that `npm start` runs beside the web server.
import { createPrismaClient } from "../db";
import { openJobQueue } from "./open-job-queue";
import { startReassessWorkers, type ReassessWorkerOptions } from "./start-reassess-workers";

export interface RunningWorker {
  /** Stops taking jobs, lets the ones in progress finish (at most `timeoutMs`), then closes every connection. */
  stop(timeoutMs?: number): Promise<void>;
}

/** runReassessWorker: starts a worker on the database at `url`. */
export async function runReassessWorker(url: string, options: ReassessWorkerOptions = {}): Promise<RunningWorker> {
  const concurrency = options.concurrency ?? 1;
  // One queue connection per fetch loop plus one for sending, completing and maintenance.
  const boss = await openJobQueue(url, { maxConnections: concurrency + 1, maintenance: true });
  const prisma = createPrismaClient(url);
  const workers = await startReassessWorkers(boss, prisma, url, options);
  let stopping: Promise<void> | null = null;
  return {
    // Idempotent: a second call (e.g. from a signal handler and the normal end at once) waits for the first.
    stop: (timeoutMs = 60_000) =>
      (stopping ??= (async () => {
        await workers.stop(timeoutMs);
        await boss.stop({ graceful: true, wait: true, timeout: timeoutMs });
        await prisma.$disconnect();
      })()),
  };
}
