/** Milliseconds in a day (UTC days have no daylight-saving shift). */
export const DAY_MS = 86_400_000;

/** Days in a planning week. */
export const DAYS_PER_WEEK = 7;

/** Milliseconds in a planning week. */
export const WEEK_MS = DAYS_PER_WEEK * DAY_MS;

/** Longest horizon accepted, weeks (two years = 104.4 weeks). */
export const MAXIMUM_HORIZON_WEEKS = 105;
