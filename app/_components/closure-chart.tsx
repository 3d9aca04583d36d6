"use client";

import { CartesianGrid, Legend, ReferenceArea, ReferenceLine, ResponsiveContainer, Scatter, ScatterChart, Tooltip, XAxis, YAxis } from "recharts";
import { CHART_COLOURS, dayIn } from "./chart-format";

export interface ClosurePoint {
  timeMs: number;
  closurePercent: number;
  usable: boolean;
  reason: string | null;
  alerts: string[];
}

export interface AlertSpan {
  id: number;
  label: string;
  startMs: number;
  endMs: number;
}

/** Daily heat-balance closure (hot − cold)/mean, usable and excluded days, instrument alerts as shaded spans with a marker at their start. */
export function ClosureChart({ points, alerts, endMs, timeZone }: { points: ClosurePoint[]; alerts: AlertSpan[]; endMs: number; timeZone: string }) {
  const day = dayIn(timeZone);
  const usable = points.filter((point) => point.usable);
  const excluded = points.filter((point) => !point.usable);
  return (
    <div className="chart" style={{ width: "100%", height: 300 }}>
      <ResponsiveContainer>
        <ScatterChart margin={{ top: 20, right: 16, bottom: 8, left: 8 }}>
          <CartesianGrid stroke={CHART_COLOURS.grid} />
          <XAxis type="number" dataKey="timeMs" domain={["dataMin", endMs]} tickFormatter={day} name="Day" scale="time" minTickGap={40} />
          <YAxis type="number" dataKey="closurePercent" unit=" %" width={64} name="Closure" />
          <Tooltip
            content={({ active, payload }) => {
              const point = active ? (payload?.[0]?.payload as ClosurePoint | undefined) : undefined;
              if (!point) return null;
              return (
                <div className="chart-tooltip">
                  <strong>{day(point.timeMs)}</strong>
                  <div>closure {point.closurePercent.toFixed(2)} %</div>
                  <div>{point.usable ? "usable" : `excluded: ${point.reason ?? "not usable"}`}</div>
                  {point.alerts.length ? <div>alerts: {point.alerts.join("; ")}</div> : null}
                </div>
              );
            }}
          />
          <Legend />
          {alerts.map((alert) => (
            <ReferenceArea key={`area-${alert.id}`} x1={alert.startMs} x2={alert.endMs} fill="#f2b8b5" fillOpacity={0.35} />
          ))}
          {alerts.map((alert) => (
            <ReferenceLine key={`start-${alert.id}`} x={alert.startMs} stroke={CHART_COLOURS.limit} strokeWidth={1.5} label={{ value: `⚑ ${alert.label}`, position: "insideTopLeft", fontSize: 11, fill: CHART_COLOURS.limit }} />
          ))}
          <Scatter name="Usable day" data={usable} fill="#1f5f8b" shape="circle" isAnimationActive={false} />
          <Scatter name="Excluded day" data={excluded} fill="#8a94a3" shape="triangle" isAnimationActive={false} />
        </ScatterChart>
      </ResponsiveContainer>
    </div>
  );
}
