import { withRole } from "@/lib/auth/with-role";
import { fleetHealth } from "@/lib/data/fleet-health";
import { getPrisma } from "@/lib/db";
import { applyFleetQuery, parseFleetQuery } from "@/lib/present/fleet-query";

export const dynamic = "force-dynamic";

/**
 * GET /api/fleet?site=&unit=&service=&status=&q=&sort=&dir=: the fleet health rows (as on the fleet page, values
 * in SI: W, m²·K/W, W/(m²·K); money in the site currency; instants ISO-8601), filtered and sorted like the page.
 * Unknown sort keys or statuses are ignored.
 */
export const GET = withRole("read", async (request: Request) => {
  const query = parseFleetQuery(new URL(request.url).searchParams);
  const all = await fleetHealth(getPrisma());
  const rows = applyFleetQuery(all, query);
  return Response.json({ query, count: rows.length, total: all.length, rows });
});
