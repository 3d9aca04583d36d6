// After an import that changed stored readings, recompute the asset's derived
// results (screened periods, instrument alerts, assessment).
import type { PrismaClient } from "../../generated/prisma/client";
import type { ImportSummary } from "./import-readings";
import { refreshFleet } from "./refresh-fleet";

export async function refreshAfterImport(prisma: PrismaClient, summary: ImportSummary): Promise<{ reassessed: boolean }> {
  if (summary.rowsNew + summary.rowsChanged === 0) return { reassessed: false };
  await refreshFleet(prisma, { tags: [summary.assetTag] });
  return { reassessed: true };
}
