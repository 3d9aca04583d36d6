"use client";

import { Area, CartesianGrid, ComposedChart, Legend, Line, ReferenceLine, ResponsiveContainer, Scatter, Tooltip, XAxis, YAxis } from "recharts";
import { CHART_COLOURS, dayIn, smallDot, tick, withUnit } from "./chart-format";
import { SeriesTooltip } from "./chart-tooltip";

export interface DutyChartData {
  observed: { timeMs: number; duty: number }[];
  band: { timeMs: number; central: number; lower80: number; upper80: number; lower95: number; upper95: number }[];
  threshold: number;
  clean: number;
  crossing: { status: string; p10Ms: number | null; p50Ms: number | null; p90Ms: number | null; crossedAtMs: number | null };
  asOfMs: number;
  unit: string;
  timeZone: string;
}

/** Duty at reference conditions: from each day's Rf, along the forecast with its bands, the threshold and the P10/P50/P90 crossing dates. */
export function DutyChart({ data }: { data: DutyChartData }) {
  const day = dayIn(data.timeZone);
  const rows = [
    ...data.observed.map((point) => ({ timeMs: point.timeMs, observed: point.duty })),
    ...data.band.map((point) => ({
      timeMs: point.timeMs,
      central: point.central,
      base95: point.lower95,
      span95: point.upper95 - point.lower95,
      base80: point.lower80,
      span80: point.upper80 - point.lower80,
      edges80: `${tick(point.lower80)} – ${tick(point.upper80)}`,
      edges95: `${tick(point.lower95)} – ${tick(point.upper95)}`,
    })),
  ].sort((a, b) => a.timeMs - b.timeMs);
  const { crossing } = data;
  // Explicit vertical range: the stacked band bases would otherwise pull the axis down to zero and flatten the curves.
  const values = [data.threshold, data.clean, ...data.observed.map((point) => point.duty), ...data.band.flatMap((point) => [point.lower95, point.upper95])].filter(Number.isFinite);
  const low = Math.min(...values);
  const high = Math.max(...values);
  const margin = (high - low) * 0.05 || Math.abs(high) * 0.05 || 1;
  const domain: [number, number] = [low - margin, high + margin];
  // Labels staggered so close dates stay readable: P10 left of its line, P50 above, P90 right.
  type Mark = { ms: number; label: string; width: number; dash?: string; position: "insideTopRight" | "top" | "insideTopLeft" };
  const marks: Mark[] = [];
  if (crossing.crossedAtMs !== null && crossing.status === "already-crossed") marks.push({ ms: crossing.crossedAtMs, label: "crossed", width: 2, position: "top" });
  else {
    if (crossing.p10Ms !== null) marks.push({ ms: crossing.p10Ms, label: "P10", width: 1, dash: "3 3", position: "insideTopRight" });
    if (crossing.p50Ms !== null) marks.push({ ms: crossing.p50Ms, label: "P50", width: 2.5, position: "top" });
    if (crossing.p90Ms !== null) marks.push({ ms: crossing.p90Ms, label: "P90", width: 1, dash: "3 3", position: "insideTopLeft" });
  }
  return (
    <div className="chart" style={{ width: "100%", height: 340 }}>
      <ResponsiveContainer>
        <ComposedChart data={rows} margin={{ top: 20, right: 16, bottom: 8, left: 8 }}>
          <CartesianGrid stroke={CHART_COLOURS.grid} />
          <XAxis type="number" dataKey="timeMs" domain={["dataMin", "dataMax"]} scale="time" tickFormatter={day} minTickGap={40} />
          <YAxis width={84} tickFormatter={tick} domain={domain} allowDataOverflow type="number" />
          <Tooltip content={(props) => <SeriesTooltip active={props.active} payload={props.payload as never} label={props.label} unit={data.unit} formatLabel={day} />} />
          <Legend />
          <Area type="monotone" dataKey="base95" stackId="band95" stroke="none" fill="transparent" legendType="none" tooltipType="none" isAnimationActive={false} />
          <Area type="monotone" dataKey="span95" stackId="band95" name="95 % band" stroke="none" fill={CHART_COLOURS.band95} fillOpacity={0.8} isAnimationActive={false} />
          <Area type="monotone" dataKey="base80" stackId="band80" stroke="none" fill="transparent" legendType="none" tooltipType="none" isAnimationActive={false} />
          <Area type="monotone" dataKey="span80" stackId="band80" name="80 % band" stroke="none" fill={CHART_COLOURS.band80} fillOpacity={0.8} isAnimationActive={false} />
          <Line type="monotone" dataKey="central" name="Forecast (P50)" stroke={CHART_COLOURS.model} dot={false} strokeWidth={2} isAnimationActive={false} connectNulls />
          <Scatter dataKey="observed" name="From observed Rf" fill={CHART_COLOURS.observed} shape={smallDot} isAnimationActive={false} />
          <ReferenceLine y={data.threshold} stroke={CHART_COLOURS.limit} strokeDasharray="6 4" label={{ value: `threshold ${withUnit(data.threshold, data.unit)}`, position: "insideBottomLeft", fontSize: 11, fill: CHART_COLOURS.limit }} />
          {marks.map((mark) => (
            <ReferenceLine key={mark.label} x={mark.ms} stroke={CHART_COLOURS.limit} strokeWidth={mark.width} {...(mark.dash ? { strokeDasharray: mark.dash } : {})} label={{ value: mark.position === "top" ? `${mark.label} ${day(mark.ms)}` : mark.label, position: mark.position, fontSize: 11, fill: CHART_COLOURS.limit }} />
          ))}
          <ReferenceLine x={data.asOfMs} stroke={CHART_COLOURS.now} label={{ value: "now", position: "insideBottomRight", fontSize: 11 }} />
        </ComposedChart>
      </ResponsiveContainer>
    </div>
  );
}
