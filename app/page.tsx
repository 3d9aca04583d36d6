import Link from "next/link";
import { AdvisoryCaution } from "./_components/advisory-caution";
import { FleetStatusMark, FleetStatusShape } from "./_components/fleet-status-mark";
import { RfSparkline } from "./_components/rf-sparkline";
import { requireSignedInUser } from "@/lib/auth/current-user";
import { can } from "@/lib/auth/permissions";
import { fleetHealth, type FleetHealthRow } from "@/lib/data/fleet-health";
import { getPrisma } from "@/lib/db";
import { FLEET_STATUSES, FLEET_STATUS_LABELS, FLEET_STATUS_MEANINGS } from "@/lib/planning/fleet-status";
import { displayUnit, formatDisplayNumber, formatQuantity, type UnitSystem } from "@/lib/present/display-units";
import {
  applyFleetQuery,
  DEFAULT_FLEET_PAGE,
  DEFAULT_FLEET_QUERY,
  FLEET_PAGE_SIZES,
  fleetFilterLink,
  fleetPageHref,
  fleetTotals,
  pagerItems,
  pageSizeLink,
  parseFleetPage,
  parseFleetQuery,
  sliceFleetPage,
  sortLink,
  type FleetPageSize,
  type FleetPageSlice,
  type FleetQuery,
  type FleetSortKey,
} from "@/lib/present/fleet-query";
import { formatDate, formatMoney, formatSignificant } from "@/lib/present/format";

export const dynamic = "force-dynamic";

function ThresholdCell({ row }: { row: FleetHealthRow }) {
  const threshold = row.summary?.threshold;
  if (!threshold) return <span className="subtle">—</span>;
  const zone = row.siteTimeZone;
  switch (threshold.status) {
    case "already-crossed":
      return <span>crossed {formatDate(threshold.crossedAt, zone)}</span>;
    case "broken-when-clean":
      return <span>below threshold even clean</span>;
    case "never-broken":
      return <span className="subtle">not reached at reference conditions</span>;
    case "no-trend":
      return <span className="subtle">no trend</span>;
    default:
      return (
        <span className="dates">
          <strong>{threshold.p50 ? formatDate(threshold.p50, zone) : "beyond horizon"}</strong>
          {threshold.p10 || threshold.p90 ? (
            <span className="subtle range">
              {threshold.p10 ? formatDate(threshold.p10, zone) : "later"} – {threshold.p90 ? formatDate(threshold.p90, zone) : "later"}
            </span>
          ) : null}
        </span>
      );
  }
}

function sparklineDescription(row: FleetHealthRow, system: UnitSystem): string {
  const line = row.summary?.sparkline ?? [];
  const firstPoint = line[0];
  const lastPoint = line[line.length - 1];
  if (!firstPoint || !lastPoint) return "no fouling data";
  return `Rf over the last year: ${formatQuantity(system, "foulingResistance", firstPoint[1], 2)} to ${formatQuantity(system, "foulingResistance", lastPoint[1], 2)}`;
}

const COLUMNS: { key: FleetSortKey; label: string; numeric?: boolean }[] = [
  { key: "tag", label: "Exchanger" },
  { key: "status", label: "Condition" },
  { key: "percentOfClean", label: "U, % of clean", numeric: true },
  { key: "fouling", label: "Fouling Rf", numeric: true },
  { key: "dutyLoss", label: "Duty loss", numeric: true },
  { key: "cost", label: "Fouling cost / day", numeric: true },
  { key: "threshold", label: "Duty threshold P50 (P10 – P90)" },
  { key: "alerts", label: "Open alerts", numeric: true },
  { key: "lastCleaning", label: "Last cleaning" },
  { key: "nextCleaning", label: "Next cleaning" },
];

function SortHeader({ column, query, per, unit }: { column: (typeof COLUMNS)[number]; query: FleetQuery; per: FleetPageSize; unit?: string }) {
  const active = query.sort === column.key;
  const arrow = active ? (query.dir === "asc" ? "▲" : "▼") : "";
  return (
    <th scope="col" className={column.numeric ? "num" : undefined} aria-sort={active ? (query.dir === "asc" ? "ascending" : "descending") : "none"}>
      <Link href={sortLink(query, column.key, per)} className="sort-link">
        {column.label}
        {unit ? <span className="unit"> ({unit})</span> : null}
        {arrow ? <span aria-hidden="true"> {arrow}</span> : null}
      </Link>
    </th>
  );
}

/** The smallest page size: with no more rows than this every choice shows the same, so none is offered. */
const SMALLEST_PAGE_SIZE = Math.min(...FLEET_PAGE_SIZES.filter((size): size is Exclude<FleetPageSize, "all"> => size !== "all"));

