import { withRole } from "@/lib/auth/with-role";
import { loadAssetCharts } from "@/lib/data/load-asset-charts";
import { getPrisma } from "@/lib/db";
import { attachmentDisposition } from "@/lib/present/attachment-disposition";
import { ASSET_CHARTS, displayAssetCharts, isAssetChartName } from "@/lib/present/asset-charts";
import { chartCsv } from "@/lib/present/chart-csv";
import { isUnitSystem } from "@/lib/present/display-units";
import { badPathParameterMessage, pathParameter } from "@/lib/validation/path-parameter";

export const dynamic = "force-dynamic";

/**
 * GET /api/assets/{tag}/charts/{chart}.csv (chart = u | fouling | duty | closure | cycles): the data behind one chart
 * of the asset page as CSV, header row with units; in the caller's unit system, or ?units=si|us. 404 unknown asset
 * or chart, 409 not assessed yet.
 */
export const GET = withRole("read", async (request: Request, { params }: { params: Promise<{ tag: string; chart: string }> }, user) => {
  const { tag: tagSegment, chart: chartSegment } = await params;
  const tag = pathParameter(tagSegment);
  if (tag === null) return Response.json({ error: badPathParameterMessage("asset tag", tagSegment) }, { status: 400 });
  const chart = chartSegment.replace(/\.csv$/i, "");
  if (!isAssetChartName(chart)) return Response.json({ error: `unknown chart; one of ${ASSET_CHARTS.map((name) => `${name}.csv`).join(", ")}` }, { status: 404 });
  const requested = new URL(request.url).searchParams.get("units");
  const system = isUnitSystem(requested) ? requested : user.unitSystem;
  const loaded = await loadAssetCharts(getPrisma(), tag);
  if (!loaded) return Response.json({ error: `unknown asset ${tag}` }, { status: 404 });
  if (!loaded.charts) return Response.json({ error: `${tag} is not assessed yet (no usable operating data)` }, { status: 409 });
  const body = chartCsv(chart, displayAssetCharts(loaded.charts, system));
  return new Response(body, {
    headers: {
      "content-type": "text/csv; charset=utf-8; header=present",
      "content-disposition": attachmentDisposition(`${loaded.asset.tag}-${chart}-${system}.csv`),
      "cache-control": "no-store",
    },
  });
});
