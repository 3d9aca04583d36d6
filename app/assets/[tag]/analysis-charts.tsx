// The asset's analysis charts (client components) with a line on how to read each and a CSV download of its data.
import type { ReactNode } from "react";
import { CyclesChart } from "@/app/_components/cycles-chart";
import { DutyChart } from "@/app/_components/duty-chart";
import { FoulingChart } from "@/app/_components/fouling-chart";
import { UChart } from "@/app/_components/u-chart";
import type { AssetChartName, AssetChartsDisplay } from "@/lib/present/asset-charts";

export function csvHref(tag: string, chart: AssetChartName): string {
  return `/api/assets/${encodeURIComponent(tag)}/charts/${chart}.csv`;
}

export function ChartPanel({ id, title, tag, chart, note, axis, children }: { id: string; title: string; tag: string; chart: AssetChartName; note: ReactNode; axis: string; children: ReactNode }) {
  return (
    <section className="panel chart-panel" aria-labelledby={id}>
      <div className="chart-head">
        <h3 id={id}>{title}</h3>
        <a href={csvHref(tag, chart)} download>Download data (CSV)</a>
      </div>
      <p className="subtle">{note}</p>
      <p className="axis-caption">{axis}</p>
      {children}
    </section>
  );
}

export function AnalysisCharts({ tag, charts, timeZone }: { tag: string; charts: AssetChartsDisplay; timeZone: string }) {
  const { units } = charts;
  return (
    <div className="chart-stack">
      <ChartPanel id="chart-u" title="Observed U and clean-model U" tag={tag} chart="u" axis={`U, ${units.u}`} note="Each dot is one usable day; the line is what the clean exchanger would do at that day's flows. The gap is fouling.">
        {charts.u.length ? <UChart points={charts.u} cleaningsMs={charts.cleaningsMs} unit={units.u} timeZone={timeZone} /> : <p className="empty">No clean model, so no comparison.</p>}
      </ChartPanel>
      <ChartPanel id="chart-fouling" title="Fouling resistance, trend and prediction bands" tag={tag} chart="fouling" axis={`Rf, ${units.rf}`} note="Rf = 1/U observed − 1/U clean. The dark line is the fitted trend of the current cycle; the bands hold a new day's value with 80 % and 95 % probability. Green dashed lines are cleanings.">
        <FoulingChart data={{ ...charts.fouling, asOfMs: charts.asOfMs, cleaningsMs: charts.cleaningsMs, unit: units.rf, timeZone }} />
      </ChartPanel>
      <ChartPanel id="chart-duty" title="Duty at reference conditions" tag={tag} chart="duty" axis={`Duty, ${units.duty}`} note="What the exchanger would transfer at its reference inlets and flows with the fouling of each day, and along the forecast. Vertical lines mark when the forecast meets the threshold: P10 early, P50 central, P90 late.">
        {charts.duty.observed.length || charts.duty.band.length ? <DutyChart data={{ ...charts.duty, asOfMs: charts.asOfMs, unit: units.duty, timeZone }} /> : <p className="empty">No duty could be rated.</p>}
      </ChartPanel>
      <ChartPanel id="chart-cycles" title="Cleaning cycles side by side" tag={tag} chart="cycles" axis={`Rf, ${units.rf}`} note="Rf against days since each cycle started: a steeper line fouls faster. The current cycle is the thick line.">
        {charts.cycles.some((cycle) => cycle.points.length) ? <CyclesChart cycles={charts.cycles} unit={units.rf} timeZone={timeZone} /> : <p className="empty">No cycles with data.</p>}
      </ChartPanel>
    </div>
  );
}