/** Below the table: previous/next and page numbers when there are pages, the page size when more than 50 rows match; else nothing. */
function FleetPager({ query, slice }: { query: FleetQuery; slice: FleetPageSlice<FleetHealthRow> }) {
  const { page, pageCount, per } = slice;
  const offerSizes = slice.total > SMALLEST_PAGE_SIZE;
  if (pageCount === 1 && !offerSizes) return null;
  const href = (target: number) => fleetPageHref(query, { page: target, per });
  return (
    <nav className="pager fleet-pager" aria-label="Pages of the fleet table">
      {pageCount > 1 ? (
        <ul className="pager-pages">
          <li>{page > 1 ? <Link href={href(page - 1)} rel="prev">← Previous</Link> : <span className="pager-off" aria-disabled="true">← Previous</span>}</li>
          {pagerItems(page, pageCount).map((item, index) =>
            item === "gap" ? (
              <li key={`gap-${index}`} className="pager-gap" aria-hidden="true">…</li>
            ) : (
              <li key={item}>
                <Link href={href(item)} aria-label={`Page ${item}`} aria-current={item === page ? "page" : undefined}>{item}</Link>
              </li>
            ),
          )}
          <li>{page < pageCount ? <Link href={href(page + 1)} rel="next">Next →</Link> : <span className="pager-off" aria-disabled="true">Next →</span>}</li>
        </ul>
      ) : null}
      {offerSizes ? (
        <p className="pager-sizes">
          <span id="fleet-page-size">Rows per page</span>
          <span role="group" aria-labelledby="fleet-page-size">
            {FLEET_PAGE_SIZES.map((size) => (
              <Link key={size} href={pageSizeLink(query, slice.firstRow, size)} aria-current={size === per ? "true" : undefined}>{size}</Link>
            ))}
          </span>
        </p>
      ) : null}
    </nav>
  );
}

