"use client";

import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { CHART_COLOURS, dayIn, smallDot, tick, withUnit } from "./chart-format";

export interface CyclesChartProps {
  cycles: { index: number; startMs: number; current: boolean; points: { days: number; rf: number }[] }[];
  unit: string;
  timeZone: string;
}

/** Earlier cycles in a ramp of greys-to-blues (ours), the current cycle dark and thick. */
const CYCLE_COLOURS = ["#8a94a3", "#6d8fb0", "#4f7ea8", "#3a6a94", "#2a5578"];

/** Cleaning cycles side by side: Rf against days since each cycle started, one line per cycle. */
export function CyclesChart({ cycles, unit, timeZone }: CyclesChartProps) {
  const day = dayIn(timeZone);
  return (
    <div className="chart" style={{ width: "100%", height: 320 }}>
      <ResponsiveContainer>
        <LineChart margin={{ top: 16, right: 16, bottom: 16, left: 8 }}>
          <CartesianGrid stroke={CHART_COLOURS.grid} />
          <XAxis type="number" dataKey="days" domain={[0, "dataMax"]} tickFormatter={tick} allowDuplicatedCategory={false} label={{ value: "days since cycle start", position: "insideBottom", offset: -8, fontSize: 12 }} />
          <YAxis width={84} tickFormatter={tick} />
          <Tooltip labelFormatter={(value) => `day ${tick(value)}`} formatter={(value, name) => [withUnit(value, unit), name]} />
          <Legend verticalAlign="top" />
          {cycles.map((cycle, position) => (
            <Line
              key={cycle.index}
              data={cycle.points}
              dataKey="rf"
              name={`Cycle ${cycle.index + 1} from ${day(cycle.startMs)}${cycle.current ? " (current)" : ""}`}
              stroke={cycle.current ? CHART_COLOURS.model : (CYCLE_COLOURS[position % CYCLE_COLOURS.length] as string)}
              strokeWidth={cycle.current ? 2.5 : 1.2}
              {...(cycle.current ? {} : { strokeDasharray: position % 2 === 0 ? "5 3" : "2 2" })}
              dot={false}
              isAnimationActive={false}
            />
          ))}
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}
