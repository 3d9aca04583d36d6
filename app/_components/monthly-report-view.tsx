// The monthly condition summary as markup: the report page shows it and tests print it; no Next imports, no client code.
import type { ReactNode } from "react";
import { AdvisoryCaution } from "./advisory-caution";
import { FleetStatusMark } from "./fleet-status-mark";
import { CategoryChart, CostChart } from "./report-charts";
import { FLEET_STATUS_LABELS } from "@/lib/planning/fleet-status";
import { formatQuantity, type UnitSystem } from "@/lib/present/display-units";
import { formatDutyMW, formatMoney, formatSignificant } from "@/lib/present/format";
import type { MonthlyReport } from "@/lib/report/monthly-report";

/** "+1,234 EUR" / "−56 EUR" / "no change"; `worse` says whether a rise is bad (cost, loss, urgent categories). */
function Change({ value, format, risingIsWorse = true }: { value: number; format: (value: number) => string; risingIsWorse?: boolean }) {
  if (Math.abs(value) < 1e-9) return <span className="change">no change</span>;
  const worse = value > 0 === risingIsWorse;
  return <span className={`change ${worse ? "change-worse" : "change-better"}`}>{value > 0 ? "+" : "−"}{format(Math.abs(value))}</span>;
}

/** A power change: MW from 0.1 MW up, kW below (a change of −0.004 MW reads better as −3.97 kW). */
function formatPowerChange(watts: number): string {
  return Math.abs(watts) >= 1e5 ? formatDutyMW(watts) : `${formatSignificant(watts / 1e3, 3)} kW`;
}

/** Duty figures in the reader's units: site and unit totals in MW (SI) or MMBtu/h (US customary). */
interface DutyFormat {
  total: (watts: number) => string;
  change: (watts: number) => string;
}

function dutyFormat(system: UnitSystem): DutyFormat {
  if (system === "us") {
    const us = (watts: number) => formatQuantity("us", "duty", watts, 3);
    return { total: us, change: us };
  }
  return { total: formatDutyMW, change: formatPowerChange };
}

function percent(value: number | null): string {
  return value === null ? "—" : `${formatSignificant(value, 3)} %`;
}

function Header({ report, siteCode }: { report: MonthlyReport; siteCode: string }) {
  const query = (paper: string) => `/api/reports/monthly.pdf?site=${encodeURIComponent(siteCode)}&month=${report.month.key}&paper=${paper}`;
  return (
    <div className="report-head">
      <div>
        <h1>Monthly condition summary — {report.site.name}</h1>
        <p className="period">
          <strong>{report.month.label}</strong> ({report.month.firstDay} to {report.month.lastDay}, {report.site.timeZone})
        </p>
        <p className="report-meta">
          Site {report.site.code} · {report.assetCount} exchangers · money in {report.site.currency} ·{" "}
          {report.data.complete ? `operating data to ${report.data.lastDay}` : `data end on ${report.data.lastDay ?? "—"}: the month is not complete`} · made{" "}
          {report.generatedAt.slice(0, 16).replace("T", " ")} UTC
        </p>
      </div>
      <div className="report-actions screen-only" aria-label="Report actions">
        <a href={query("a4")}>PDF (A4)</a>
        <a href={query("letter")}>PDF (Letter)</a>
        <span className="subtle">or print this page (Ctrl+P)</span>
        <a href="/reports">All months</a>
      </div>
    </div>
  );
}

