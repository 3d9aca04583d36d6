// Which site a planner request is about.
import type { PrismaClient } from "../../generated/prisma/client";
import { PlanningError } from "./load-plan-input";

/** The named site's code, or the only site's when none is named. */
export async function resolveSiteCode(prisma: PrismaClient, code: string | null | undefined): Promise<string> {
  if (code) {
    const site = await prisma.site.findUnique({ where: { code }, select: { code: true } });
    if (!site) throw new PlanningError(`unknown site "${code}"`);
    return site.code;
  }
  const sites = await prisma.site.findMany({ select: { code: true }, take: 2 });
  if (sites.length === 1) return (sites[0] as { code: string }).code;
  throw new PlanningError(sites.length === 0 ? "no site in the database yet" : "several sites: name one with site=<code>");
}
