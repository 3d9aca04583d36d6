"use client";

import { CartesianGrid, Legend, ReferenceArea, ResponsiveContainer, Scatter, ScatterChart, Tooltip, XAxis, YAxis } from "recharts";

export interface ClosurePoint {
  timeMs: number;
  closurePercent: number;
  usable: boolean;
}

export interface AlertSpan {
  id: number;
  label: string;
  startMs: number;
  endMs: number;
}

const day = (ms: number) => new Date(ms).toISOString().slice(0, 10);

/** Daily heat-balance closure (hot − cold)/mean, usable and excluded days, with instrument-alert spans shaded. */
export function ClosureChart({ points, alerts, endMs }: { points: ClosurePoint[]; alerts: AlertSpan[]; endMs: number }) {
  const usable = points.filter((point) => point.usable);
  const excluded = points.filter((point) => !point.usable);
  return (
    <div style={{ width: "100%", height: 300 }}>
      <ResponsiveContainer>
        <ScatterChart margin={{ top: 8, right: 16, bottom: 8, left: 8 }}>
          <CartesianGrid stroke="#e3e7ee" />
          <XAxis type="number" dataKey="timeMs" domain={["dataMin", endMs]} tickFormatter={day} name="Day" scale="time" minTickGap={40} />
          <YAxis type="number" dataKey="closurePercent" unit=" %" width={64} name="Closure" />
          <Tooltip formatter={(value, name) => (name === "Day" ? day(Number(value)) : `${Number(value).toFixed(2)} %`)} />
          <Legend />
          {alerts.map((alert) => (
            <ReferenceArea key={alert.id} x1={alert.startMs} x2={alert.endMs} fill="#f2b8b5" fillOpacity={0.35} label={{ value: alert.label, position: "insideTop", fontSize: 11 }} />
          ))}
          <Scatter name="Usable day" data={usable} fill="#1f5f8b" shape="circle" isAnimationActive={false} />
          <Scatter name="Excluded day" data={excluded} fill="#b0b7c3" shape="triangle" isAnimationActive={false} />
        </ScatterChart>
      </ResponsiveContainer>
    </div>
  );
}
