// Calendar arithmetic of the planner: site dates <-> planning weeks.
import { TZDate } from "@date-fns/tz";
import { DAY_MS, WEEK_MS, weekOfInstant } from "../core/plan";

/**
 * planningStartDate: the first Monday on or after the instant's calendar date in the site's time zone, as 00:00 UTC
 * of that date (the planner counts whole weeks from a calendar date, lib/core/plan).
 */
export function planningStartDate(instantMs: number, timeZone: string): number {
  const local = new TZDate(instantMs, timeZone);
  const dateMs = Date.UTC(local.getFullYear(), local.getMonth(), local.getDate());
  const weekday = new Date(dateMs).getUTCDay(); // 0 Sunday … 6 Saturday
  const daysToMonday = (8 - weekday) % 7;
  return dateMs + daysToMonday * DAY_MS;
}

/** The Monday (00:00 UTC of the date) of the planning week that contains a calendar date. */
export function weekStartOfDate(horizonStartMs: number, dateMs: number): number {
  return horizonStartMs + weekOfInstant(horizonStartMs, dateMs) * WEEK_MS;
}

/**
 * weeksOfDateRange: the planning weeks (0..weeks−1) that an inclusive range of calendar dates touches; empty when the
 * range lies outside the horizon.
 */
export function weeksOfDateRange(horizonStartMs: number, weeks: number, firstDateMs: number, lastDateMs: number): number[] {
  const first = Math.max(0, weekOfInstant(horizonStartMs, firstDateMs));
  const last = Math.min(weeks - 1, weekOfInstant(horizonStartMs, lastDateMs));
  const result: number[] = [];
  for (let week = first; week <= last; week += 1) result.push(week);
  return result;
}

/** A calendar date as YYYY-MM-DD (the UTC date of a @db.Date value or of a planning week start). */
export function isoDate(dateMs: number): string {
  return new Date(dateMs).toISOString().slice(0, 10);
}

/** Parses YYYY-MM-DD to 00:00 UTC of that date; null when it is not a real calendar date. */
export function parseIsoDate(text: string): number | null {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text.trim());
  if (!match) return null;
  const ms = Date.UTC(Number(match[1]), Number(match[2]) - 1, Number(match[3]));
  return isoDate(ms) === text.trim() ? ms : null;
}
