// Where reassessments run: inline in the process that changed the data, or as jobs on the "reassess-asset" queue
// (pg-boss in the same PostgreSQL database) that worker processes take. Read once per process from the environment.
import type { Environment } from "../database/connection-settings";

export interface JobQueueSettings {
  /** Imports enqueue their asset instead of reassessing it inline (FOULCAST_QUEUE=on). */
  enqueue: boolean;
  /** Concurrent jobs of the worker that `npm start` runs in its own process (FOULCAST_WORKERS; 0 = none). */
  inProcessWorkers: number;
}

/** Largest concurrency accepted from the environment: each job holds one database connection and one asset in memory. */
const MAX_WORKERS = 32;

/**
 * jobQueueSettings: FOULCAST_QUEUE ("on" / "off", default off: inline, as a lone CLI process needs) and
 * FOULCAST_WORKERS (integer 0–32, default 1). `npm start` sets FOULCAST_QUEUE=on for its web server, whose imports
 * then go to the queue that its in-process worker (or separate `npm run worker` processes) take.
 * Throws on a value it cannot read, naming the variable.
 */
export function jobQueueSettings(env: Environment = process.env): JobQueueSettings {
  const queueText = (env.FOULCAST_QUEUE ?? "off").trim().toLowerCase();
  if (!["on", "off", "1", "0", "true", "false"].includes(queueText)) {
    throw new Error(`FOULCAST_QUEUE must be "on" or "off", got "${env.FOULCAST_QUEUE}"`);
  }
  const workersText = (env.FOULCAST_WORKERS ?? "1").trim();
  const workers = Number(workersText);
  if (!/^\d+$/.test(workersText) || workers > MAX_WORKERS) {
    throw new Error(`FOULCAST_WORKERS must be a whole number from 0 to ${MAX_WORKERS}, got "${env.FOULCAST_WORKERS}"`);
  }
  return { enqueue: ["on", "1", "true"].includes(queueText), inProcessWorkers: workers };
}
