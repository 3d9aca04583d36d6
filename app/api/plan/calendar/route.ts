import { z } from "zod";
import { withRole } from "@/lib/auth/with-role";
import { getPrisma } from "@/lib/db";
import { planningResponse, readJsonBody } from "@/lib/planning/planning-response";
import { resolveSiteCode } from "@/lib/planning/resolve-site";
import { addCalendarWindow, getPlanSettings, listCalendarWindows, listExclusionGroups, removeCalendarWindow, setExclusionGroup, updatePlanSettings } from "@/lib/planning/site-calendar";

export const dynamic = "force-dynamic";

/** GET /api/plan/calendar[?site=CODE]: planning settings, turnaround and blackout windows, exclusion groups. */
export const GET = withRole("read", async (request: Request) =>
  planningResponse(async () => {
    const siteCode = await resolveSiteCode(getPrisma(), new URL(request.url).searchParams.get("site"));
    const prisma = getPrisma();
    return Response.json({ site: siteCode, settings: await getPlanSettings(prisma, siteCode), windows: await listCalendarWindows(prisma, siteCode), groups: await listExclusionGroups(prisma, siteCode) });
  }),
);

const calendarRequestSchema = z.discriminatedUnion("action", [
  z.object({ action: z.literal("settings"), site: z.string().optional(), settings: z.record(z.string(), z.unknown()) }).strict(),
  z.object({ action: z.literal("add-window"), site: z.string().optional(), window: z.record(z.string(), z.unknown()) }).strict(),
  z.object({ action: z.literal("remove-window"), site: z.string().optional(), id: z.number().int().positive() }).strict(),
  z.object({ action: z.literal("group"), site: z.string().optional(), name: z.string(), tags: z.array(z.string().max(40)).max(1000) }).strict(),
]);

/** POST /api/plan/calendar: change settings, add or remove a window, or set an exclusion group (see README). */
export const POST = withRole("calendar.edit", async (request: Request, _context: unknown, user) =>
  planningResponse(async () => {
    const body = calendarRequestSchema.parse(await readJsonBody(request));
    const prisma = getPrisma();
    const siteCode = await resolveSiteCode(prisma, body.site);
    const actor = { userId: user.id, name: user.email };
    if (body.action === "settings") return Response.json({ settings: await updatePlanSettings(prisma, siteCode, body.settings, actor) });
    if (body.action === "add-window") return Response.json({ window: await addCalendarWindow(prisma, siteCode, body.window, actor) }, { status: 201 });
    if (body.action === "remove-window") {
      await removeCalendarWindow(prisma, siteCode, body.id, actor);
      return Response.json({ removed: body.id });
    }
    await setExclusionGroup(prisma, siteCode, body.name, body.tags, actor);
    return Response.json({ group: { name: body.name, tags: body.tags } });
  }),
);
