// After an import that changed stored readings, recompute the asset's derived
// results (screened periods, instrument alerts, assessment): inline, or as a
// job on the reassessment queue when this process has one (refreshAsset decides).
import type { PrismaClient } from "../../generated/prisma/client";
import type { ImportSummary } from "./import-readings";
import { refreshAsset, type AssetRefresh, type RefreshAssetOptions } from "./refresh-asset";

export type RefreshAfterImportOptions = Pick<RefreshAssetOptions, "queue">;

/** `reassessed`: recomputed inline; `queued`: a reassessment job for the asset is waiting (new, or one already queued). Neither when the import changed no row. */
export async function refreshAfterImport(prisma: PrismaClient, summary: ImportSummary, options: RefreshAfterImportOptions = {}): Promise<AssetRefresh> {
  if (summary.rowsNew + summary.rowsChanged === 0) return { reassessed: false, queued: false };
  return refreshAsset(prisma, summary.assetTag, { queue: options.queue });
}
