import { withRole } from "@/lib/auth/with-role";
import { getPrisma } from "@/lib/db";
import { economicsSummary } from "@/lib/planning/economics-summary";
import { badPathParameterMessage, pathParameter } from "@/lib/validation/path-parameter";

export const dynamic = "force-dynamic";

/**
 * GET /api/assets/{tag}/economics: cost of fouling per day now and projected, cost of the current cycle, and the
 * optimal cleaning interval (site currency; duty in W). 404 unknown asset, 409 when it cannot be costed yet.
 */
export const GET = withRole("read", async (_request: Request, { params }: { params: Promise<{ tag: string }> }) => {
  const segment = (await params).tag;
  const tag = pathParameter(segment);
  if (tag === null) return Response.json({ error: badPathParameterMessage("asset tag", segment) }, { status: 400 });
  const asset = await getPrisma().asset.findUnique({ where: { tag }, include: { unit: { include: { site: true } }, assessment: true } });
  if (!asset) return Response.json({ error: `unknown asset ${tag}` }, { status: 404 });
  const result = economicsSummary(asset, asset.unit.site, asset.assessment);
  if (!result.ok) return Response.json({ error: `${tag} cannot be costed yet: ${result.reason}` }, { status: 409 });
  return Response.json({ tag, ...result.summary });
});
