import { withRole } from "@/lib/auth/with-role";
import { fleetHealth, type FleetHealthRow } from "@/lib/data/fleet-health";
import { memoizeRecent } from "@/lib/data/memoize-recent";
import { getPrisma } from "@/lib/db";
import { encodedJsonResponse, encodeJson } from "@/lib/present/encoded-json";
import { applyFleetQuery, parseFleetQuery } from "@/lib/present/fleet-query";

export const dynamic = "force-dynamic";

/** The Rf trend line points are a page's picture (about 2/3 of the answer); the API sends them when asked. */
function withoutTrendLine(row: FleetHealthRow): FleetHealthRow {
  return row.summary ? { ...row, summary: { ...row.summary, sparkline: [] } } : row;
}

/**
 * The encoded answer for one normalised query, shared by concurrent callers and reused while it is younger than
 * FOULCAST_FLEET_CACHE_MS (default 5000 ms; 0 computes it for every request): with 500 exchangers, computing and
 * serialising it for each of 20 concurrent clients took seconds (docs/benchmarks.md).
 */
const fleetAnswer = memoizeRecent(
  async (key: string) => {
    const { trend, ...query } = JSON.parse(key) as ReturnType<typeof parseFleetQuery> & { trend: boolean };
    const all = await fleetHealth(getPrisma());
    const rows = applyFleetQuery(all, query);
    return encodeJson({ query, count: rows.length, total: all.length, rows: trend ? rows : rows.map(withoutTrendLine) });
  },
  { maxAgeMs: Number(process.env.FOULCAST_FLEET_CACHE_MS ?? 5000) || 0 },
);

/**
 * GET /api/fleet?site=&unit=&service=&status=&q=&sort=&dir=&trend=1: the fleet health rows (as on the fleet page,
 * values in SI: W, m²·K/W, W/(m²·K); money in the site currency; instants ISO-8601), filtered and sorted like the
 * page; the Rf trend line points (summary.sparkline) only with trend=1. Unknown sort keys or statuses are ignored.
 * At most FOULCAST_FLEET_CACHE_MS old; ETag and If-None-Match for pollers; Next's server gzips it for clients that accept it.
 */
export const GET = withRole("read", async (request: Request) => {
  const search = new URL(request.url).searchParams;
  const key = JSON.stringify({ ...parseFleetQuery(search), trend: search.get("trend") === "1" });
  return encodedJsonResponse(request, await fleetAnswer(key));
});
