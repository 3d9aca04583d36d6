"use client";

import { Area, CartesianGrid, ComposedChart, Legend, Line, ReferenceLine, ResponsiveContainer, Scatter, Tooltip, XAxis, YAxis } from "recharts";
import { CHART_COLOURS, dayIn, smallDot, tick } from "./chart-format";
import { SeriesTooltip } from "./chart-tooltip";

export interface FoulingChartData {
  observed: { timeMs: number; rf: number; cycle: number }[];
  band: { timeMs: number; p10: number; p50: number; p90: number; lower95: number; upper95: number }[];
  criticalRf: number | null;
  designRf: number;
  asOfMs: number;
  cleaningsMs: number[];
  unit: string;
  timeZone: string;
}

/** Fouling resistance: observed daily values, the fitted trend, 80 % and 95 % prediction bands, limits and cleanings. */
export function FoulingChart({ data }: { data: FoulingChartData }) {
  const day = dayIn(data.timeZone);
  const rows = [
    ...data.observed.map((point) => ({ timeMs: point.timeMs, observed: point.rf })),
    ...data.band.map((point) => ({
      timeMs: point.timeMs,
      trend: point.p50,
      // Bands drawn as a transparent base plus a filled span, stacked; the tooltip shows the edges instead.
      base95: point.lower95,
      span95: point.upper95 - point.lower95,
      base80: point.p10,
      span80: point.p90 - point.p10,
      edges80: `${tick(point.p10)} – ${tick(point.p90)}`,
      edges95: `${tick(point.lower95)} – ${tick(point.upper95)}`,
    })),
  ].sort((a, b) => a.timeMs - b.timeMs);
  return (
    <div className="chart" style={{ width: "100%", height: 340 }}>
      <ResponsiveContainer>
        <ComposedChart data={rows} margin={{ top: 16, right: 16, bottom: 8, left: 8 }}>
          <CartesianGrid stroke={CHART_COLOURS.grid} />
          <XAxis type="number" dataKey="timeMs" domain={["dataMin", "dataMax"]} scale="time" tickFormatter={day} minTickGap={40} />
          <YAxis width={84} tickFormatter={tick} />
          <Tooltip content={(props) => <SeriesTooltip active={props.active} payload={props.payload as never} label={props.label} unit={data.unit} formatLabel={day} />} />
          <Legend />
          <Area type="monotone" dataKey="base95" stackId="band95" stroke="none" fill="transparent" legendType="none" tooltipType="none" isAnimationActive={false} />
          <Area type="monotone" dataKey="span95" stackId="band95" name="95 % band" stroke="none" fill={CHART_COLOURS.band95} fillOpacity={0.8} isAnimationActive={false} />
          <Area type="monotone" dataKey="base80" stackId="band80" stroke="none" fill="transparent" legendType="none" tooltipType="none" isAnimationActive={false} />
          <Area type="monotone" dataKey="span80" stackId="band80" name="80 % band" stroke="none" fill={CHART_COLOURS.band80} fillOpacity={0.8} isAnimationActive={false} />
          <Line type="monotone" dataKey="trend" name="Trend (P50)" stroke={CHART_COLOURS.model} dot={false} strokeWidth={2} isAnimationActive={false} connectNulls />
          <Scatter dataKey="observed" name="Observed (daily)" fill={CHART_COLOURS.observed} shape={smallDot} isAnimationActive={false} />
          {data.criticalRf !== null ? <ReferenceLine y={data.criticalRf} stroke={CHART_COLOURS.limit} strokeDasharray="6 4" label={{ value: "duty threshold", position: "insideTopLeft", fontSize: 11, fill: CHART_COLOURS.limit }} /> : null}
          <ReferenceLine y={data.designRf} stroke={CHART_COLOURS.design} strokeDasharray="2 4" label={{ value: "design fouling", position: "insideBottomLeft", fontSize: 11, fill: CHART_COLOURS.design }} />
          {data.cleaningsMs.map((ms) => (
            <ReferenceLine key={ms} x={ms} stroke={CHART_COLOURS.cleaning} strokeDasharray="4 3" label={{ value: "cleaned", position: "top", fontSize: 11, fill: CHART_COLOURS.cleaning }} />
          ))}
          <ReferenceLine x={data.asOfMs} stroke={CHART_COLOURS.now} label={{ value: "now", position: "top", fontSize: 11 }} />
        </ComposedChart>
      </ResponsiveContainer>
    </div>
  );
}
