// The job queue: pg-boss on Foulcast's own PostgreSQL database, in pg-boss's own schema ("pgboss"), which pg-boss
// creates and migrates itself at start (under its own advisory lock). Foulcast's migrations and tables in "public"
// are untouched. Every process that sends or works jobs opens one queue with its own small connection pool.
import PgBoss from "pg-boss";

/** The queue of per-asset reassessments (screening, alerts, assessment). */
export const REASSESS_QUEUE = "reassess-asset";

export interface ReassessJobData {
  assetId: number;
  /** For people reading the queue; the worker looks the asset up by id (a tag can be renamed). */
  tag: string;
}

export interface OpenJobQueueOptions {
  /** Connections of the queue's own pool; default 2 (sending) — a worker needs one per concurrent fetch loop. */
  maxConnections?: number;
  /** Run pg-boss maintenance (expire stuck jobs, archive, delete old ones); default false, workers turn it on. */
  maintenance?: boolean;
  /** Errors pg-boss reports in the background (failed polls, maintenance); default: printed to stderr. */
  onError?: (error: Error) => void;
}

/**
 * The queue's job settings. Policy "short": at most one *queued* job per singleton key (the asset), so an asset
 * imported ten times before a worker reaches it is reassessed once, while a job for an asset already being
 * reassessed can still be queued (it will read the newer data). Two retries 30 s apart; a job running longer than
 * 15 minutes is expired and retried.
 */
const QUEUE_OPTIONS = { policy: "short", retryLimit: 2, retryDelay: 30, expireInSeconds: 900 } as const;

/** openJobQueue: starts pg-boss on `url` (creating its schema on first use) and makes sure the queue exists. */
export async function openJobQueue(url: string, options: OpenJobQueueOptions = {}): Promise<PgBoss> {
  const boss = new PgBoss({
    connectionString: url,
    max: options.maxConnections ?? 2,
    application_name: "foulcast jobs",
    supervise: options.maintenance ?? false,
    schedule: false,
    migrate: true,
  });
  const onError = options.onError ?? ((error: Error) => console.error(`[foulcast] job queue: ${error.message}`));
  boss.on("error", onError);
  await boss.start();
  // Idempotent: the queue row is inserted with ON CONFLICT DO NOTHING.
  await boss.createQueue(REASSESS_QUEUE, { name: REASSESS_QUEUE, ...QUEUE_OPTIONS });
  return boss;
}
