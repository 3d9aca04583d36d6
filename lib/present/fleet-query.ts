// The fleet table's filters and sort as they travel in the URL (?site=&unit=&service=&status=&q=&sort=&dir=), and
// the filtering and sorting of fleet rows they ask for; the page's paging (?page=&per=) apart from them, since the
// API answers every matching row. Pure: the page, the API and the tests share it.
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

/**
 * The link target of a column header: sort by `key`, flipping the direction when it is already the sort. Always the
 * first page (a page number of the old order means nothing in the new one); the page size `per` is kept.
 */
export function sortLink(query: FleetQuery, key: FleetSortKey, per: FleetPageSize = DEFAULT_FLEET_PAGE.per): string {
  const dir = query.sort === key ? (query.dir === "asc" ? "desc" : "asc") : defaultDirection(key);
  return fleetFilterLink({ ...query, sort: key, dir }, per);
}

/** Rows per page the fleet page offers; "all" shows every matching row on one page. */
export const FLEET_PAGE_SIZES = [50, 100, 200, "all"] as const;
export type FleetPageSize = (typeof FLEET_PAGE_SIZES)[number];

/** Which page of the fleet table to show: `page` counts from 1. Only the page uses it, never the API. */
export interface FleetPage {
  page: number;
  per: FleetPageSize;
}

/**
 * 100 rows a page, our choice: a view of all 500 rows of the benchmark fleet cost about 0.85 s of server CPU, mostly
 * rendering the rows with their links and SVG sparklines (README, latest figures), so a page renders a fifth of that.
 */
export const DEFAULT_FLEET_PAGE: FleetPage = { page: 1, per: 100 };

/**
 * parseFleetPage: the page number and page size from URL search parameters. `per` is one of 50, 100, 200 or "all"
 * (anything else: 100); `page` is a whole number from 1 (anything else: 1). A page beyond the last is kept here and
 * shown as the last page by sliceFleetPage, which knows the row count. Never an error.
 */
export function parseFleetPage(params: SearchParamsLike): FleetPage {
  const perText = first(params, "per")?.toLowerCase() ?? null;
  const per = FLEET_PAGE_SIZES.find((size) => String(size) === perText) ?? DEFAULT_FLEET_PAGE.per;
  const pageText = first(params, "page");
  // Digits only: "2.5", "-1", "1e3" and "0x10" are not page numbers. A number too large to hold exactly is simply
  // beyond the last page.
  const page = pageText !== null && /^[0-9]+$/.test(pageText) ? Math.min(Number(pageText), Number.MAX_SAFE_INTEGER) : DEFAULT_FLEET_PAGE.page;
  return { page: Math.max(page, 1), per };
}

/** One page of rows and where it lies: `firstRow` and `lastRow` count from 1 and are 0 when there are no rows. */
export interface FleetPageSlice<T> {
  rows: T[];
  /** The page shown: the one asked for, or the last page when that is beyond it. */
  page: number;
  /** At least 1, also for no rows. */
  pageCount: number;
  per: FleetPageSize;
  firstRow: number;
  lastRow: number;
  total: number;
}

/** sliceFleetPage: the rows of one page (a page beyond the last gives the last). Returns a new array. */
export function sliceFleetPage<T>(rows: readonly T[], paging: FleetPage): FleetPageSlice<T> {
  const total = rows.length;
  const size = paging.per === "all" ? Math.max(total, 1) : paging.per;
  const pageCount = Math.max(1, Math.ceil(total / size));
  const page = Math.min(Math.max(paging.page, 1), pageCount);
  const start = (page - 1) * size;
  const end = Math.min(start + size, total);
  return { rows: rows.slice(start, end), page, pageCount, per: paging.per, firstRow: total === 0 ? 0 : start + 1, lastRow: end, total };
}

/**
 * fleetPageHref: the fleet page's address for a query and a page, e.g. "/?status=watch&per=50&page=3". Only
 * non-default values: the filters and sort as fleetQueryString, then `per` unless 100 and `page` unless 1; "/" for
 * all defaults.
 */
export function fleetPageHref(query: FleetQuery, paging: FleetPage): string {
  const params = new URLSearchParams(fleetQueryString(query));
  if (paging.per !== DEFAULT_FLEET_PAGE.per) params.set("per", String(paging.per));
  if (paging.page > 1 && paging.per !== "all") params.set("page", String(paging.page));
  const text = params.toString();
  return text ? `/?${text}` : "/";
}

/**
 * fleetFilterLink: the address after a change of filters, search or sort: the first page of the new rows, the page
 * size `per` kept. It takes no page number, so none can be carried over.
 */
export function fleetFilterLink(query: FleetQuery, per: FleetPageSize): string {
  return fleetPageHref(query, { page: 1, per });
}

/** The address with another page size, on the page that holds the first row shown now (row `firstRow`, from 1). */
export function pageSizeLink(query: FleetQuery, firstRow: number, per: FleetPageSize): string {
  const page = per === "all" || firstRow <= 1 ? 1 : Math.floor((firstRow - 1) / per) + 1;
  return fleetPageHref(query, { page, per });
}

/** Pages up to this count are all listed; beyond it pagerItems leaves gaps (always 7 items then). */
const PAGER_ALL_PAGES_UP_TO = 7;

/**
 * pagerItems: the page numbers a pager lists, with "gap" where pages are left out. Up to 7 pages: all of them.
 * More: the first and last page, the current page and its neighbours, and near either end the first or last five,
 * so the list is always 7 items long, e.g. page 5 of 10: 1 … 4 5 6 … 10. A gap never stands for a single page.
 */
export function pagerItems(page: number, pageCount: number): (number | "gap")[] {
  if (pageCount <= PAGER_ALL_PAGES_UP_TO) return Array.from({ length: Math.max(pageCount, 1) }, (_, index) => index + 1);
  const current = Math.min(Math.max(page, 1), pageCount);
  const shown = new Set([1, pageCount, current - 1, current, current + 1]);
  if (current <= 4) for (let number = 2; number <= 5; number += 1) shown.add(number);
  if (current >= pageCount - 3) for (let number = pageCount - 4; number < pageCount; number += 1) shown.add(number);
  const numbers = [...shown].filter((number) => number >= 1 && number <= pageCount).sort((a, b) => a - b);
  // The first and last five close the gap a neighbour would leave between them and page 1 or the last page, so
  // every gap left stands for at least two pages.
  const items: (number | "gap")[] = [];
  for (const number of numbers) {
    const previous = items.at(-1);
    if (typeof previous === "number" && number - previous > 1) items.push("gap");
    items.push(number);
  }
  return items;
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
