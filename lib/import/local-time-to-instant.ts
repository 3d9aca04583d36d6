// Local wall-clock time in an IANA zone -> instant, with daylight-saving gaps and repeated hours made explicit.
import { zoneOffsetMinutes } from "./zone-offset";

const MINUTE_MS = 60_000;
const DAY_MS = 86_400_000;

export type LocalTimeResolution =
  | { kind: "unique"; ms: number }
  /** The wall time occurs twice (clocks put back): two instants, earlier one first. */
  | { kind: "ambiguous"; earlierMs: number; laterMs: number }
  /** The wall time never occurs (clocks put forward over it). */
  | { kind: "nonexistent" };

/**
 * Finds the instants whose local time in `zone` is the wall-clock time `wallMs` (the wall time's fields read as
 * if they were UTC, i.e. Date.UTC(year, month - 1, day, hour, minute, second, ms)).
 *
 * Method: an instant t shows wall time w when t = w − offset(t). The offsets in force a day before and a day
 * after w (and at w) are the only candidates (zones change offset far less often than daily), and a candidate
 * offset o is kept when offset(w − o) = o. No kept offset: the time falls in a gap; two: it is repeated.
 * Unlike `new TZDate(...)` of @date-fns/tz, which moves a gap time forward and picks one of a repeated hour's
 * instants silently, this reports both cases so the import can say what it did.
 */
export function localTimeToInstant(wallMs: number, zone: string): LocalTimeResolution {
  const offsets = new Set([
    zoneOffsetMinutes(zone, wallMs - DAY_MS),
    zoneOffsetMinutes(zone, wallMs),
    zoneOffsetMinutes(zone, wallMs + DAY_MS),
  ]);
  const instants: number[] = [];
  for (const offset of offsets) {
    const candidate = wallMs - offset * MINUTE_MS;
    if (zoneOffsetMinutes(zone, candidate) === offset && !instants.includes(candidate)) instants.push(candidate);
  }
  instants.sort((a, b) => a - b);
  const [first, second] = instants;
  if (first === undefined) return { kind: "nonexistent" };
  if (second === undefined) return { kind: "unique", ms: first };
  return { kind: "ambiguous", earlierMs: first, laterMs: second };
}
