// UTC offsets of IANA time zones, from the runtime's time-zone data through @date-fns/tz, cached per hour.
import { tzOffset } from "@date-fns/tz";

const HOUR_MS = 3_600_000;
const MAX_CACHED_HOURS = 200_000;
const cache = new Map<string, Map<number, number>>();

/** True when the runtime knows the IANA time zone (e.g. "Europe/Amsterdam", "UTC"). */
export function isValidTimeZone(zone: string): boolean {
  if (zone.trim() === "") return false;
  try {
    new Intl.DateTimeFormat("en-US", { timeZone: zone });
    return true;
  } catch {
    return false;
  }
}

/**
 * UTC offset in minutes of `zone` at the instant `instantMs` (east positive: Europe/Amsterdam in summer is 120).
 * Offsets are cached per hour: an hour whose start and end have the same offset holds no change of offset
 * (zones change offset at most once within any hour), so every instant in it shares that offset; an hour with a
 * change is looked up exactly each time. The zone must be valid (see isValidTimeZone).
 */
export function zoneOffsetMinutes(zone: string, instantMs: number): number {
  const hour = Math.floor(instantMs / HOUR_MS);
  let hours = cache.get(zone);
  if (!hours) {
    hours = new Map();
    cache.set(zone, hours);
  }
  const cached = hours.get(hour);
  if (cached !== undefined) return cached;
  const atStart = tzOffset(zone, new Date(hour * HOUR_MS));
  const atEnd = tzOffset(zone, new Date(hour * HOUR_MS + HOUR_MS - 1));
  if (atStart !== atEnd) return tzOffset(zone, new Date(instantMs));
  if (hours.size >= MAX_CACHED_HOURS) hours.clear();
  hours.set(hour, atStart);
  return atStart;
}
