"use client";

import { withUnit } from "./chart-format";

/** One tooltip item as recharts passes it. */
interface TooltipItem {
  name?: string | number;
  dataKey?: string | number | ((value: unknown) => unknown);
  value?: unknown;
  payload?: Record<string, unknown>;
}

/** Keys that exist only to draw (time axis, transparent band bases); never listed in a tooltip. */
const HIDDEN_KEYS = new Set(["timeMs", "base95", "base80", "days"]);

/**
 * The tooltip of the time-series charts: the day, then each series with its value and unit. A band shows its two
 * edges (`edges80` / `edges95` in the row) instead of its drawn span.
 */
export function SeriesTooltip({ active, payload, label, unit, formatLabel }: { active?: boolean; payload?: readonly TooltipItem[]; label?: unknown; unit: string; formatLabel: (value: number) => string }) {
  if (!active || !payload?.length) return null;
  const items = payload.filter((item) => typeof item.dataKey === "string" && !HIDDEN_KEYS.has(item.dataKey));
  const row = payload[0]?.payload ?? {};
  const time = typeof label === "number" ? label : Number(row.timeMs ?? row.days ?? label);
  return (
    <div className="chart-tooltip">
      <strong>{formatLabel(time)}</strong>
      {items.map((item) => {
        const key = String(item.dataKey);
        const edges = key === "span80" ? row.edges80 : key === "span95" ? row.edges95 : undefined;
        return (
          <div key={key}>
            {String(item.name ?? key)}: {edges !== undefined ? `${String(edges)} ${unit}` : withUnit(item.value, unit)}
          </div>
        );
      })}
    </div>
  );
}
