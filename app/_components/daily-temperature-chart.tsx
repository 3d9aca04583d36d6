"use client";

import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { DailyReading } from "@/lib/data/daily-readings";
import { displayUnit, toDisplay, type UnitSystem } from "@/lib/present/display-units";

export function DailyTemperatureChart({ data, system = "si" }: { data: DailyReading[]; system?: UnitSystem }) {
  const unit = displayUnit(system, "temperature").label;
  const celsius = (kelvin: number | null) => {
    const value = toDisplay(system, "temperature", kelvin);
    return value === null ? null : Math.round(value * 100) / 100;
  };
  const series = data.map((day) => ({
    day: day.day,
    hotIn: celsius(day.hotInK),
    hotOut: celsius(day.hotOutK),
    coldIn: celsius(day.coldInK),
    coldOut: celsius(day.coldOutK),
  }));
  return (
    <div style={{ width: "100%", height: 320 }}>
      <ResponsiveContainer>
        <LineChart data={series} margin={{ top: 8, right: 16, bottom: 8, left: 8 }}>
          <CartesianGrid stroke="#e3e7ee" />
          <XAxis dataKey="day" minTickGap={40} />
          <YAxis unit={` ${unit}`} width={70} />
          <Tooltip formatter={(value) => `${String(value)} ${unit}`} />
          <Legend />
          <Line type="monotone" dataKey="hotIn" name="Hot in" stroke="#b2372b" dot={false} isAnimationActive={false} />
          <Line type="monotone" dataKey="hotOut" name="Hot out" stroke="#e0876a" dot={false} isAnimationActive={false} />
          <Line type="monotone" dataKey="coldIn" name="Cold in" stroke="#1f5f8b" dot={false} isAnimationActive={false} />
          <Line type="monotone" dataKey="coldOut" name="Cold out" stroke="#6aa6cf" dot={false} isAnimationActive={false} />
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}
