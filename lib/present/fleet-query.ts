// The fleet table's filters and sort as they travel in the URL (?site=&unit=&service=&status=&q=&sort=&dir=), and
// the filtering and sorting of fleet rows they ask for. Pure: the page, the API and the tests share it.
import type { FleetHealthRow } from "../data/fleet-health";
import { FLEET_STATUSES, type FleetStatus } from "../planning/fleet-status";

export const FLEET_SORT_KEYS = [
  "status",
  "tag",
  "site",
  "unit",
  "service",
  "percentOfClean",
  "fouling",
  "dutyLoss",
  "cost",
  "threshold",
  "alerts",
  "lastCleaning",
  "nextCleaning",
] as const;
export type FleetSortKey = (typeof FLEET_SORT_KEYS)[number];
export type SortDirection = "asc" | "desc";

export interface FleetQuery {
  site: string | null;
  unit: string | null;
  service: string | null;
  status: FleetStatus | null;
  /** Tag search: case-insensitive substring of the tag (or the name). */
  q: string | null;
  sort: FleetSortKey;
  dir: SortDirection;
}

/** What the table shows first: the most urgent exchangers at the top. */
export const DEFAULT_FLEET_QUERY: FleetQuery = { site: null, unit: null, service: null, status: null, q: null, sort: "status", dir: "asc" };

/** Longest filter value kept (a tag, a unit code, a service name); longer input is cut, not refused. */
const MAX_FILTER_LENGTH = 100;

type SearchParamsLike = URLSearchParams | Record<string, string | string[] | undefined>;

function first(params: SearchParamsLike, name: string): string | null {
  const raw = params instanceof URLSearchParams ? params.get(name) : params[name];
  const value = Array.isArray(raw) ? raw[0] : raw;
  if (typeof value !== "string") return null;
  // Control characters never belong in a filter; drop them rather than echo them back into the page.
  const cleaned = value.replace(/[\u0000-\u001f\u007f]/g, "").trim().slice(0, MAX_FILTER_LENGTH);
  return cleaned.length > 0 ? cleaned : null;
}

function isOneOf<T extends string>(values: readonly T[], value: string | null): value is T {
  return value !== null && (values as readonly string[]).includes(value);
}

/**
 * parseFleetQuery: the fleet filters and sort from URL search parameters. Unknown sort keys, directions and
 * statuses fall back to the defaults (ignored, never an error), so any shared or hand-edited link still opens a
 * table. Repeated parameters use their first value.
 */
export function parseFleetQuery(params: SearchParamsLike): FleetQuery {
  const sort = first(params, "sort");
  const dir = first(params, "dir");
  const status = first(params, "status");
  const sortKey = isOneOf(FLEET_SORT_KEYS, sort) ? sort : DEFAULT_FLEET_QUERY.sort;
  return {
    site: first(params, "site"),
    unit: first(params, "unit"),
    service: first(params, "service"),
    status: isOneOf(FLEET_STATUSES, status) ? status : null,
    q: first(params, "q"),
    sort: sortKey,
    dir: dir === "asc" || dir === "desc" ? dir : defaultDirection(sortKey),
  };
}

/** Money, loss, fouling and alert columns open worst-first (descending); names, dates and status ascending. */
export function defaultDirection(key: FleetSortKey): SortDirection {
  return key === "cost" || key === "dutyLoss" || key === "fouling" || key === "alerts" ? "desc" : "asc";
}

/** The query as URL search text (only non-default values), e.g. "?status=watch&sort=cost"; "" for the defaults. */
export function fleetQueryString(query: FleetQuery): string {
  const params = new URLSearchParams();
  if (query.site) params.set("site", query.site);
  if (query.unit) params.set("unit", query.unit);
  if (query.service) params.set("service", query.service);
  if (query.status) params.set("status", query.status);
  if (query.q) params.set("q", query.q);
  if (query.sort !== DEFAULT_FLEET_QUERY.sort) params.set("sort", query.sort);
  if (query.dir !== defaultDirection(query.sort)) params.set("dir", query.dir);
  const text = params.toString();
  return text ? `?${text}` : "";
}

/** The link target of a column header: sort by `key`, flipping the direction when it is already the sort. */
export function sortLink(query: FleetQuery, key: FleetSortKey): string {
  const dir = query.sort === key ? (query.dir === "asc" ? "desc" : "asc") : defaultDirection(key);
  return `/${fleetQueryString({ ...query, sort: key, dir })}`;
}

