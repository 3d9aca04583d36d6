import { withRole } from "@/lib/auth/with-role";
import { getPrisma } from "@/lib/db";
import { planDocument } from "@/lib/planning/plan-document";

export const dynamic = "force-dynamic";

/** GET /api/plan/runs/{id}: one stored plan or what-if run. */
export const GET = withRole("read", async (_request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const id = Number((await params).id);
  if (!Number.isInteger(id) || id < 1) return Response.json({ error: "run id must be a positive whole number" }, { status: 400 });
  const run = await getPrisma().planRun.findUnique({ where: { id } });
  if (!run) return Response.json({ error: `no plan run ${id}` }, { status: 404 });
  return Response.json(planDocument(run));
});
