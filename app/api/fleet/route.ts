import { withRole } from "@/lib/auth/with-role";
import { fleetHealth } from "@/lib/data/fleet-health";
import { memoizeRecent } from "@/lib/data/memoize-recent";
import { getPrisma } from "@/lib/db";
import { applyFleetQuery, parseFleetQuery } from "@/lib/present/fleet-query";

export const dynamic = "force-dynamic";

/**
 * The answer for one query string, shared by concurrent callers and reused while it is younger than
 * FOULCAST_FLEET_CACHE_MS (default 5000 ms; 0 computes it for every request): with 500 exchangers the answer is
 * about 1.2 MB, and computing and serialising it for each of 20 concurrent clients took seconds (docs/benchmarks.md).
 */
const fleetAnswer = memoizeRecent(
  async (search: string) => {
    const query = parseFleetQuery(new URLSearchParams(search));
    const all = await fleetHealth(getPrisma());
    const rows = applyFleetQuery(all, query);
    return JSON.stringify({ query, count: rows.length, total: all.length, rows });
  },
  { maxAgeMs: Number(process.env.FOULCAST_FLEET_CACHE_MS ?? 5000) || 0 },
);

/**
 * GET /api/fleet?site=&unit=&service=&status=&q=&sort=&dir=: the fleet health rows (as on the fleet page, values
 * in SI: W, m²·K/W, W/(m²·K); money in the site currency; instants ISO-8601), filtered and sorted like the page.
 * Unknown sort keys or statuses are ignored. At most FOULCAST_FLEET_CACHE_MS old.
 */
export const GET = withRole("read", async (request: Request) => {
  const search = new URL(request.url).searchParams;
  search.sort();
  return new Response(await fleetAnswer(search.toString()), { headers: { "Content-Type": "application/json" } });
});
