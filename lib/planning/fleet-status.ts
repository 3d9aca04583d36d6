// The condition category of an exchanger in the fleet table: how soon it needs cleaning, from its threshold forecast.
import { DAY_MS } from "../core/plan";
import type { AssessmentSummary } from "./assessment-summary";

export const FLEET_STATUSES = ["act-now", "plan-cleaning", "watch", "good", "no-estimate"] as const;
export type FleetStatus = (typeof FLEET_STATUSES)[number];

export const FLEET_STATUS_LABELS: Record<FleetStatus, string> = {
  "act-now": "Act now",
  "plan-cleaning": "Plan a cleaning",
  watch: "Watch",
  good: "Good",
  "no-estimate": "No estimate",
};

export const FLEET_STATUS_MEANINGS: Record<FleetStatus, string> = {
  "act-now": "reference duty is already below the threshold, or the P10 date is within 30 days",
  "plan-cleaning": "the P10 threshold date is within 180 days",
  watch: "the P10 threshold date is within 365 days",
  good: "the P10 threshold date is more than a year away, or beyond the forecast",
  "no-estimate": "not enough usable data for a fouling trend",
};

/** Days before the P10 threshold date at which each category starts (common practice planning lead times, our choice). */
const ACT_NOW_DAYS = 30;
const PLAN_DAYS = 180;
const WATCH_DAYS = 365;

/**
 * fleetStatus: the category from the P10 duty-threshold date relative to `nowMs`: crossed or within 30 days → act
 * now; within 180 days → plan a cleaning; within 365 → watch; later or beyond the forecast → good; no trend →
 * no estimate.
 */
export function fleetStatus(summary: AssessmentSummary | null, nowMs: number): FleetStatus {
  if (!summary) return "no-estimate";
  const { threshold } = summary;
  if (threshold.status === "already-crossed" || threshold.status === "broken-when-clean") return "act-now";
  if (threshold.status === "no-trend") return "no-estimate";
  const p10 = threshold.p10 ? Date.parse(threshold.p10) : null;
  if (p10 === null) return "good";
  const days = (p10 - nowMs) / DAY_MS;
  if (days <= ACT_NOW_DAYS) return "act-now";
  if (days <= PLAN_DAYS) return "plan-cleaning";
  if (days <= WATCH_DAYS) return "watch";
  return "good";
}
