// One timestamp cell -> instant (epoch ms), in one of TIMESTAMP_FORMATS.
import { localTimeToInstant } from "./local-time-to-instant";
import { quoteCell } from "./quote-cell";
import type { ConcreteTimestampFormat } from "./timestamp-formats";

export type TimestampResult =
  | { kind: "instant"; ms: number }
  /** A local time in a repeated hour (clocks put back); the caller chooses (see chooseInstant in convert-row). */
  | { kind: "ambiguous"; earlierMs: number; laterMs: number }
  | { kind: "invalid"; reason: string };

/** Earliest and latest accepted instant: 1900-01-01T00:00Z and 2200-01-01T00:00Z (exclusive). */
export const EARLIEST_TIME_MS = Date.UTC(1900, 0, 1);
export const LATEST_TIME_MS = Date.UTC(2200, 0, 1);

const TIME = String.raw`(?:[T ](\d{1,2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,9}))?)?)?`;
const OFFSET = String.raw`(?:\s*(Z|z|UTC|GMT|[+-]\d{2}(?::?\d{2})?))?`;
const ISO = new RegExp(String.raw`^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,9}))?)?${OFFSET})?$`);
const YEAR_FIRST = new RegExp(String.raw`^(\d{4})-(\d{1,2})-(\d{1,2})${TIME}$`);
const SLASHED = new RegExp(String.raw`^(\d{1,2})/(\d{1,2})/(\d{4})${TIME}$`);
const DOTTED = new RegExp(String.raw`^(\d{1,2})\.(\d{1,2})\.(\d{4})${TIME}$`);
const EPOCH = /^[+-]?\d+(?:[.,]\d+)?$/;

const MONTHS = ["January", "February", "March", "April", "May", "June", "July", "August", "September", "October", "November", "December"];

interface WallClock {
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
  second: number;
  millisecond: number;
}

function fractionToMilliseconds(fraction: string | undefined): number {
  if (!fraction) return 0;
  return Math.round(Number(`0.${fraction}`) * 1000);
}

function wallClock(year: string, month: string, day: string, hour?: string, minute?: string, second?: string, fraction?: string): WallClock {
  return {
    year: Number(year),
    month: Number(month),
    day: Number(day),
    hour: Number(hour ?? 0),
    minute: Number(minute ?? 0),
    second: Number(second ?? 0),
    millisecond: fractionToMilliseconds(fraction),
  };
}

/** The wall time as milliseconds (fields read as UTC), or why the fields are not a date and time. */
function wallMilliseconds(clock: WallClock): number | string {
  const { year, month, day, hour, minute, second, millisecond } = clock;
  if (month < 1 || month > 12) return `month ${month} does not exist`;
  const daysInMonth = new Date(Date.UTC(year, month, 0)).getUTCDate();
  if (day < 1 || day > daysInMonth) return `day ${day} does not exist in ${MONTHS[month - 1]} ${year}`;
  if (hour > 23) return `hour ${hour} does not exist`;
  if (minute > 59) return `minute ${minute} does not exist`;
  if (second > 59) return `second ${second} does not exist`;
  return Date.UTC(year, month - 1, day, hour, minute, second, millisecond);
}

function offsetMinutes(text: string): number | null {
  if (/^(Z|z|UTC|GMT)$/.test(text)) return 0;
  const sign = text.startsWith("-") ? -1 : 1;
  const digits = text.slice(1).replace(":", "");
  const hours = Number(digits.slice(0, 2));
  const minutes = digits.length > 2 ? Number(digits.slice(2, 4)) : 0;
  if (hours > 23 || minutes > 59) return null;
  return sign * (hours * 60 + minutes);
}

function inRange(ms: number, text: string): TimestampResult {
  if (ms < EARLIEST_TIME_MS || ms >= LATEST_TIME_MS) {
    return { kind: "invalid", reason: `timestamp ${quoteCell(text)} is outside the supported years 1900–2199` };
  }
  return { kind: "instant", ms };
}

