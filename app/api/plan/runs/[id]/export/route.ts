import { withRole } from "@/lib/auth/with-role";
import { getPrisma } from "@/lib/db";
import { exportPlan, PLAN_EXPORT_FORMATS, type PlanExportFormat } from "@/lib/planning/export-plan";

export const dynamic = "force-dynamic";

/** GET /api/plan/runs/{id}/export?format=ics|csv|xlsx: the run's cleanings as a file (attachment). */
export const GET = withRole("read", async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const id = Number((await params).id);
  if (!Number.isInteger(id) || id < 1) return Response.json({ error: "run id must be a positive whole number" }, { status: 400 });
  const format = new URL(request.url).searchParams.get("format") ?? "";
  if (!PLAN_EXPORT_FORMATS.includes(format as PlanExportFormat)) return Response.json({ error: `format must be one of ${PLAN_EXPORT_FORMATS.join(", ")}` }, { status: 400 });
  const run = await getPrisma().planRun.findUnique({ where: { id } });
  if (!run) return Response.json({ error: `no plan run ${id}` }, { status: 404 });
  const file = await exportPlan(run, format as PlanExportFormat, Date.now());
  return new Response(new Uint8Array(file.body), {
    headers: { "content-type": file.contentType, "content-disposition": `attachment; filename="${file.fileName}"`, "cache-control": "no-store" },
  });
});
