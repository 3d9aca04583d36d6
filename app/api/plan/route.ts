import { z } from "zod";
import { withRole } from "@/lib/auth/with-role";
import { getPrisma } from "@/lib/db";
import { planDocument } from "@/lib/planning/plan-document";
import { planningResponse, readJsonBody } from "@/lib/planning/planning-response";
import { resolveSiteCode } from "@/lib/planning/resolve-site";
import { latestPlanRun, runPlan } from "@/lib/planning/run-plan";

export const dynamic = "force-dynamic";

/** GET /api/plan[?site=CODE]: the site's latest cleaning plan (README, "Cleaning planner"); 404 before the first run. */
export const GET = withRole("read", async (request: Request) =>
  planningResponse(async () => {
    const siteCode = await resolveSiteCode(getPrisma(), new URL(request.url).searchParams.get("site"));
    const run = await latestPlanRun(getPrisma(), siteCode);
    if (!run) return Response.json({ error: `site ${siteCode} has no plan yet: POST /api/plan to make one` }, { status: 404 });
    return Response.json(planDocument(run));
  }),
);

const planRequestSchema = z
  .object({
    site: z.string().min(1).max(40).optional(),
    scenario: z
      .object({
        fuelPriceFactor: z.number().min(0, "fuelPriceFactor must be >= 0").max(100).optional(),
        co2PriceFactor: z.number().min(0, "co2PriceFactor must be >= 0").max(100).optional(),
        crewCapacityDelta: z.number().int("crewCapacityDelta must be a whole number").min(-100).max(100).optional(),
      })
      .strict()
      .optional(),
  })
  .strict();

/**
 * POST /api/plan {site?, scenario?}: plans the site again around its bookings and returns the new run (201) with its
 * comparison to the previous plan; with a scenario, a what-if run compared with a fresh baseline.
 */
export const POST = withRole("plan.run", async (request: Request, _context: unknown, user) =>
  planningResponse(async () => {
    const body = planRequestSchema.parse(await readJsonBody(request));
    const siteCode = await resolveSiteCode(getPrisma(), body.site);
    const document = await runPlan(getPrisma(), { siteCode, actor: { userId: user.id, name: user.email }, ...(body.scenario ? { scenario: body.scenario } : {}) });
    return Response.json(document, { status: 201 });
  }),
);