export default async function FleetHealthPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requireSignedInUser();
  const search = await searchParams;
  const query = parseFleetQuery(search);
  const paging = parseFleetPage(search);
  const all = await fleetHealth(getPrisma());
  const system = user.unitSystem;
  if (all.length === 0) {
    return (
      <>
        <h1>Fleet health</h1>
        <p className="empty">
          No exchangers registered yet.{" "}
          {can(user.role, "assets.edit") ? <Link href="/assets/new">Register an exchanger</Link> : null} or load the demo fleet with <code>npm run cli -- seed-demo</code>.
        </p>
      </>
    );
  }
  const rows = applyFleetQuery(all, query);
  // The summary strip and the counts cover every matching row; only the table is paged.
  const totals = fleetTotals(rows);
  const slice = sliceFleetPage(rows, paging);
  const sites = [...new Map(all.map((row) => [row.siteCode, row.siteName])).entries()];
  const units = [...new Map(all.filter((row) => !query.site || row.siteCode === query.site).map((row) => [row.unitCode, row.unitName])).entries()].sort();
  const services = [...new Set(all.map((row) => row.service))].sort();
  const filtered = query.site || query.unit || query.service || query.status || query.q;
  const latestAsOf = all.map((row) => row.summary?.asOf ?? "").sort().at(-1) || null;
  return (
    <>
      <h1>Fleet health</h1>
      {can(user.role, "assets.edit") ? <p className="actions"><Link href="/assets/new">Register an exchanger</Link></p> : null}

      <section aria-label="Summary of the exchangers that match the filters" className="summary-strip">
        {FLEET_STATUSES.map((status) => (
          <Link key={status} href={fleetFilterLink({ ...query, status: query.status === status ? null : status }, paging.per)} className={`summary-tile${query.status === status ? " selected" : ""}`} aria-current={query.status === status ? "true" : undefined}>
            <span className="summary-value">{totals.byStatus[status]}</span>
            <span className="summary-label"><FleetStatusShape status={status} /> {FLEET_STATUS_LABELS[status]}</span>
          </Link>
        ))}
        <div className="summary-tile">
          <span className="summary-value">{totals.costPerDayByCurrency.length ? totals.costPerDayByCurrency.map((entry) => formatMoney(entry.costPerDay, entry.currency)).join(" + ") : "—"}</span>
          <span className="summary-label">fouling cost per day</span>
        </div>
        <div className="summary-tile">
          <span className="summary-value">{totals.openAlerts}</span>
          <span className="summary-label">open instrument alerts on {totals.assetsWithAlerts} exchanger{totals.assetsWithAlerts === 1 ? "" : "s"}</span>
        </div>
      </section>

      <form method="get" action="/" className="filters" aria-label="Filter the fleet">
        <label>
          Site
          <select name="site" defaultValue={query.site ?? ""}>
            <option value="">All sites</option>
            {sites.map(([code, name]) => <option key={code} value={code}>{code} — {name}</option>)}
          </select>
        </label>
        <label>
          Process unit
          <select name="unit" defaultValue={query.unit ?? ""}>
            <option value="">All units</option>
            {units.map(([code, name]) => <option key={code} value={code}>{code} — {name}</option>)}
          </select>
        </label>
        <label>
          Service
          <select name="service" defaultValue={query.service ?? ""}>
            <option value="">All services</option>
            {services.map((service) => <option key={service} value={service}>{service}</option>)}
          </select>
        </label>
        <label>
          Condition
          <select name="status" defaultValue={query.status ?? ""}>
            <option value="">All conditions</option>
            {FLEET_STATUSES.map((status) => <option key={status} value={status}>{FLEET_STATUS_LABELS[status]}</option>)}
          </select>
        </label>
        <label>
          Tag or name contains
          <input type="search" name="q" defaultValue={query.q ?? ""} placeholder="e.g. E-41" />
        </label>
        {query.sort !== DEFAULT_FLEET_QUERY.sort ? <input type="hidden" name="sort" value={query.sort} /> : null}
        <input type="hidden" name="dir" value={query.dir} />
        {paging.per !== DEFAULT_FLEET_PAGE.per ? <input type="hidden" name="per" value={paging.per} /> : null}
        <button type="submit" className="primary">Apply</button>
        {filtered ? <Link href={fleetFilterLink({ ...DEFAULT_FLEET_QUERY, sort: query.sort, dir: query.dir }, paging.per)}>Clear filters</Link> : null}
      </form>

      <p className="subtle" role="status">
        {rows.length} of {all.length} exchangers{slice.rows.length < rows.length ? `; showing rows ${slice.firstRow}–${slice.lastRow} (page ${slice.page} of ${slice.pageCount})` : ""}. Latest assessment {formatDate(latestAsOf, all[0]?.siteTimeZone ?? "UTC")}. Dates in each site&apos;s time zone; units {system === "us" ? "US customary" : "SI"} (<Link href="/account">change</Link>).
      </p>

      {rows.length === 0 ? (
        <p className="empty">No exchangers match these filters. <Link href={fleetFilterLink(DEFAULT_FLEET_QUERY, paging.per)}>Show the whole fleet</Link>.</p>
      ) : (
        <div className="table-scroll">
          <table className="grid fleet-table" aria-label="Fleet health">
            <thead>
              <tr>
                {COLUMNS.map((column) => (
                  <SortHeader
                    key={column.key}
                    column={column}
                    query={query}
                    per={paging.per}
                    {...(column.key === "fouling" ? { unit: displayUnit(system, "foulingResistance").label } : column.key === "dutyLoss" ? { unit: displayUnit(system, "duty").label } : {})}
                  />
                ))}
                <th scope="col">Rf, last year</th>
              </tr>
            </thead>
            <tbody>
              {slice.rows.map((row) => {
                const summary = row.summary;
                const href = `/assets/${encodeURIComponent(row.tag)}`;
                return (
                  <tr key={row.tag}>
                    <td>
                      <Link href={href} className="tag">{row.tag}</Link>
                      <span className="subtle small">{row.name} · {row.unitCode}</span>
                    </td>
                    <td><FleetStatusMark status={row.status} /></td>
                    <td className="num">{summary?.percentOfClean == null ? "—" : `${formatSignificant(summary.percentOfClean, 3)} %`}</td>
                    <td className="num">{formatDisplayNumber(system, "foulingResistance", summary?.foulingM2KPerW ?? null, 3)}</td>
                    <td className="num">{formatDisplayNumber(system, "duty", summary?.dutyLossW ?? null, 3)}</td>
                    <td className="num">{summary?.economics ? formatMoney(summary.economics.costPerDay, summary.economics.currency) : <span className="subtle" title={summary?.economicsNote ?? undefined}>—</span>}</td>
                    <td><ThresholdCell row={row} /></td>
                    <td className="num">{row.openAlerts ? <Link href={`${href}#alerts`} className="alert-count" aria-label={`${row.openAlerts} open alerts on ${row.tag}`}>{row.openAlerts}</Link> : "—"}</td>
                    <td className="date">{formatDate(row.lastCleaning, row.siteTimeZone)}</td>
                    <td className="date">{row.nextCleaning ? <>{row.nextCleaning.start} <span className={row.nextCleaning.booked ? "pill booked" : "pill proposed"}>{row.nextCleaning.booked ? "booked" : "proposed"}</span></> : "—"}</td>
                    <td className="spark-cell"><RfSparkline points={summary?.sparkline ?? []} description={sparklineDescription(row, system)} /></td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      )}
      {rows.length > 0 ? <FleetPager query={query} slice={slice} /> : null}

      <section aria-labelledby="legend-heading" className="panel status-legend">
        <h2 id="legend-heading">What the conditions mean</h2>
        <dl>
          {FLEET_STATUSES.map((status) => (
            <div key={status}>
              <dt><FleetStatusMark status={status} /></dt>
              <dd>{FLEET_STATUS_MEANINGS[status]}.</dd>
            </div>
          ))}
        </dl>
        <p className="subtle">
          The threshold is the duty at reference conditions below which the exchanger is due for cleaning. P50 is the central forecast date;
          P10 the early date (a 10 % chance the duty is below the threshold by then), P90 the late one. Next cleaning comes from the latest
          cleaning plan: <em>booked</em> when a planner accepted it, <em>proposed</em> otherwise.
        </p>
      </section>
      <AdvisoryCaution />
    </>
  );
}
