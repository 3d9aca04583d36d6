"use client";

import { Area, CartesianGrid, ComposedChart, Legend, Line, ReferenceLine, ResponsiveContainer, Scatter, Tooltip, XAxis, YAxis } from "recharts";

export interface FoulingChartData {
  observed: { timeMs: number; rf: number; cycle: number }[];
  band: { timeMs: number; p10: number; p50: number; p90: number; lower95: number; upper95: number }[];
  criticalRf: number | null;
  designRf: number;
  asOfMs: number;
}

const day = (ms: number) => new Date(ms).toISOString().slice(0, 10);
/** m²·K/W shown as 10⁻⁴ m²·K/W so the axis reads in plain numbers. */
const scaled = (value: number) => value * 1e4;

/** Fouling resistance: observed daily values, the fitted trend, 80 % and 95 % prediction bands, and the critical value. */
export function FoulingChart({ data }: { data: FoulingChartData }) {
  const rows = [
    ...data.observed.map((point) => ({ timeMs: point.timeMs, observed: scaled(point.rf) })),
    ...data.band.map((point) => ({
      timeMs: point.timeMs,
      trend: scaled(point.p50),
      // Bands drawn as a transparent base plus a filled span, stacked.
      base95: scaled(point.lower95),
      span95: scaled(point.upper95 - point.lower95),
      base80: scaled(point.p10),
      span80: scaled(point.p90 - point.p10),
    })),
  ].sort((a, b) => a.timeMs - b.timeMs);
  return (
    <div style={{ width: "100%", height: 340 }}>
      <ResponsiveContainer>
        <ComposedChart data={rows} margin={{ top: 8, right: 16, bottom: 8, left: 8 }}>
          <CartesianGrid stroke="#e3e7ee" />
          <XAxis type="number" dataKey="timeMs" domain={["dataMin", "dataMax"]} scale="time" tickFormatter={day} minTickGap={40} />
          <YAxis width={70} label={{ value: "Rf, 10⁻⁴ m²·K/W", angle: -90, position: "insideLeft", fontSize: 12 }} />
          <Tooltip labelFormatter={(value) => day(Number(value))} formatter={(value, name) => [`${Number(value).toFixed(2)} ×10⁻⁴ m²·K/W`, name === "95 % band" || name === "80 % band" ? `${name} width` : name]} />
          <Legend />
          <Area type="monotone" dataKey="base95" stackId="band95" stroke="none" fill="transparent" legendType="none" tooltipType="none" isAnimationActive={false} />
          <Area type="monotone" dataKey="span95" stackId="band95" name="95 % band" stroke="none" fill="#c9d9e8" fillOpacity={0.7} isAnimationActive={false} />
          <Area type="monotone" dataKey="base80" stackId="band80" stroke="none" fill="transparent" legendType="none" tooltipType="none" isAnimationActive={false} />
          <Area type="monotone" dataKey="span80" stackId="band80" name="80 % band" stroke="none" fill="#8fb3d3" fillOpacity={0.7} isAnimationActive={false} />
          <Line type="monotone" dataKey="trend" name="Trend (P50)" stroke="#14324a" dot={false} strokeWidth={2} isAnimationActive={false} connectNulls />
          <Scatter dataKey="observed" name="Observed (daily)" fill="#6b7685" shape="circle" isAnimationActive={false} />
          {data.criticalRf !== null ? <ReferenceLine y={scaled(data.criticalRf)} stroke="#b3261e" strokeDasharray="6 4" label={{ value: "duty threshold", position: "insideTopLeft", fontSize: 11, fill: "#b3261e" }} /> : null}
          <ReferenceLine y={scaled(data.designRf)} stroke="#8a6d1f" strokeDasharray="2 4" label={{ value: "design fouling", position: "insideBottomLeft", fontSize: 11, fill: "#8a6d1f" }} />
          <ReferenceLine x={data.asOfMs} stroke="#555" label={{ value: "now", position: "top", fontSize: 11 }} />
        </ComposedChart>
      </ResponsiveContainer>
    </div>
  );
}
