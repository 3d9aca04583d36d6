import { z } from "zod";
import { withRole } from "@/lib/auth/with-role";
import { getPrisma } from "@/lib/db";
import { acceptProposals, listBookings, moveBooking, releaseBooking } from "@/lib/planning/bookings";
import { planningResponse, readJsonBody } from "@/lib/planning/planning-response";
import { resolveSiteCode } from "@/lib/planning/resolve-site";

export const dynamic = "force-dynamic";

/** GET /api/plan/bookings[?site=CODE]: booked cleaning weeks from the current week on. */
export const GET = withRole("read", async (request: Request) =>
  planningResponse(async () => {
    const siteCode = await resolveSiteCode(getPrisma(), new URL(request.url).searchParams.get("site"));
    return Response.json({ site: siteCode, bookings: await listBookings(getPrisma(), siteCode) });
  }),
);

const tag = z.string().min(1).max(40);
const bookingRequestSchema = z.discriminatedUnion("action", [
  z.object({ action: z.literal("accept"), site: z.string().optional(), tags: z.array(tag).max(10_000).default([]) }).strict(),
  z.object({ action: z.literal("move"), tag, week: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, "week must be YYYY-MM-DD"), note: z.string().max(500).default("") }).strict(),
  z.object({ action: z.literal("release"), tag }).strict(),
]);

/**
 * POST /api/plan/bookings: {action: "accept", tags?: [...]} books the latest plan's proposals (all when tags is
 * empty); {action: "move", tag, week: "YYYY-MM-DD", note?} books the week containing that date; {action: "release",
 * tag} frees the asset. Bookings apply from the next plan run (POST /api/plan).
 */
export const POST = withRole("bookings.edit", async (request: Request, _context: unknown, user) =>
  planningResponse(async () => {
    const body = bookingRequestSchema.parse(await readJsonBody(request));
    const actor = { userId: user.id, name: user.email };
    if (body.action === "accept") {
      const siteCode = await resolveSiteCode(getPrisma(), body.site);
      return Response.json({ booked: await acceptProposals(getPrisma(), siteCode, body.tags, actor) });
    }
    if (body.action === "move") return Response.json(await moveBooking(getPrisma(), body.tag, body.week, actor, { note: body.note }));
    return Response.json(await releaseBooking(getPrisma(), body.tag, actor));
  }),
);
