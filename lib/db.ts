// The single Prisma client of a process (Prisma with the pg driver adapter,
// for the embedded server and an external PostgreSQL alike).
import { PrismaPg } from "@prisma/adapter-pg";
import { PrismaClient } from "../generated/prisma/client";
import { databaseTarget } from "./database/connection-settings";

const globalForPrisma = globalThis as unknown as { foulcastPrisma?: PrismaClient };

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
 * A Prisma client on its own pool of at most 10 connections. An idle connection that the server closes is dropped
 * by the adapter's pool error handler (no crash); a query in flight when the connection is lost fails with the
 * server's or the driver's message, and the next query opens a new connection.
 */
export function createPrismaClient(url: string): PrismaClient {
  return new PrismaClient({ adapter: new RecoveringPrismaPg({ connectionString: url, max: 10 }) });
}

/** The process-wide client; DATABASE_URL or the embedded server's URL. */
export function getPrisma(): PrismaClient {
  globalForPrisma.foulcastPrisma ??= createPrismaClient(databaseTarget().url);
  return globalForPrisma.foulcastPrisma;
}

export async function disconnectPrisma(): Promise<void> {
  const client = globalForPrisma.foulcastPrisma;
  globalForPrisma.foulcastPrisma = undefined;
  if (client) await client.$disconnect();
}
