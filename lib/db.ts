// The single Prisma client of a process (Prisma with the pg driver adapter,
// for the embedded server and an external PostgreSQL alike), and its pg pool.
import { PrismaPg } from "@prisma/adapter-pg";
import pg from "pg";
import { PrismaClient } from "../generated/prisma/client";
import { databaseTarget } from "./database/connection-settings";

const globalForPrisma = globalThis as unknown as { foulcastPrisma?: PrismaClient; foulcastPool?: pg.Pool };

type AdapterTransaction = Awaited<ReturnType<Awaited<ReturnType<PrismaPg["connect"]>>["startTransaction"]>>;

/**
 * Gives a transaction's connection back to the pool when its ROLLBACK fails.
 *
 * Prisma 6.19 ends a failed interactive transaction by sending ROLLBACK through the transaction's connection and
 * calls the adapter's rollback() (which releases the connection) only when that succeeds. When the connection is
 * gone (server restart, pg_terminate_backend, network loss) ROLLBACK fails, and the connection was never released:
 * each such transaction cost the pool one of its connections for good, and after `max` of them every later query
 * waited for ever (test/robustness/database-restart.test.ts). A failed ROLLBACK means the session is unusable; the
 * server rolls back an open transaction when its session ends (PostgreSQL docs, "Transactions"), so releasing is
 * safe: pg-pool discards a released client whose connection has failed and opens a new one when needed.
 */
function releaseWhenRollbackFails(transaction: AdapterTransaction): AdapterTransaction {
  const executeRaw = transaction.executeRaw.bind(transaction);
  const rollback = transaction.rollback.bind(transaction);
  let released = false;
  const releaseOnce = async () => {
    if (released) return;
    released = true;
    await rollback();
  };
  transaction.executeRaw = async (query) => {
    try {
      return await executeRaw(query);
    } catch (error) {
      if (query.sql === "ROLLBACK") await releaseOnce();
      throw error;
    }
  };
  transaction.rollback = releaseOnce;
  return transaction;
}

/** PrismaPg whose transactions release their connection even when the ROLLBACK after a lost connection fails. */
class RecoveringPrismaPg extends PrismaPg {
  override async connect() {
    const adapter = await super.connect();
    const startTransaction = adapter.startTransaction.bind(adapter);
    adapter.startTransaction = async (isolationLevel) => releaseWhenRollbackFails(await startTransaction(isolationLevel));
    return adapter;
  }
}

/**
 * A pool of at most 10 connections. An idle connection that the server closes is dropped (no crash, also before
 * Prisma first connects); a query in flight when the connection is lost fails with the server's or the driver's
 * message, and the next query opens a new connection.
 */
function createPool(url: string): pg.Pool {
  const pool = new pg.Pool({ connectionString: url, max: 10 });
  pool.on("error", () => undefined);
  return pool;
}

/** A Prisma client on its own pool (see createPool), which $disconnect ends. */
export function createPrismaClient(url: string, pool: pg.Pool = createPool(url)): PrismaClient {
  return new PrismaClient({ adapter: new RecoveringPrismaPg(pool, { disposeExternalPool: true }) });
}

/** The process-wide client; DATABASE_URL or the embedded server's URL. */
export function getPrisma(): PrismaClient {
  if (!globalForPrisma.foulcastPrisma) {
    const pool = createPool(databaseTarget().url);
    globalForPrisma.foulcastPrisma = createPrismaClient(databaseTarget().url, pool);
    globalForPrisma.foulcastPool = pool;
  }
  return globalForPrisma.foulcastPrisma;
}

/**
 * The pool under the process-wide client, for the few hot reads where Prisma's own cost per query matters (the
 * session check on every request: about 1 ms of CPU through $queryRaw, docs/benchmarks.md). Parameterised SQL only.
 */
export function getDatabasePool(): pg.Pool {
  getPrisma();
  return globalForPrisma.foulcastPool as pg.Pool;
}

export async function disconnectPrisma(): Promise<void> {
  const client = globalForPrisma.foulcastPrisma;
  const pool = globalForPrisma.foulcastPool;
  globalForPrisma.foulcastPrisma = undefined;
  globalForPrisma.foulcastPool = undefined;
  if (client) await client.$disconnect();
  // $disconnect ends the pool only if Prisma had connected.
  if (pool && !pool.ending && !pool.ended) await pool.end();
}
