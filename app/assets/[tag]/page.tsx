import Link from "next/link";
import { notFound } from "next/navigation";
import { AdvisoryCaution } from "@/app/_components/advisory-caution";
import { DailyTemperatureChart } from "@/app/_components/daily-temperature-chart";
import { dailyReadings } from "@/lib/data/daily-readings";
import { getAsset } from "@/lib/data/get-asset";
import { listAssetRevisions } from "@/lib/data/list-asset-revisions";
import { listAlerts } from "@/lib/data/list-alerts";
import { listPeriods } from "@/lib/data/list-periods";
import { ClosureChart } from "@/app/_components/closure-chart";
import { acknowledgeAlertAction } from "./alert-actions";
import { recordCleaningAction } from "./cleaning-actions";
import { getStoredAssessment } from "@/lib/data/refresh-assessment";
import { getPrisma } from "@/lib/db";
import { requireSignedInUser } from "@/lib/auth/current-user";
import { can } from "@/lib/auth/permissions";
import { describeArrangement, formatDate, formatSignificant } from "@/lib/present/format";
import { formatQuantity } from "@/lib/present/display-units";
import { closureSeries, displayAssetCharts } from "@/lib/present/asset-charts";
import { buildAssetCharts, chartAlerts } from "@/lib/data/load-asset-charts";
import { economicsSummary } from "@/lib/planning/economics-summary";
import { AnalysisCharts, csvHref } from "./analysis-charts";
import { EconomicsPanel } from "./economics-panel";
import { ModelCard } from "./model-card";

export const dynamic = "force-dynamic";

const ROLE_LABELS: Record<string, string> = {
  hotIn: "Hot inlet temperature",
  hotOut: "Hot outlet temperature",
  coldIn: "Cold inlet temperature",
  coldOut: "Cold outlet temperature",
  hotFlow: "Hot mass flow",
  coldFlow: "Cold mass flow",
  hotPressureDrop: "Hot side pressure drop",
  coldPressureDrop: "Cold side pressure drop",
};

function describeHeatCapacity(kind: string, intercept: number, slope: number): string {
  return kind === "linear"
    ? `cp = ${formatSignificant(intercept, 4)} + ${formatSignificant(slope, 3)}·T[K] J/(kg·K)`
    : `cp = ${formatSignificant(intercept, 4)} J/(kg·K)`;
}

const ROLE_ORDER = Object.keys(ROLE_LABELS);

function describeChange(field: string, change: { before: unknown; after: unknown }): string {
  const show = (value: unknown) => (typeof value === "number" ? formatSignificant(value, 6) : value === null ? "—" : typeof value === "object" ? "(list)" : String(value));
  return field === "instruments" ? "instruments changed" : `${field}: ${show(change.before)} → ${show(change.after)}`;
}