function local(clock: WallClock, text: string, zone: string): TimestampResult {
  const wall = wallMilliseconds(clock);
  if (typeof wall === "string") return { kind: "invalid", reason: `timestamp ${quoteCell(text)} is not a valid date and time: ${wall}` };
  const resolution = localTimeToInstant(wall, zone);
  if (resolution.kind === "nonexistent") {
    return {
      kind: "invalid",
      reason: `timestamp ${quoteCell(text)} does not exist in ${zone}: the clocks were put forward over this time (daylight saving)`,
    };
  }
  if (resolution.kind === "ambiguous") {
    const first = inRange(resolution.earlierMs, text);
    return first.kind === "invalid" ? first : { kind: "ambiguous", earlierMs: resolution.earlierMs, laterMs: resolution.laterMs };
  }
  return inRange(resolution.ms, text);
}

/**
 * Reads a timestamp cell in `format`. Local formats (and ISO without an offset) are read in `zone` (IANA, must be
 * valid); an ISO time with Z or ±HH:MM is exact and ignores the zone; epoch formats count from 1970-01-01T00:00Z.
 * A local time that does not exist (clocks put forward) is invalid with that reason; one that occurs twice
 * (clocks put back) is returned as "ambiguous" with both instants.
 *
 * @example parseTimestamp("29.03.2026 02:30", "DD.MM.YYYY HH:mm[:ss]", "Europe/Amsterdam") // invalid: does not exist
 */
export function parseTimestamp(cell: string, format: ConcreteTimestampFormat, zone: string): TimestampResult {
  const text = cell.trim();
  if (text === "") return { kind: "invalid", reason: "timestamp is empty" };
  const mismatch = (): TimestampResult => ({ kind: "invalid", reason: `timestamp ${quoteCell(text)} does not match ${format}` });
  switch (format) {
    case "iso": {
      const match = ISO.exec(text);
      if (!match) return mismatch();
      const [, year = "", month = "", day = "", hour, minute, second, fraction, offset] = match;
      const clock = wallClock(year, month, day, hour, minute, second, fraction);
      if (offset === undefined) return local(clock, text, zone);
      const wall = wallMilliseconds(clock);
      if (typeof wall === "string") return { kind: "invalid", reason: `timestamp ${quoteCell(text)} is not a valid date and time: ${wall}` };
      const minutes = offsetMinutes(offset);
      if (minutes === null) return { kind: "invalid", reason: `timestamp ${quoteCell(text)} has an impossible UTC offset "${offset}"` };
      return inRange(wall - minutes * 60_000, text);
    }
    case "YYYY-MM-DD HH:mm[:ss]": {
      const match = YEAR_FIRST.exec(text);
      if (!match) return mismatch();
      const [, year = "", month = "", day = "", hour, minute, second, fraction] = match;
      return local(wallClock(year, month, day, hour, minute, second, fraction), text, zone);
    }
    case "DD/MM/YYYY HH:mm[:ss]":
    case "MM/DD/YYYY HH:mm[:ss]": {
      const match = SLASHED.exec(text);
      if (!match) return mismatch();
      const [, first = "", second = "", year = "", hour, minute, seconds, fraction] = match;
      const [day, month] = format === "DD/MM/YYYY HH:mm[:ss]" ? [first, second] : [second, first];
      return local(wallClock(year, month, day, hour, minute, seconds, fraction), text, zone);
    }
    case "DD.MM.YYYY HH:mm[:ss]": {
      const match = DOTTED.exec(text);
      if (!match) return mismatch();
      const [, day = "", month = "", year = "", hour, minute, second, fraction] = match;
      return local(wallClock(year, month, day, hour, minute, second, fraction), text, zone);
    }
    case "epoch-seconds":
    case "epoch-ms": {
      if (!EPOCH.test(text)) return mismatch();
      const value = Number(text.replace(",", "."));
      const ms = Math.round(format === "epoch-seconds" ? value * 1000 : value);
      return inRange(ms, text);
    }
  }
}
