// Formatting shared by the asset charts (client side): dates in the site's time zone, values with units.
import { createElement } from "react";
import { formatSignificant } from "@/lib/present/format";

/** YYYY-MM-DD of an instant in `timeZone` (en-CA gives ISO order). */
export function dayIn(timeZone: string) {
  const format = new Intl.DateTimeFormat("en-CA", { timeZone, year: "numeric", month: "2-digit", day: "2-digit" });
  return (ms: number) => (Number.isFinite(ms) ? format.format(new Date(ms)) : "");
}

/** "123 kW" with three significant figures; "—" for a missing value. */
export function withUnit(value: unknown, unit: string, digits = 3): string {
  const number = typeof value === "number" ? value : Number(value);
  return Number.isFinite(number) ? `${formatSignificant(number, digits)} ${unit}` : "—";
}

/** Axis ticks: three significant figures without thousands separators clutter. */
export function tick(value: unknown): string {
  const number = Number(value);
  return Number.isFinite(number) ? formatSignificant(number, 3) : "";
}

/** Chart colours (ours): ink-blue series, grey observations, brick-red limits; lines ≥ 3:1 on white (WCAG 1.4.11). */
export const CHART_COLOURS = {
  observed: "#5f6b7a",
  model: "#14324a",
  band95: "#cfdcea",
  band80: "#93b4d4",
  limit: "#a3211a",
  design: "#7a5d00",
  cleaning: "#1f6b3a",
  grid: "#e3e7ee",
  now: "#3d4450",
} as const;

/** A 2 px dot for daily observations (recharts' default symbol hides the trend under hundreds of points). */
export function smallDot(props: unknown) {
  const { cx, cy, fill } = props as { cx?: number; cy?: number; fill?: string };
  return createElement("circle", { cx, cy, r: 2, fill, fillOpacity: 0.75 });
}
