// Calendar months in a site's time zone: the period a monthly report covers.
import { TZDate } from "@date-fns/tz";

/** One calendar month of a site: [startMs, endMs) are the local midnights that open it and the next month. */
export interface ReportMonth {
  /** YYYY-MM */
  key: string;
  year: number;
  /** 1..12 */
  month: number;
  timeZone: string;
  startMs: number;
  endMs: number;
  /** e.g. "November 2026" */
  label: string;
}

const MONTH_PATTERN = /^(\d{4})-(0[1-9]|1[0-2])$/;
const MONTH_NAMES = ["January", "February", "March", "April", "May", "June", "July", "August", "September", "October", "November", "December"];

/** Whether text is a month key YYYY-MM (01..12). */
export function isMonthKey(text: string): boolean {
  return MONTH_PATTERN.test(text);
}

function monthOf(year: number, month: number, timeZone: string): ReportMonth {
  const startMs = new TZDate(year, month - 1, 1, timeZone).getTime();
  const next = month === 12 ? { year: year + 1, month: 1 } : { year, month: month + 1 };
  const endMs = new TZDate(next.year, next.month - 1, 1, timeZone).getTime();
  return { key: `${year}-${String(month).padStart(2, "0")}`, year, month, timeZone, startMs, endMs, label: `${MONTH_NAMES[month - 1]} ${year}` };
}

/**
 * reportMonth: the month YYYY-MM in the site's time zone, from local midnight of its first day to local midnight of
 * the next month's first day (so 2026-10-31T23:30Z is in November 2026 in Europe/Amsterdam, UTC+1 then).
 *
 * @throws RangeError when the key is not YYYY-MM
 */
export function reportMonth(key: string, timeZone: string): ReportMonth {
  const match = MONTH_PATTERN.exec(key);
  if (!match) throw new RangeError(`month must be YYYY-MM, got "${key}"`);
  return monthOf(Number(match[1]), Number(match[2]), timeZone);
}

/** The month before. */
export function previousMonth(month: ReportMonth): ReportMonth {
  return month.month === 1 ? monthOf(month.year - 1, 12, month.timeZone) : monthOf(month.year, month.month - 1, month.timeZone);
}

/** The month after. */
export function nextMonth(month: ReportMonth): ReportMonth {
  return month.month === 12 ? monthOf(month.year + 1, 1, month.timeZone) : monthOf(month.year, month.month + 1, month.timeZone);
}

/** The month that contains an instant, in the time zone. */
export function monthContaining(instantMs: number, timeZone: string): ReportMonth {
  const local = new TZDate(instantMs, timeZone);
  return monthOf(local.getFullYear(), local.getMonth() + 1, timeZone);
}

/** Whether an instant lies in the month. */
export function inMonth(instantMs: number, month: ReportMonth): boolean {
  return instantMs >= month.startMs && instantMs < month.endMs;
}

/** Largest distance of any zone from UTC (UTC+14, Line Islands; IANA tz database), ms. */
export const LARGEST_UTC_OFFSET_MS = 14 * 3_600_000;

/**
 * monthsWithData: every month that the data span, newest first, each marked complete when the data cover it from
 * start to end. Daily periods are UTC days, which straddle local midnight, so a month the data reach by no more than
 * `toleranceMs` is not listed, and one that misses no more than `toleranceMs` at either end counts as complete.
 *
 * @param firstMs first instant covered by data
 * @param dataEndMs end of the data (end of the last period)
 * @param toleranceMs default LARGEST_UTC_OFFSET_MS
 */
export function monthsWithData(firstMs: number, dataEndMs: number, timeZone: string, toleranceMs = LARGEST_UTC_OFFSET_MS): { month: ReportMonth; complete: boolean }[] {
  const result: { month: ReportMonth; complete: boolean }[] = [];
  if (!(dataEndMs > firstMs)) return result;
  let month = monthContaining(dataEndMs - 1, timeZone);
  if (dataEndMs - month.startMs <= toleranceMs && month.startMs > firstMs) month = previousMonth(month);
  while (month.endMs > firstMs) {
    if (month.endMs - firstMs <= toleranceMs && month.endMs < dataEndMs) break;
    result.push({ month, complete: firstMs <= month.startMs + toleranceMs && dataEndMs >= month.endMs - toleranceMs });
    month = previousMonth(month);
  }
  return result;
}
