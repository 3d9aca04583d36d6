// Shared helpers of the CLI commands.
import { prepareDatabase, type PreparedDatabase } from "../../lib/database/prepare-database";
import { databaseTarget } from "../../lib/database/connection-settings";
import { disconnectPrisma } from "../../lib/db";
import { closeSharedJobQueue } from "../../lib/jobs/shared-job-queue";

export const log = (message: string) => console.error(`[foulcast] ${message}`);

/** Where the database is, decided once before withDatabase() exports the URL it connected to. */
export const target = databaseTarget();

/** Runs `work` with the database ready, and always releases what this process started. */
export async function withDatabase<T>(work: (database: PreparedDatabase) => Promise<T>): Promise<T> {
  const database = await prepareDatabase({ log });
  process.env.DATABASE_URL = database.url;
  try {
    return await work(database);
  } finally {
    await closeSharedJobQueue();
    await disconnectPrisma();
    await database.release();
  }
}

export function printJson(value: unknown): void {
  process.stdout.write(`${JSON.stringify(value, null, 2)}\n`);
}

/** An error the user caused (bad file, unknown tag): printed without a stack, exit code 1. */
export class UsageError extends Error {}
