"use client";

import { CartesianGrid, ComposedChart, Legend, Line, ReferenceLine, ResponsiveContainer, Scatter, Tooltip, XAxis, YAxis } from "recharts";
import { CHART_COLOURS, dayIn, smallDot, tick } from "./chart-format";
import { SeriesTooltip } from "./chart-tooltip";

export interface UChartProps {
  points: { timeMs: number; observed: number; clean: number }[];
  cleaningsMs: number[];
  unit: string;
  timeZone: string;
}

/** Observed U per usable day against the clean-model U at the same day's flows; the gap between them is fouling. */
export function UChart({ points, cleaningsMs, unit, timeZone }: UChartProps) {
  const day = dayIn(timeZone);
  return (
    <div className="chart" style={{ width: "100%", height: 320 }}>
      <ResponsiveContainer>
        <ComposedChart data={points} margin={{ top: 16, right: 16, bottom: 8, left: 8 }}>
          <CartesianGrid stroke={CHART_COLOURS.grid} />
          <XAxis type="number" dataKey="timeMs" domain={["dataMin", "dataMax"]} scale="time" tickFormatter={day} minTickGap={40} />
          <YAxis width={84} tickFormatter={tick} />
          <Tooltip content={(props) => <SeriesTooltip active={props.active} payload={props.payload as never} label={props.label} unit={unit} formatLabel={day} />} />
          <Legend />
          <Scatter dataKey="observed" name="Observed U" fill={CHART_COLOURS.observed} shape={smallDot} isAnimationActive={false} />
          <Line dataKey="clean" name="Clean-model U (same flows)" stroke={CHART_COLOURS.model} dot={false} strokeWidth={1.5} isAnimationActive={false} />
          {cleaningsMs.map((ms) => (
            <ReferenceLine key={ms} x={ms} stroke={CHART_COLOURS.cleaning} strokeDasharray="4 3" label={{ value: "cleaned", position: "top", fontSize: 11, fill: CHART_COLOURS.cleaning }} />
          ))}
        </ComposedChart>
      </ResponsiveContainer>
    </div>
  );
}