/** Severity order of the categories (most urgent first). */
const STATUS_RANK: Record<FleetStatus, number> = { "act-now": 0, "plan-cleaning": 1, watch: 2, good: 3, "no-estimate": 4 };

/** The value a row sorts by; null sorts last in either direction. */
function sortValue(row: FleetHealthRow, key: FleetSortKey): number | string | null {
  const summary = row.summary;
  switch (key) {
    case "status":
      return STATUS_RANK[row.status];
    case "tag":
      return row.tag;
    case "site":
      return row.siteCode;
    case "unit":
      return row.unitCode;
    case "service":
      return row.service;
    case "percentOfClean":
      return summary?.percentOfClean ?? null;
    case "fouling":
      return summary?.foulingM2KPerW ?? null;
    case "dutyLoss":
      return summary?.dutyLossW ?? null;
    case "cost":
      return summary?.economics?.costPerDay ?? null;
    case "threshold":
      return thresholdSortMs(row);
    case "alerts":
      return row.openAlerts;
    case "lastCleaning":
      return row.lastCleaning;
    case "nextCleaning":
      return row.nextCleaning?.start ?? null;
  }
}

/** The P50 threshold date, or the crossing date when already crossed, as epoch ms. */
function thresholdSortMs(row: FleetHealthRow): number | null {
  const threshold = row.summary?.threshold;
  if (!threshold) return null;
  const iso = threshold.crossedAt ?? threshold.p50;
  const ms = iso ? Date.parse(iso) : Number.NaN;
  return Number.isFinite(ms) ? ms : null;
}

function compareValues(a: number | string, b: number | string): number {
  if (typeof a === "number" && typeof b === "number") return a - b;
  return String(a).localeCompare(String(b), "en", { numeric: true, sensitivity: "base" });
}

/**
 * applyFleetQuery: the rows that pass every filter, sorted by the query (ties by tag). Filters compare exactly
 * (site code, unit code, service name, status); the search matches a case-insensitive substring of tag or name.
 * Returns a new array; the input is not changed.
 */
export function applyFleetQuery(rows: readonly FleetHealthRow[], query: FleetQuery): FleetHealthRow[] {
  const needle = query.q?.toLowerCase() ?? null;
  const kept = rows.filter(
    (row) =>
      (query.site === null || row.siteCode === query.site) &&
      (query.unit === null || row.unitCode === query.unit) &&
      (query.service === null || row.service === query.service) &&
      (query.status === null || row.status === query.status) &&
      (needle === null || row.tag.toLowerCase().includes(needle) || row.name.toLowerCase().includes(needle)),
  );
  const sign = query.dir === "asc" ? 1 : -1;
  return kept
    .map((row) => ({ row, value: sortValue(row, query.sort) }))
    .sort((a, b) => {
      if (a.value === null && b.value !== null) return 1;
      if (b.value === null && a.value !== null) return -1;
      const primary = a.value === null || b.value === null ? 0 : sign * compareValues(a.value, b.value);
      return primary !== 0 ? primary : compareValues(a.row.tag, b.row.tag);
    })
    .map(({ row }) => row);
}

export interface FleetTotals {
  count: number;
  byStatus: Record<FleetStatus, number>;
  /** Cost of fouling per day summed per currency (sites may differ), only rows that could be costed. */
  costPerDayByCurrency: { currency: string; costPerDay: number; assets: number }[];
  openAlerts: number;
  assetsWithAlerts: number;
}

/** fleetTotals: the summary strip over the given rows. */
export function fleetTotals(rows: readonly FleetHealthRow[]): FleetTotals {
  const byStatus = Object.fromEntries(FLEET_STATUSES.map((status) => [status, 0])) as Record<FleetStatus, number>;
  const costs = new Map<string, { costPerDay: number; assets: number }>();
  let openAlerts = 0;
  let assetsWithAlerts = 0;
  for (const row of rows) {
    byStatus[row.status] += 1;
    openAlerts += row.openAlerts;
    if (row.openAlerts > 0) assetsWithAlerts += 1;
    const economics = row.summary?.economics;
    if (economics) {
      const entry = costs.get(economics.currency) ?? { costPerDay: 0, assets: 0 };
      entry.costPerDay += economics.costPerDay;
      entry.assets += 1;
      costs.set(economics.currency, entry);
    }
  }
  return {
    count: rows.length,
    byStatus,
    costPerDayByCurrency: [...costs.entries()].map(([currency, entry]) => ({ currency, ...entry })).sort((a, b) => a.currency.localeCompare(b.currency)),
    openAlerts,
    assetsWithAlerts,
  };
}
