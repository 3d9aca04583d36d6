// Charts of the monthly report as plain server-rendered SVG: no client JavaScript, so they print as they look.
import type { CategoryCount } from "@/lib/report/monthly-report";
import { formatMoney } from "@/lib/present/format";

const WIDTH = 640;
const LABEL_WIDTH = 150;
const VALUE_WIDTH = 120;
const ROW_HEIGHT = 30;
const BAR_HEIGHT = 10;

/** A scale maximum that reads well: 1, 2 or 5 times a power of ten at or above the value. */
function niceMaximum(value: number): number {
  if (!(value > 0)) return 1;
  const power = 10 ** Math.floor(Math.log10(value));
  const step = [1, 2, 5, 10].find((factor) => factor * power >= value) ?? 10;
  return step * power;
}

function Legend({ current, previous, y }: { current: string; previous: string; y: number }) {
  return (
    <g className="chart-legend" transform={`translate(${LABEL_WIDTH},${y})`}>
      <rect x={0} y={-8} width={14} height={BAR_HEIGHT} className="bar-current" />
      <text x={20} y={0}>{current}</text>
      <rect x={200} y={-8} width={14} height={BAR_HEIGHT} className="bar-previous" />
      <text x={220} y={0}>{previous}</text>
    </g>
  );
}

/**
 * Paired horizontal bars: the month (dark) above the month before (light), each row labelled, values at the right.
 */
function PairedBars({
  title,
  rows,
  currentLabel,
  previousLabel,
  format,
  barClass,
}: {
  title: string;
  rows: { key: string; label: string; current: number; previous: number | null }[];
  currentLabel: string;
  previousLabel: string;
  format: (value: number) => string;
  barClass?: (key: string) => string;
}) {
  const maximum = niceMaximum(Math.max(...rows.flatMap((row) => [row.current, row.previous ?? 0])));
  const plotWidth = WIDTH - LABEL_WIDTH - VALUE_WIDTH;
  const top = 22;
  const height = top + rows.length * ROW_HEIGHT + 26;
  const x = (value: number) => LABEL_WIDTH + (Math.max(0, value) / maximum) * plotWidth;
  return (
    <svg className="report-chart" viewBox={`0 0 ${WIDTH} ${height}`} role="img" aria-label={title}>
      <title>{title}</title>
      <Legend current={currentLabel} previous={previousLabel} y={12} />
      {[0, 0.5, 1].map((fraction) => (
        <g key={fraction}>
          <line x1={x(fraction * maximum)} x2={x(fraction * maximum)} y1={top} y2={top + rows.length * ROW_HEIGHT} className="chart-grid" />
          <text x={x(fraction * maximum)} y={top + rows.length * ROW_HEIGHT + 14} textAnchor="middle" className="chart-axis">
            {format(fraction * maximum)}
          </text>
        </g>
      ))}
      {rows.map((row, index) => {
        const y = top + index * ROW_HEIGHT + 3;
        return (
          <g key={row.key}>
            <text x={LABEL_WIDTH - 8} y={y + BAR_HEIGHT + 2} textAnchor="end" className="chart-label">{row.label}</text>
            <rect x={LABEL_WIDTH} y={y} width={Math.max(row.current > 0 ? 1.5 : 0, x(row.current) - LABEL_WIDTH)} height={BAR_HEIGHT} className={barClass ? barClass(row.key) : "bar-current"} />
            {row.previous !== null ? <rect x={LABEL_WIDTH} y={y + BAR_HEIGHT + 2} width={Math.max(row.previous > 0 ? 1.5 : 0, x(row.previous) - LABEL_WIDTH)} height={BAR_HEIGHT - 3} className="bar-previous" /> : null}
            <text x={WIDTH - 4} y={y + BAR_HEIGHT - 1} textAnchor="end" className="chart-value">{format(row.current)}</text>
            {row.previous !== null ? <text x={WIDTH - 4} y={y + 2 * BAR_HEIGHT + 2} textAnchor="end" className="chart-value previous">{format(row.previous)}</text> : null}
          </g>
        );
      })}
    </svg>
  );
}

/** Exchangers per condition category at the two month ends. */
export function CategoryChart({ categories, month, previousMonth }: { categories: CategoryCount[]; month: string; previousMonth: string }) {
  return (
    <PairedBars
      title={`Exchangers per condition category, end of ${month} and end of ${previousMonth}`}
      rows={categories.map((category) => ({ key: category.status, label: category.label, current: category.count, previous: category.previousCount }))}
      currentLabel={`end of ${month}`}
      previousLabel={`end of ${previousMonth}`}
      format={(value) => String(Math.round(value))}
      barClass={(key) => `bar-${key}`}
    />
  );
}

/** Cost of fouling per day per row (assets or units) at the two month ends. */
export function CostChart({
  title,
  rows,
  currency,
  month,
  previousMonth,
}: {
  title: string;
  rows: { key: string; label: string; current: number; previous: number | null }[];
  currency: string;
  month: string;
  previousMonth: string;
}) {
  return (
    <PairedBars
      title={title}
      rows={rows}
      currentLabel={`end of ${month}`}
      previousLabel={`end of ${previousMonth}`}
      format={(value) => formatMoney(value, currency)}
    />
  );
}