export default async function AssetPage({ params, searchParams }: { params: Promise<{ tag: string }>; searchParams: Promise<{ saved?: string; error?: string }> }) {
  const { tag } = await params;
  const { saved, error } = await searchParams;
  const user = await requireSignedInUser();
  const prisma = getPrisma();
  const asset = await getAsset(prisma, decodeURIComponent(tag));
  if (!asset) notFound();
  const [daily, revisions, alerts, periods] = await Promise.all([
    dailyReadings(prisma, asset.id),
    listAssetRevisions(prisma, asset.tag),
    listAlerts(prisma, { tag: asset.tag, includeAcknowledged: true }),
    listPeriods(prisma, asset.id),
  ]);
  const stored = await getStoredAssessment(prisma, asset.tag);
  const assessment = stored?.assessment ?? null;
  const openAlerts = alerts.filter((alert) => alert.acknowledgedAt === null);
  const lastPeriodMs = periods.length ? Date.parse(periods[periods.length - 1]?.start ?? "") + 86_400_000 : Date.now();
  const excludedTotals = periods.reduce<Record<string, number>>((totals, period) => {
    for (const [reason, count] of Object.entries(period.excluded)) totals[reason] = (totals[reason] ?? 0) + count;
    return totals;
  }, {});
  const samplesTotal = periods.reduce((sum, period) => sum + period.samplesTotal, 0);
  const samplesUsed = periods.reduce((sum, period) => sum + period.samplesUsed, 0);
  const instruments = [...asset.instruments].sort((a, b) => ROLE_ORDER.indexOf(a.role) - ROLE_ORDER.indexOf(b.role));
  const timeZone = asset.unit.site.timeZone;
  const system = user.unitSystem;
  const alertSpans = chartAlerts(alerts, lastPeriodMs);
  const charts = assessment ? displayAssetCharts(await buildAssetCharts(prisma, asset, assessment, alerts), system) : null;
  const economics = assessment ? economicsSummary(asset, asset.unit.site, { result: assessment as never }) : { ok: false as const, reason: "not assessed yet" };
  return (
    <>
      <p className="subtle"><Link href="/">Fleet</Link> / {asset.unit.name}</p>
      <h1>{asset.tag} — {asset.name}</h1>
      {saved ? <p className="notice" role="status">{saved === "queued" ? "Changes saved; the reassessment is queued and shows here once a worker has run it." : "Changes saved."}</p> : null}
      {error ? <p className="form-errors" role="alert">Not saved: {error}</p> : null}
      <p className="actions">
        {can(user.role, "assets.edit") ? <Link href={`/assets/${encodeURIComponent(asset.tag)}/edit`}>Edit register entry</Link> : null}
        {can(user.role, "data.import") ? <Link href={`/assets/${encodeURIComponent(asset.tag)}/import`}>Import operating data</Link> : null}
        {can(user.role, "audit.read") ? <Link href={`/audit?entity=asset&entityId=${encodeURIComponent(asset.tag)}`}>Audit log</Link> : null}
      </p>
      <div className="columns">
        <section className="panel" aria-labelledby="design-heading">
          <h2 id="design-heading">Design</h2>
          <dl className="facts">
            <dt>Service</dt><dd>{asset.service}</dd>
            <dt>Arrangement</dt><dd>{describeArrangement(asset.arrangementKind, asset.shells, asset.tubePasses)}{asset.mixedStream ? ` (${asset.mixedStream} stream mixed)` : ""}</dd>
            <dt>Area</dt><dd>{formatQuantity(system, "area", asset.areaM2, 3)}</dd>
            <dt>Design duty</dt><dd>{formatQuantity(system, "duty", asset.designDutyW, 3)}</dd>
            <dt>Design U</dt><dd>{formatQuantity(system, "u", asset.designUWPerM2K, 3)}</dd>
            <dt>Design fouling</dt><dd>{formatQuantity(system, "foulingResistance", asset.designFoulingM2KPerW, 2)}</dd>
            <dt>Duty threshold</dt><dd>{formatQuantity(system, "duty", asset.dutyThresholdW, 3)}</dd>
          </dl>
        </section>
        <section className="panel" aria-labelledby="streams-heading">
          <h2 id="streams-heading">Streams and reference conditions</h2>
          <dl className="facts">
            <dt>Hot stream</dt><dd>{asset.hotStreamName}; {describeHeatCapacity(asset.hotCpKind, asset.hotCpIntercept, asset.hotCpSlope)}</dd>
            <dt>Cold stream</dt><dd>{asset.coldStreamName}; {describeHeatCapacity(asset.coldCpKind, asset.coldCpIntercept, asset.coldCpSlope)}</dd>
            <dt>Hot inlet</dt><dd>{formatQuantity(system, "temperature", asset.refHotInletK, 4)}, {formatQuantity(system, "massFlow", asset.refHotFlowKgPerS, 3)}</dd>
            <dt>Cold inlet</dt><dd>{formatQuantity(system, "temperature", asset.refColdInletK, 4)}, {formatQuantity(system, "massFlow", asset.refColdFlowKgPerS, 3)}</dd>
          </dl>
        </section>
        <section className="panel" aria-labelledby="instruments-heading">
          <h2 id="instruments-heading">Instruments</h2>
          <table className="grid">
            <thead><tr><th scope="col">Measurement</th><th scope="col">Tag</th><th scope="col" className="num">Standard uncertainty</th></tr></thead>
            <tbody>
              {instruments.map((instrument) => (
                <tr key={instrument.id}>
                  <td>{ROLE_LABELS[instrument.role] ?? instrument.role}</td>
                  <td>{instrument.tag}</td>
                  <td className="num">{instrument.role.endsWith("Flow") ? formatQuantity(system, "massFlow", instrument.standardUncertainty, 2) : instrument.role.endsWith("PressureDrop") ? `${formatSignificant(instrument.standardUncertainty, 2)} Pa` : formatQuantity(system, "temperatureDifference", instrument.standardUncertainty, 2)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
      </div>
      <h2>Fouling assessment</h2>
      {assessment === null || charts === null ? (
        <p className="subtle">Not assessed yet: no usable screened data.</p>
      ) : (
        <>
          <div className="columns align-start">
            <section className="panel" aria-labelledby="condition-heading">
              <h3 id="condition-heading">Condition as of {formatDate(assessment.asOf, timeZone)}</h3>
              <dl className="facts">
                <dt>Observed U</dt><dd>{assessment.currentObservedU ? `${formatQuantity(system, "u", assessment.currentObservedU.uWPerM2K, 3)}, ${formatSignificant(assessment.currentObservedU.percentOfClean, 3)} % of clean` : "—"}</dd>
                <dt>Fouling resistance</dt><dd>{assessment.foulingResistance.current === null ? "—" : formatQuantity(system, "foulingResistance", assessment.foulingResistance.current, 3)}</dd>
                <dt>Duty at reference</dt><dd>{assessment.referenceDuty.currentW === null ? "—" : `${formatQuantity(system, "duty", assessment.referenceDuty.currentW, 3)} (clean ${formatQuantity(system, "duty", assessment.referenceDuty.cleanW, 3)})`}</dd>
                <dt>Duty loss</dt><dd>{assessment.referenceDuty.lossW === null ? "—" : formatQuantity(system, "duty", assessment.referenceDuty.lossW, 3)}</dd>
                <dt>Energy lost this cycle</dt><dd>{assessment.referenceDuty.lossEnergyJ === null ? "—" : formatQuantity(system, "energy", assessment.referenceDuty.lossEnergyJ, 3)}</dd>
              </dl>
            </section>
            <section className="panel" aria-labelledby="forecast-heading">
              <h3 id="forecast-heading">Forecast (P10 / P50 / P90)</h3>
              <table className="grid">
                <thead><tr><th scope="col">Limit</th><th scope="col">Status</th><th scope="col">P10</th><th scope="col">P50</th><th scope="col">P90</th></tr></thead>
                <tbody>
                  {([["Duty below threshold", assessment.forecasts.duty], ["Design fouling reached", assessment.forecasts.foulingAllowance], ...(assessment.forecasts.minimumOutlet ? [["Outlet temperature limit", assessment.forecasts.minimumOutlet] as const] : [])] as const).map(([label, forecast]) => (
                    <tr key={label}>
                      <td>{label}</td>
                      <td>{forecast.status === "already-crossed" ? `crossed ${formatDate(forecast.crossedAt, timeZone)}` : forecast.status.replaceAll("-", " ")}</td>
                      <td>{formatDate(forecast.p10, timeZone)}</td>
                      <td>{formatDate(forecast.p50, timeZone)}</td>
                      <td>{formatDate(forecast.p90, timeZone)}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
              <p className="subtle">P10 is the early date: a 10 % chance the limit is reached by then.</p>
            </section>
            <EconomicsPanel economics={economics.ok ? economics.summary : null} reason={economics.ok ? null : economics.reason} asset={asset} site={asset.unit.site} system={system} />
          </div>
          <h2 id="analysis">Analysis</h2>
          <AnalysisCharts tag={asset.tag} charts={charts} timeZone={timeZone} />
          <ModelCard assessment={assessment} periods={periods} system={system} />
        </>
      )}

      <h2 id="alerts">Instrument alerts</h2>
      {alerts.length === 0 ? (
        <p className="subtle">No instrument problems found in the data.</p>
      ) : (
        <table className="grid" aria-label="Instrument alerts">
          <thead>
            <tr><th scope="col">Instrument</th><th scope="col">Problem</th><th scope="col">From</th><th scope="col">To</th><th scope="col" className="num">Size</th><th scope="col">Evidence</th><th scope="col">Status</th></tr>
          </thead>
          <tbody>
            {alerts.map((alert) => (
              <tr key={alert.id}>
                <td>{alert.instrumentTag}<br /><span className="subtle">{ROLE_LABELS[alert.role] ?? alert.role}</span></td>
                <td>{alert.kind}</td>
                <td>{formatDate(alert.start, timeZone)}</td>
                <td>{alert.end ? formatDate(alert.end, timeZone) : "still present"}</td>
                <td className="num">{alert.sizeUnit === "fraction" ? `${formatSignificant(alert.size * 100, 2)} %` : `${formatSignificant(alert.size, 3)} ${alert.sizeUnit}`}</td>
                <td className="evidence">{alert.evidence}</td>
                <td>
                  {alert.acknowledgedAt ? (
                    <span className="subtle">Acknowledged by {alert.acknowledgedBy} {formatDate(alert.acknowledgedAt, timeZone)}{alert.note ? `: ${alert.note}` : ""}</span>
                  ) : !can(user.role, "alerts.acknowledge") ? (
                    <span className="subtle">Open</span>
                  ) : (
                    <form action={acknowledgeAlertAction}>
                      <input type="hidden" name="alertId" value={alert.id} />
                      <input type="hidden" name="tag" value={asset.tag} />
                      <label className="visually-hidden" htmlFor={`note-${alert.id}`}>Note</label>
                      <input id={`note-${alert.id}`} name="note" placeholder="Note (optional)" />
                      <button type="submit">Acknowledge</button>
                    </form>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      <p className="subtle">Periods affected by an alert stay excluded from U estimation, acknowledged or not.{openAlerts.length ? ` ${openAlerts.length} open.` : ""}</p>

      <h2>Data quality: heat-balance closure per day</h2>
      <div className="panel">
        {periods.length === 0 ? (
          <p className="empty">No screened data yet.</p>
        ) : (
          <>
            <p className="subtle">
              {periods.filter((period) => period.usable).length} of {periods.length} days usable; samples used {samplesUsed.toLocaleString("en-US")} of {samplesTotal.toLocaleString("en-US")}
              {" "}(not used: {Object.entries(excludedTotals).map(([reason, count]) => `${reason} ${count.toLocaleString("en-US")}`).join(", ")}). Closure = (hot duty − cold duty)/mean duty; shaded spans flagged ⚑ are instrument alerts.
            </p>
            <ClosureChart
              endMs={lastPeriodMs}
              points={closureSeries(periods.map((period) => ({ startMs: Date.parse(period.start), closure: period.closure, usable: period.usable, reason: period.reason })), alertSpans)}
              alerts={alertSpans}
              timeZone={timeZone}
            />
            {charts ? <p><a href={csvHref(asset.tag, "closure")} download>Download data (CSV)</a></p> : null}
          </>
        )}
      </div>

      <h2>Daily mean temperatures (raw readings, unscreened)</h2>
      <div className="panel">
        {daily.length === 0 ? <p className="empty">No operating data imported yet.</p> : <DailyTemperatureChart data={daily} system={system} />}
      </div>
      <h2>Cleanings</h2>
      {asset.cleanings.length === 0 ? (
        <p className="subtle">No cleanings recorded.</p>
      ) : (
        <table className="grid">
          <thead><tr><th scope="col">Out of service</th><th scope="col">Back in service</th><th scope="col">Method</th><th scope="col" className="num">Cost ({asset.unit.site.currency})</th><th scope="col" className="num">Fouling removed</th><th scope="col">Notes</th></tr></thead>
          <tbody>
            {asset.cleanings.map((cleaning) => (
              <tr key={cleaning.id}>
                <td>{formatDate(cleaning.date.toISOString(), timeZone)}</td>
                <td>{formatDate(cleaning.endDate?.toISOString() ?? null, timeZone)}</td>
                <td>{cleaning.method}</td>
                <td className="num">{cleaning.costCents === null ? "—" : (cleaning.costCents / 100).toLocaleString("en-US")}</td>
                <td className="num">{cleaning.effectiveness === null ? "—" : `${formatSignificant(cleaning.effectiveness * 100, 2)} %`}</td>
                <td>{cleaning.notes}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      {can(user.role, "cleanings.record") ? <details className="panel">
        <summary>Record a cleaning</summary>
        <form action={recordCleaningAction} className="inline-form">
          <input type="hidden" name="tag" value={asset.tag} />
          <label>Out of service <input type="date" name="date" required /></label>
          <label>Back in service <input type="date" name="endDate" /></label>
          <label>Method <input name="method" required placeholder="hydroblast" /></label>
          <label>Cost ({asset.unit.site.currency}) <input name="cost" type="number" step="any" min={0} /></label>
          <label>Notes <input name="notes" /></label>
          <button type="submit">Record and reassess</button>
        </form>
      </details> : null}
      <h2>Register history</h2>
      {revisions === null || revisions.length === 0 ? (
        <p className="subtle">No recorded changes{asset.demoTruth ? " (loaded as demo data)" : ""}.</p>
      ) : (
        <table className="grid">
          <thead><tr><th scope="col">When</th><th scope="col">Who</th><th scope="col">What</th></tr></thead>
          <tbody>
            {revisions.map((revision) => (
              <tr key={revision.changedAt + revision.action}>
                <td>{revision.changedAt.replace("T", " ").slice(0, 16)} UTC</td>
                <td>{revision.changedBy}</td>
                <td>{revision.action === "created" ? "Created" : Object.entries(revision.changes).map(([field, change]) => describeChange(field, change)).join("; ")}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      <AdvisoryCaution />
    </>
  );
}
