// The single Prisma client of a process (Prisma with the pg driver adapter,
// for the embedded server and an external PostgreSQL alike).
import { PrismaPg } from "@prisma/adapter-pg";
import { PrismaClient } from "../generated/prisma/client";
import { databaseTarget } from "./database/connection-settings";

const globalForPrisma = globalThis as unknown as { foulcastPrisma?: PrismaClient };

export function createPrismaClient(url: string): PrismaClient {
  return new PrismaClient({ adapter: new PrismaPg({ connectionString: url, max: 10 }) });
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
