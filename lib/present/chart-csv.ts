// CSV downloads of the asset charts: a header row naming each column's unit, one row per point, RFC 4180 text
// (CRLF line ends) with every text cell made safe against spreadsheet formula injection (spreadsheetCsvField).
import type { AssetChartName, AssetChartsDisplay } from "./asset-charts";
import { spreadsheetCsvField } from "../core/export/spreadsheet-text";

/** RFC 4180 §2 rule 1: each record ends with CRLF. */
const LINE_END = "\r\n";

function iso(ms: number | null): string {
  return ms === null || !Number.isFinite(ms) ? "" : new Date(ms).toISOString();
}

/** A number cell: full precision (the reader rounds), empty for null or non-finite. */
function numberCell(value: number | null | undefined): string {
  return value === null || value === undefined || !Number.isFinite(value) ? "" : String(value);
}

function csv(header: string[], rows: string[][]): string {
  return [header.map((name) => spreadsheetCsvField(name)), ...rows].map((cells) => cells.join(",")).join(LINE_END) + LINE_END;
}

/** Observed and clean-model U per usable day. */
export function uChartCsv(charts: AssetChartsDisplay): string {
  const unit = charts.asciiUnits.u;
  return csv(
    ["time (UTC ISO-8601)", `observed U (${unit})`, `clean-model U at the day's flows (${unit})`, "U as % of clean (%)"],
    charts.u.map((point) => [iso(point.timeMs), numberCell(point.observed), numberCell(point.clean), numberCell((100 * point.observed) / point.clean)]),
  );
}

/** Observed Rf per day, then the trend and its bands (one row per time; empty cells where a series has no value). */
export function foulingChartCsv(charts: AssetChartsDisplay): string {
  const unit = charts.asciiUnits.rf;
  const rows = [
    ...charts.fouling.observed.map((point) => ({ timeMs: point.timeMs, cells: [String(point.cycle), numberCell(point.rf), "", "", "", "", ""] })),
    ...charts.fouling.band.map((point) => ({ timeMs: point.timeMs, cells: ["", "", numberCell(point.p50), numberCell(point.p10), numberCell(point.p90), numberCell(point.lower95), numberCell(point.upper95)] })),
  ].sort((a, b) => a.timeMs - b.timeMs);
  return csv(
    ["time (UTC ISO-8601)", "cycle", `observed Rf (${unit})`, `trend P50 Rf (${unit})`, `80% band lower P10 Rf (${unit})`, `80% band upper P90 Rf (${unit})`, `95% band lower Rf (${unit})`, `95% band upper Rf (${unit})`],
    rows.map((row) => [iso(row.timeMs), ...row.cells]),
  );
}

/** Duty at reference conditions from the observed Rf and along the forecast band, with the threshold and crossings. */
export function dutyChartCsv(charts: AssetChartsDisplay): string {
  const unit = charts.asciiUnits.duty;
  const { crossing } = charts.duty;
  const rows = [
    ...charts.duty.observed.map((point) => ({ timeMs: point.timeMs, cells: [numberCell(point.duty), "", "", "", "", ""] })),
    ...charts.duty.band.map((point) => ({ timeMs: point.timeMs, cells: ["", numberCell(point.central), numberCell(point.lower80), numberCell(point.upper80), numberCell(point.lower95), numberCell(point.upper95)] })),
  ].sort((a, b) => a.timeMs - b.timeMs);
  const header = [
    "time (UTC ISO-8601)",
    `duty from observed Rf (${unit})`,
    `trend duty (${unit})`,
    `80% band lower duty (${unit})`,
    `80% band upper duty (${unit})`,
    `95% band lower duty (${unit})`,
    `95% band upper duty (${unit})`,
    `threshold (${unit})`,
    `clean duty (${unit})`,
    "threshold status",
    "threshold P10 (UTC)",
    "threshold P50 (UTC)",
    "threshold P90 (UTC)",
  ];
  // Constant columns are given on the first row only, so the table stays one rectangle without repeating them.
  const constants = [numberCell(charts.duty.threshold), numberCell(charts.duty.clean), spreadsheetCsvField(crossing.status), iso(crossing.p10Ms), iso(crossing.p50Ms), iso(crossing.p90Ms)];
  return csv(
    header,
    rows.map((row, index) => [iso(row.timeMs), ...row.cells, ...(index === 0 ? constants : constants.map(() => ""))]),
  );
}

/** Daily heat-balance closure, usability and the instrument alerts active that day. */
export function closureChartCsv(charts: AssetChartsDisplay): string {
  return csv(
    ["day start (UTC ISO-8601)", "closure (hot - cold)/mean (%)", "usable (true/false)", "reason not usable", "instrument alerts that day"],
    charts.closure.points.map((point) => [
      iso(point.timeMs),
      numberCell(point.closurePercent),
      String(point.usable),
      spreadsheetCsvField(point.reason ?? ""),
      spreadsheetCsvField(point.alerts.join("; ")),
    ]),
  );
}

/** Rf against days since the start of each cleaning cycle. */
export function cyclesChartCsv(charts: AssetChartsDisplay): string {
  const unit = charts.asciiUnits.rf;
  return csv(
    ["cycle", "cycle start (UTC ISO-8601)", "days since cycle start (d)", `Rf (${unit})`],
    charts.cycles.flatMap((cycle) => cycle.points.map((point) => [String(cycle.index), iso(cycle.startMs), numberCell(point.days), numberCell(point.rf)])),
  );
}

const BUILDERS: Record<AssetChartName, (charts: AssetChartsDisplay) => string> = {
  u: uChartCsv,
  fouling: foulingChartCsv,
  duty: dutyChartCsv,
  closure: closureChartCsv,
  cycles: cyclesChartCsv,
};

/** chartCsv: the CSV text of one chart. */
export function chartCsv(chart: AssetChartName, charts: AssetChartsDisplay): string {
  return BUILDERS[chart](charts);
}