function Condition({ report, duty }: { report: MonthlyReport; duty: DutyFormat }) {
  const { totals, month, previousMonth: before, site } = report;
  const actNow = report.categories.find((category) => category.status === "act-now");
  const money = (value: number) => formatMoney(value, site.currency);
  return (
    <section aria-labelledby="condition">
      <h2 id="condition">Fleet condition at the end of {month.label}</h2>
      <div className="tiles">
        <div className="tile">
          <div className="label">Cost of fouling per day</div>
          <div className="value">{money(totals.costPerDay)}</div>
          <Change value={totals.costPerDay - totals.previousCostPerDay} format={money} /> <span className="subtle change">vs {before.label}</span>
        </div>
        <div className="tile">
          <div className="label">Duty lost at reference conditions</div>
          <div className="value">{duty.total(totals.dutyLossW)}</div>
          <Change value={totals.dutyLossW - totals.previousDutyLossW} format={duty.change} /> <span className="subtle change">vs {before.label}</span>
        </div>
        <div className="tile">
          <div className="label">{FLEET_STATUS_LABELS["act-now"]}</div>
          <div className="value">{actNow?.count ?? 0}</div>
          <Change value={(actNow?.count ?? 0) - (actNow?.previousCount ?? 0)} format={(value) => String(value)} /> <span className="subtle change">vs {before.label}</span>
        </div>
        <div className="tile">
          <div className="label">Instrument alerts open at month end</div>
          <div className="value">{report.alerts.openAtMonthEnd}</div>
          <span className="subtle change">{report.alerts.opened} opened in the month</span>
        </div>
      </div>
      <div>
        <table className="grid keep">
          <caption className="visually-hidden">Exchangers per condition category</caption>
          <thead>
            <tr><th scope="col">Category</th><th scope="col" className="num">End of {before.label}</th><th scope="col" className="num">End of {month.label}</th><th scope="col" className="num">Change</th></tr>
          </thead>
          <tbody>
            {report.categories.map((category) => (
              <tr key={category.status}>
                <td><FleetStatusMark status={category.status} /><span className="meaning">{category.meaning}</span></td>
                <td className="num">{category.previousCount}</td>
                <td className="num">{category.count}</td>
                <td className="num">{category.count - category.previousCount === 0 ? "—" : `${category.count > category.previousCount ? "+" : "−"}${Math.abs(category.count - category.previousCount)}`}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <div>
          <CategoryChart categories={report.categories} month={month.label} previousMonth={before.label} />
          {report.categoryChanges.length ? (
            <>
              <p style={{ margin: "0.4rem 0 0", fontSize: "0.88rem" }}>Changed category in {month.label}:</p>
              <ul className="changes">
                {report.categoryChanges.map((change) => (
                  <li key={change.tag}>
                    <a href={`/assets/${encodeURIComponent(change.tag)}`}>{change.tag}</a> {change.name}: {FLEET_STATUS_LABELS[change.from]} → <strong>{FLEET_STATUS_LABELS[change.to]}</strong>
                  </li>
                ))}
              </ul>
            </>
          ) : (
            <p className="subtle">No exchanger changed category in {month.label}.</p>
          )}
        </div>
      </div>
      <p className="basis">
        <strong>What the change since last month rests on.</strong> {report.basis} Cost of fouling per day is summed over {totals.costedAssets} costed
        exchangers at the end of {month.label} ({totals.previousCostedAssets} at the end of {before.label}); duty loss is at each exchanger&apos;s reference
        inlet temperatures and flows.
      </p>
    </section>
  );
}

function Units({ report, duty }: { report: MonthlyReport; duty: DutyFormat }) {
  const { site, month, previousMonth: before } = report;
  return (
    <section aria-labelledby="units" className="keep">
      <h2 id="units">Cost of fouling by process unit</h2>
      <div>
        <table className="grid">
          <thead><tr><th scope="col">Unit</th><th scope="col" className="num">Exchangers</th><th scope="col" className="num">Per day, end of {before.label}</th><th scope="col" className="num">Per day, end of {month.label}</th><th scope="col" className="num">Duty lost</th></tr></thead>
          <tbody>
            {report.units.map((unit) => (
              <tr key={unit.code}><td>{unit.code} {unit.name}</td><td className="num">{unit.assets}</td><td className="num">{formatMoney(unit.previousCostPerDay, site.currency)}</td><td className="num">{formatMoney(unit.costPerDay, site.currency)}</td><td className="num">{duty.total(unit.dutyLossW)}</td></tr>
            ))}
            <tr className="total"><td>Site</td><td className="num">{report.assetCount}</td><td className="num">{formatMoney(report.totals.previousCostPerDay, site.currency)}</td><td className="num">{formatMoney(report.totals.costPerDay, site.currency)}</td><td className="num">{duty.total(report.totals.dutyLossW)}</td></tr>
          </tbody>
        </table>
        <CostChart
          title={`Cost of fouling per day by unit, end of ${month.label} and end of ${before.label}`}
          rows={report.units.map((unit) => ({ key: unit.code, label: unit.code, current: unit.costPerDay, previous: unit.previousCostPerDay }))}
          currency={site.currency}
          month={month.label}
          previousMonth={before.label}
        />
      </div>
    </section>
  );
}

function TopAssets({ report, duty }: { report: MonthlyReport; duty: DutyFormat }) {
  const { site, month, previousMonth: before } = report;
  if (report.topAssets.length === 0) return <section aria-labelledby="top"><h2 id="top">Exchangers costing most</h2><p className="subtle">No exchanger had a cost of fouling at the end of {month.label}.</p></section>;
  return (
    <section aria-labelledby="top">
      <h2 id="top">The {report.topAssets.length} exchangers costing most at the end of {month.label}</h2>
      <table className="grid">
        <thead>
          <tr><th scope="col" className="num">#</th><th scope="col">Exchanger</th><th scope="col">Condition</th><th scope="col" className="num">Cost per day</th><th scope="col" className="num">End of {before.label}</th><th scope="col" className="num">Duty lost</th><th scope="col" className="num">U % of clean</th></tr>
        </thead>
        <tbody>
          {report.topAssets.map((asset) => (
            <tr key={asset.tag}>
              <td className="num">{asset.rank}</td>
              <td><a href={`/assets/${encodeURIComponent(asset.tag)}`}>{asset.tag}</a> <span className="subtle">{asset.name} ({asset.unitCode})</span></td>
              <td><FleetStatusMark status={asset.status} /></td>
              <td className="num">{formatMoney(asset.costPerDay, site.currency)}</td>
              <td className="num">{formatMoney(asset.previousCostPerDay, site.currency)}</td>
              <td className="num">{asset.dutyLossW === null ? "—" : duty.total(asset.dutyLossW)}</td>
              <td className="num">{percent(asset.percentOfClean)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <CostChart
        title={`Cost of fouling per day of the ${report.topAssets.length} costliest exchangers, end of ${month.label} and end of ${before.label}`}
        rows={report.topAssets.map((asset) => ({ key: asset.tag, label: asset.tag, current: asset.costPerDay, previous: asset.previousCostPerDay }))}
        currency={site.currency}
        month={month.label}
        previousMonth={before.label}
      />
      <p className="basis">U % of clean: the observed U over the last seven days of usable data before the month end, against the clean-model U at the same flows.</p>
    </section>
  );
}

function Cleanings({ report }: { report: MonthlyReport }) {
  const { site, month, planned } = report;
  const money = (value: number | null) => formatMoney(value, site.currency);
  return (
    <section aria-labelledby="cleanings">
      <h2 id="cleanings">Cleanings</h2>
      <h3>Done in {month.label} (taken out of service in the month)</h3>
      {report.cleaningsDone.length ? (
        <table className="grid">
          <thead><tr><th scope="col">Exchanger</th><th scope="col">Out of service</th><th scope="col">Back in service</th><th scope="col">Method</th><th scope="col" className="num">Fouling removed</th><th scope="col" className="num">Cost</th></tr></thead>
          <tbody>
            {report.cleaningsDone.map((cleaning) => (
              <tr key={`${cleaning.tag}-${cleaning.outOfService}`}>
                <td>{cleaning.tag} <span className="subtle">{cleaning.name}</span></td><td className="date">{cleaning.outOfService}</td><td className="date">{cleaning.returnToService ?? "—"}</td><td>{cleaning.method}</td>
                <td className="num">{cleaning.effectiveness === null ? "—" : `${Math.round(cleaning.effectiveness * 100)} %`}</td><td className="num">{money(cleaning.cost)}</td>
              </tr>
            ))}
            <tr className="total"><td colSpan={5}>{report.cleaningsDone.length} cleaning(s){report.cleaningsDoneCost.unknownCost ? `, ${report.cleaningsDoneCost.unknownCost} without a recorded cost` : ""}</td><td className="num">{money(report.cleaningsDoneCost.total)}</td></tr>
          </tbody>
        </table>
      ) : (
        <p className="subtle">No cleaning started in {month.label}.</p>
      )}
      <h3 style={{ marginTop: "1rem" }}>Planned from {planned.from} to {planned.to}</h3>
      {!planned.plan ? (
        <p className="subtle">No cleaning plan has been run for this site yet.</p>
      ) : planned.cleanings.length ? (
        <>
          <table className="grid">
            <thead><tr><th scope="col">Exchanger</th><th scope="col">Week from</th><th scope="col">State</th><th scope="col">Window</th><th scope="col" className="num">Outage days</th><th scope="col" className="num">Cost incl. outage</th><th scope="col" className="num">Saving vs no cleaning</th></tr></thead>
            <tbody>
              {planned.cleanings.map((cleaning) => (
                <tr key={`${cleaning.tag}-${cleaning.start}`}>
                  <td>{cleaning.tag} <span className="subtle">{cleaning.name}</span></td><td className="date">{cleaning.start}</td><td>{cleaning.state}</td><td>{cleaning.window}</td>
                  <td className="num">{formatSignificant(cleaning.outageDays, 2)}</td><td className="num">{money(cleaning.cost)}</td><td className="num">{money(cleaning.saving)}</td>
                </tr>
              ))}
              <tr className="total"><td colSpan={5}>{planned.cleanings.length} cleaning(s)</td><td className="num">{money(planned.totalCost)}</td><td /></tr>
            </tbody>
          </table>
          <p className="basis">
            From plan {planned.plan.id} (made {planned.plan.createdAt.slice(0, 10)}, weeks from {planned.plan.horizonStart}). Booked: fixed by a planner; proposed: the
            optimiser&apos;s choice, not yet accepted. Cost: the cleaning itself plus energy and production lost during the outage outside turnarounds.
          </p>
        </>
      ) : (
        <p className="subtle">The latest plan (plan {planned.plan.id}, weeks from {planned.plan.horizonStart}) has no cleaning starting in this period.</p>
      )}
    </section>
  );
}

function Alerts({ report }: { report: MonthlyReport }) {
  const { alerts, month } = report;
  return (
    <section aria-labelledby="alerts">
      <h2 id="alerts">Instrument issues</h2>
      <p>
        {alerts.opened} alert(s) opened in {month.label} (the fault started in the month), {alerts.openAtMonthEnd} open at the month end (not acknowledged by then),{" "}
        {alerts.acknowledged} acknowledged in the month. Figures of exchangers with an open alert may be affected by the faulty instrument.
      </p>
      {alerts.rows.length ? (
        <table className="grid">
          <thead><tr><th scope="col">Exchanger</th><th scope="col">Instrument</th><th scope="col">Fault</th><th scope="col">Started</th><th scope="col">Fault ended</th><th scope="col">Acknowledged</th><th scope="col">At month end</th></tr></thead>
          <tbody>
            {alerts.rows.map((alert) => (
              <tr key={`${alert.tag}-${alert.instrumentTag}-${alert.kind}-${alert.start}`}>
                <td>{alert.tag}</td><td>{alert.instrumentTag} <span className="subtle">({alert.role})</span></td><td>{alert.kind}</td><td className="date">{alert.start}{alert.openedInMonth ? " (new)" : ""}</td>
                <td>{alert.faultEnded ?? "still present"}</td><td>{alert.acknowledged ?? "—"}</td><td>{alert.openAtMonthEnd ? "open" : "closed"}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
    </section>
  );
}

/**
 * MonthlyReportView: the whole report in an <article data-report-month="YYYY-MM"> (the PDF route waits for that
 * attribute); `navigation` goes under the heading and is hidden in print.
 */
/** `unitSystem`: the reader's units for duty (default SI). */
export function MonthlyReportView({ report, navigation, unitSystem = "si" }: { report: MonthlyReport; navigation?: ReactNode; unitSystem?: UnitSystem }) {
  const duty = dutyFormat(unitSystem);
  return (
    <article className="report" data-report-month={report.month.key}>
      <Header report={report} siteCode={report.site.code} />
      {navigation}
      <Condition report={report} duty={duty} />
      <Units report={report} duty={duty} />
      <TopAssets report={report} duty={duty} />
      <Cleanings report={report} />
      <Alerts report={report} />
      <AdvisoryCaution />
    </article>
  );
}
