// SI -> display units and number formatting for the web app and reports.
import { fromSI } from "../core/units";

/** Formats a number to `digits` significant figures, with thousands separators for large values. */
export function formatSignificant(value: number, digits = 3): string {
  if (!Number.isFinite(value)) return "—";
  if (value === 0) return "0";
  const magnitude = Math.floor(Math.log10(Math.abs(value)));
  const decimals = Math.max(0, digits - 1 - magnitude);
  // Intl allows at most 100 fraction digits; tiny values (e.g. an Akaike weight of 1e-150) read better as exponents.
  if (decimals > 20) return value.toExponential(Math.max(0, digits - 1));
  return value.toLocaleString("en-US", { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
}

export function formatDutyMW(watts: number): string {
  return `${formatSignificant(watts / 1e6, 3)} MW`;
}

export function formatTemperatureC(kelvin: number | null): string {
  return kelvin === null ? "—" : `${formatSignificant(fromSI("temperature", kelvin, "degC"), 4)} °C`;
}

export function formatDate(iso: string | null, timeZone: string): string {
  if (!iso) return "—";
  return new Intl.DateTimeFormat("en-CA", { timeZone, year: "numeric", month: "2-digit", day: "2-digit" }).format(new Date(iso));
}

export const ARRANGEMENT_LABELS: Record<string, string> = {
  counterflow: "Counterflow",
  parallel: "Parallel flow",
  "shell-and-tube": "Shell and tube (E shell)",
  "crossflow-unmixed": "Crossflow, both unmixed",
  "crossflow-mixed": "Crossflow, one stream mixed",
};

export function describeArrangement(kind: string, shells: number, tubePasses: number): string {
  const label = ARRANGEMENT_LABELS[kind] ?? kind;
  return kind === "shell-and-tube" ? `${label}, ${shells} shell${shells > 1 ? "s" : ""} × ${tubePasses} tube passes` : label;
}

/** Money in whole units of the currency with thousands separators, e.g. "12,345 EUR"; "—" for null. */
export function formatMoney(value: number | null, currency: string): string {
  if (value === null || !Number.isFinite(value)) return "—";
  const rounded = Math.round(value);
  return `${rounded < 0 ? "−" : ""}${Math.abs(rounded).toLocaleString("en-GB")} ${currency}`;
}
