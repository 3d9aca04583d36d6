// Recomputes the derived results of assets (screened periods, instrument alerts,
// the fouling assessment) after bulk changes such as loading the demo.
import type { PrismaClient } from "../../generated/prisma/client";
import { refreshAssessment } from "./refresh-assessment";
import { refreshDataQuality, type DataQualityRefresh } from "./refresh-data-quality";

export async function refreshFleet(prisma: PrismaClient, options: { log?: (message: string) => void; tags?: string[] } = {}): Promise<DataQualityRefresh[]> {
  const assets = await prisma.asset.findMany({ where: options.tags ? { tag: { in: options.tags } } : {}, select: { tag: true }, orderBy: { tag: "asc" } });
  const results: DataQualityRefresh[] = [];
  for (const { tag } of assets) {
    const result = await refreshDataQuality(prisma, tag);
    const assessment = await refreshAssessment(prisma, tag);
    const duty = assessment?.forecasts.duty;
    options.log?.(`  ${tag}: ${result.usablePeriods}/${result.periods} usable days, ${result.alerts.new} new instrument alert(s); duty threshold ${duty ? `${duty.status}${duty.p50 ? `, P50 ${duty.p50.slice(0, 10)}` : ""}` : "not assessed"}`);
    results.push(result);
  }
  return results;
}
