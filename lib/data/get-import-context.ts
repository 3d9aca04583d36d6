// What the upload page needs to know about an asset: its names, the site's time zone and the saved mapping.
import type { PrismaClient } from "../../generated/prisma/client";
import { columnMappingSchema, type ColumnMapping } from "../validation/column-mapping";

export interface ImportContext {
  tag: string;
  name: string;
  siteTimeZone: string;
  /** The asset's saved column mapping, or null (none saved, or no longer valid). */
  savedMapping: ColumnMapping | null;
}

/** The import context of the asset with this tag, or null when the tag is unknown. */
export async function getImportContext(prisma: PrismaClient, tag: string): Promise<ImportContext | null> {
  const asset = await prisma.asset.findUnique({
    where: { tag },
    select: { tag: true, name: true, unit: { select: { site: { select: { timeZone: true } } } }, columnMapping: { select: { mapping: true } } },
  });
  if (!asset) return null;
  const saved = asset.columnMapping ? columnMappingSchema.safeParse(asset.columnMapping.mapping) : null;
  return { tag: asset.tag, name: asset.name, siteTimeZone: asset.unit.site.timeZone, savedMapping: saved?.success ? saved.data : null };
}
