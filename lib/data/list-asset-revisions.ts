import type { PrismaClient } from "../../generated/prisma/client";

export interface AssetRevisionRow {
  changedAt: string;
  changedBy: string;
  action: string;
  changes: Record<string, { before: unknown; after: unknown }>;
}

/** The change history of one asset, newest first; null when the tag is unknown. */
export async function listAssetRevisions(prisma: PrismaClient, tag: string): Promise<AssetRevisionRow[] | null> {
  const asset = await prisma.asset.findUnique({ where: { tag }, select: { id: true } });
  if (!asset) return null;
  const revisions = await prisma.assetRevision.findMany({ where: { assetId: asset.id }, orderBy: [{ changedAt: "desc" }, { id: "desc" }] });
  return revisions.map((revision) => ({
    changedAt: revision.changedAt.toISOString(),
    changedBy: revision.changedBy,
    action: revision.action,
    changes: revision.changes as AssetRevisionRow["changes"],
  }));
}
