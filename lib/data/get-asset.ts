import type { PrismaClient } from "../../generated/prisma/client";

/** One asset with its site, instruments and cleaning records, or null when the tag is unknown. */
export async function getAsset(prisma: PrismaClient, tag: string) {
  return prisma.asset.findUnique({
    where: { tag },
    include: {
      unit: { include: { site: true } },
      instruments: { orderBy: { role: "asc" } },
      cleanings: { orderBy: { date: "asc" } },
      demoTruth: { select: { assetId: true } },
    },
  });
}

export type AssetDetail = NonNullable<Awaited<ReturnType<typeof getAsset>>>;
