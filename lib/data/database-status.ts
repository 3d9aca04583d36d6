import type { PrismaClient } from "../../generated/prisma/client";

export interface DatabaseStatus {
  migrations: number;
  sites: number;
  assets: number;
  readings: number;
  cleanings: number;
}

export async function databaseStatus(prisma: PrismaClient): Promise<DatabaseStatus> {
  const [migrations] = await prisma.$queryRaw<{ count: bigint }[]>`select count(*) as count from "_prisma_migrations" where finished_at is not null`;
  const [sites, assets, readings, cleanings] = await Promise.all([
    prisma.site.count(),
    prisma.asset.count(),
    prisma.reading.count(),
    prisma.cleaning.count(),
  ]);
  return { migrations: Number(migrations?.count ?? 0), sites, assets, readings, cleanings };
}
