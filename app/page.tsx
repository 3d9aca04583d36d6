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
import { applyFleetQuery, DEFAULT_FLEET_QUERY, fleetQueryString, fleetTotals, parseFleetQuery, sortLink, type FleetQuery, type FleetSortKey } from "@/lib/present/fleet-query";
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

function SortHeader({ column, query, unit }: { column: (typeof COLUMNS)[number]; query: FleetQuery; unit?: string }) {
  const active = query.sort === column.key;
  const arrow = active ? (query.dir === "asc" ? "▲" : "▼") : "";
  return (
    <th scope="col" className={column.numeric ? "num" : undefined} aria-sort={active ? (query.dir === "asc" ? "ascending" : "descending") : "none"}>
      <Link href={sortLink(query, column.key)} className="sort-link">
        {column.label}
        {unit ? <span className="unit"> ({unit})</span> : null}
        {arrow ? <span aria-hidden="true"> {arrow}</span> : null}
      </Link>
    </th>
  );
}

export default async function FleetHealthPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requireSignedInUser();
  const query = parseFleetQuery(await searchParams);
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
  const totals = fleetTotals(rows);
  const sites = [...new Map(all.map((row) => [row.siteCode, row.siteName])).entries()];
  const units = [...new Map(all.filter((row) => !query.site || row.siteCode === query.site).map((row) => [row.unitCode, row.unitName])).entries()].sort();
  const services = [...new Set(all.map((row) => row.service))].sort();
  const filtered = query.site || query.unit || query.service || query.status || query.q;
  const latestAsOf = all.map((row) => row.summary?.asOf ?? "").sort().at(-1) || null;
  return (
    <>
      <h1>Fleet health</h1>
      {can(user.role, "assets.edit") ? <p className="actions"><Link href="/assets/new">Register an exchanger</Link></p> : null}

      <section aria-label="Summary of the exchangers shown" className="summary-strip">
        {FLEET_STATUSES.map((status) => (
          <Link key={status} href={`/${fleetQueryString({ ...query, status: query.status === status ? null : status })}`} className={`summary-tile${query.status === status ? " selected" : ""}`} aria-current={query.status === status ? "true" : undefined}>
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
        <button type="submit" className="primary">Apply</button>
        {filtered ? <Link href={`/${fleetQueryString({ ...DEFAULT_FLEET_QUERY, sort: query.sort, dir: query.dir })}`}>Clear filters</Link> : null}
      </form>

      <p className="subtle" role="status">
        {rows.length} of {all.length} exchangers. Latest assessment {formatDate(latestAsOf, all[0]?.siteTimeZone ?? "UTC")}. Dates in each site&apos;s time zone; units {system === "us" ? "US customary" : "SI"} (<Link href="/account">change</Link>).
      </p>

      {rows.length === 0 ? (
        <p className="empty">No exchangers match these filters. <Link href="/">Show the whole fleet</Link>.</p>
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
                    {...(column.key === "fouling" ? { unit: displayUnit(system, "foulingResistance").label } : column.key === "dutyLoss" ? { unit: displayUnit(system, "duty").label } : {})}
                  />
                ))}
                <th scope="col">Rf, last year</th>
              </tr>
            </thead>
            <tbody>
              {rows.map((row) => {
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
