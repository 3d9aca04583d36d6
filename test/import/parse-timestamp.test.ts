import { TZDate } from "@date-fns/tz";
import { describe, expect, it } from "vitest";
import { detectTimestampFormat } from "../../lib/import/detect-timestamp-format";
import { formatInstant } from "../../lib/import/format-instant";
import { localTimeToInstant } from "../../lib/import/local-time-to-instant";
import { parseTimestamp } from "../../lib/import/parse-timestamp";
import { isValidTimeZone, zoneOffsetMinutes } from "../../lib/import/zone-offset";

const AMSTERDAM = "Europe/Amsterdam";

function instant(result: ReturnType<typeof parseTimestamp>): string {
  if (result.kind !== "instant") throw new Error(`expected an instant, got ${JSON.stringify(result)}`);
  return new Date(result.ms).toISOString();
}

describe("parseTimestamp", () => {
  it("reads ISO 8601 with Z or an offset exactly, ignoring the time zone", () => {
    // ISO 8601-1:2019 §4.3.13/4.3.14: Z is UTC, ±hh:mm is the offset from UTC (local = UTC + offset)
    expect(instant(parseTimestamp("2026-03-01T10:00:00Z", "iso", AMSTERDAM))).toBe("2026-03-01T10:00:00.000Z");
    expect(instant(parseTimestamp("2026-03-01T10:00+01:00", "iso", "America/New_York"))).toBe("2026-03-01T09:00:00.000Z");
    expect(instant(parseTimestamp("2026-03-01 10:00:30.25-0530", "iso", AMSTERDAM))).toBe("2026-03-01T15:30:30.250Z");
  });

  it("reads ISO 8601 without an offset as local time in the zone", () => {
    // Europe/Amsterdam is UTC+1 in winter (CET) and UTC+2 in summer (CEST): IANA tz database, europe file
    expect(instant(parseTimestamp("2026-01-15T10:00", "iso", AMSTERDAM))).toBe("2026-01-15T09:00:00.000Z");
    expect(instant(parseTimestamp("2026-07-15T10:00:00", "iso", AMSTERDAM))).toBe("2026-07-15T08:00:00.000Z");
    // a date alone is midnight local time (documented in lib/import/timestamp-formats.ts)
    expect(instant(parseTimestamp("2026-01-15", "iso", AMSTERDAM))).toBe("2026-01-14T23:00:00.000Z");
  });

  it("reads the day-first, month-first, dotted and year-first local formats, with or without seconds", () => {
    // CET = UTC+1 on 1 March 2026 (IANA tz database)
    expect(instant(parseTimestamp("01/03/2026 10:00", "DD/MM/YYYY HH:mm[:ss]", AMSTERDAM))).toBe("2026-03-01T09:00:00.000Z");
    expect(instant(parseTimestamp("03/01/2026 10:00:15", "MM/DD/YYYY HH:mm[:ss]", AMSTERDAM))).toBe("2026-03-01T09:00:15.000Z");
    expect(instant(parseTimestamp("1.3.2026 9:05", "DD.MM.YYYY HH:mm[:ss]", AMSTERDAM))).toBe("2026-03-01T08:05:00.000Z");
    expect(instant(parseTimestamp("2026-3-1 09:05:01.5", "YYYY-MM-DD HH:mm[:ss]", "UTC"))).toBe("2026-03-01T09:05:01.500Z");
  });

  it("reads epoch seconds and milliseconds as UTC", () => {
    // 1772359200 s after 1970-01-01T00:00Z is 2026-03-01T10:00Z (date -u -d @1772359200)
    expect(instant(parseTimestamp("1772359200", "epoch-seconds", AMSTERDAM))).toBe("2026-03-01T10:00:00.000Z");
    expect(instant(parseTimestamp("1772359200.125", "epoch-seconds", AMSTERDAM))).toBe("2026-03-01T10:00:00.125Z");
    expect(instant(parseTimestamp("1772359200123", "epoch-ms", AMSTERDAM))).toBe("2026-03-01T10:00:00.123Z");
  });

  it("says which format a timestamp does not match", () => {
    // message format from the issue: timestamp "…" does not match <format>
    expect(parseTimestamp("2026-13-01 10:00", "DD/MM/YYYY HH:mm[:ss]", AMSTERDAM)).toEqual({
      kind: "invalid",
      reason: 'timestamp "2026-13-01 10:00" does not match DD/MM/YYYY HH:mm[:ss]',
    });
    expect(parseTimestamp("   ", "iso", AMSTERDAM)).toEqual({ kind: "invalid", reason: "timestamp is empty" });
  });

  it("names the field of a date that does not exist", () => {
    // 2026 is not a leap year (Gregorian rule: divisible by 4, not by 100 unless by 400), so February has 28 days
    expect(parseTimestamp("29/02/2026 10:00", "DD/MM/YYYY HH:mm[:ss]", AMSTERDAM)).toEqual({
      kind: "invalid",
      reason: 'timestamp "29/02/2026 10:00" is not a valid date and time: day 29 does not exist in February 2026',
    });
    expect(parseTimestamp("2026-13-01 10:00", "YYYY-MM-DD HH:mm[:ss]", AMSTERDAM)).toMatchObject({ reason: expect.stringContaining("month 13 does not exist") });
    expect(parseTimestamp("2026-03-01 24:00", "YYYY-MM-DD HH:mm[:ss]", AMSTERDAM)).toMatchObject({ reason: expect.stringContaining("hour 24 does not exist") });
  });

  it("rejects a local time in the spring-forward gap: 2026-03-29 02:30 does not exist in Europe/Amsterdam", () => {
    // EU summer time (Directive 2000/84/EC): clocks go from 02:00 CET to 03:00 CEST at 01:00 UTC on the last Sunday of March
    expect(parseTimestamp("2026-03-29 02:30", "YYYY-MM-DD HH:mm[:ss]", AMSTERDAM)).toEqual({
      kind: "invalid",
      reason: 'timestamp "2026-03-29 02:30" does not exist in Europe/Amsterdam: the clocks were put forward over this time (daylight saving)',
    });
    // the minutes either side exist: 01:59 CET = 00:59Z, 03:00 CEST = 01:00Z (same directive)
    expect(instant(parseTimestamp("2026-03-29 01:59", "YYYY-MM-DD HH:mm[:ss]", AMSTERDAM))).toBe("2026-03-29T00:59:00.000Z");
    expect(instant(parseTimestamp("2026-03-29 03:00", "YYYY-MM-DD HH:mm[:ss]", AMSTERDAM))).toBe("2026-03-29T01:00:00.000Z");
  });

  it("returns both instants of a repeated local time: 2026-10-25 02:30 in Europe/Amsterdam", () => {
    // EU summer time ends at 01:00 UTC on the last Sunday of October (Directive 2000/84/EC): 02:30 occurs at
    // 00:30Z (CEST, UTC+2) and again at 01:30Z (CET, UTC+1); the earlier one comes first
    expect(parseTimestamp("25.10.2026 02:30", "DD.MM.YYYY HH:mm[:ss]", AMSTERDAM)).toEqual({
      kind: "ambiguous",
      earlierMs: Date.UTC(2026, 9, 25, 0, 30),
      laterMs: Date.UTC(2026, 9, 25, 1, 30),
    });
  });

  it("refuses instants outside the years 1900–2199", () => {
    // documented range (lib/import/parse-timestamp.ts); 1e11 s after 1970 is in the year 5138
    expect(parseTimestamp("100000000000", "epoch-seconds", "UTC")).toMatchObject({ kind: "invalid", reason: expect.stringContaining("outside the supported years 1900–2199") });
  });
});

describe("localTimeToInstant", () => {
  it("agrees with TZDate of @date-fns/tz for every hour of 2026 that is neither skipped nor repeated", () => {
    // reference library: new TZDate(y, m, d, h, 0, 0, 0, zone).getTime()
    for (let hour = 0; hour < 365 * 24; hour += 7) {
      const wall = Date.UTC(2026, 0, 1) + hour * 3_600_000;
      const fields = new Date(wall);
      const expected = new TZDate(fields.getUTCFullYear(), fields.getUTCMonth(), fields.getUTCDate(), fields.getUTCHours(), 0, 0, 0, AMSTERDAM).getTime();
      const resolved = localTimeToInstant(wall, AMSTERDAM);
      if (resolved.kind === "unique") expect(resolved.ms).toBe(expected);
    }
  });

  it("finds nothing in the gap and two instants in the repeated hour, and one instant in a zone without daylight saving", () => {
    // EU rules as above; Asia/Kolkata is UTC+05:30 all year (IANA tz database, asia file)
    expect(localTimeToInstant(Date.UTC(2026, 2, 29, 2, 30), AMSTERDAM)).toEqual({ kind: "nonexistent" });
    expect(localTimeToInstant(Date.UTC(2026, 9, 25, 2, 59), AMSTERDAM)).toMatchObject({ kind: "ambiguous" });
    expect(localTimeToInstant(Date.UTC(2026, 9, 25, 3, 0), AMSTERDAM)).toEqual({ kind: "unique", ms: Date.UTC(2026, 9, 25, 2, 0) });
    expect(localTimeToInstant(Date.UTC(2026, 9, 25, 2, 30), "Asia/Kolkata")).toEqual({ kind: "unique", ms: Date.UTC(2026, 9, 24, 21, 0) });
  });
});

describe("zoneOffsetMinutes", () => {
  it("gives the offset on both sides of a change, also from its hourly cache", () => {
    // EU summer time starts at 01:00 UTC on 2026-03-29 (Directive 2000/84/EC): +60 before, +120 from then on
    for (let pass = 0; pass < 2; pass++) {
      expect(zoneOffsetMinutes(AMSTERDAM, Date.UTC(2026, 2, 29, 0, 59, 59, 999))).toBe(60);
      expect(zoneOffsetMinutes(AMSTERDAM, Date.UTC(2026, 2, 29, 1, 0))).toBe(120);
    }
  });

  it("knows IANA names and refuses made-up ones", () => {
    // IANA tz database zone names
    expect(isValidTimeZone("Europe/Amsterdam")).toBe(true);
    expect(isValidTimeZone("UTC")).toBe(true);
    expect(isValidTimeZone("Mars/Olympus_Mons")).toBe(false);
    expect(isValidTimeZone("")).toBe(false);
  });
});

describe("detectTimestampFormat", () => {
  it("picks the format that reads the first rows", () => {
    // each example is written in the named format (lib/import/timestamp-formats.ts)
    expect(detectTimestampFormat(["2026-03-01T10:00:00Z", "2026-03-01T10:01:00Z"], "UTC")).toEqual({ ok: true, format: "iso" });
    expect(detectTimestampFormat(["01.03.2026 10:00", "01.03.2026 10:01"], "UTC")).toEqual({ ok: true, format: "DD.MM.YYYY HH:mm[:ss]" });
    expect(detectTimestampFormat(["12/03/2026 10:00", "13/03/2026 10:00"], "UTC")).toEqual({ ok: true, format: "DD/MM/YYYY HH:mm[:ss]" });
    expect(detectTimestampFormat(["03/12/2026 10:00", "03/13/2026 10:00"], "UTC")).toEqual({ ok: true, format: "MM/DD/YYYY HH:mm[:ss]" });
    expect(detectTimestampFormat(["1772359200", "1772359260"], "UTC")).toEqual({ ok: true, format: "epoch-seconds" });
    expect(detectTimestampFormat(["1772359200000", "1772359260000"], "UTC")).toEqual({ ok: true, format: "epoch-ms" });
  });

  it("refuses to guess between day-first and month-first", () => {
    // "01/03/2026" is 1 March (day first) or 3 January (month first)
    expect(detectTimestampFormat(["01/03/2026 10:00", "02/03/2026 10:00"], "UTC")).toEqual({
      ok: false,
      message: 'timestamps such as "01/03/2026 10:00", "02/03/2026 10:00" can be read as DD/MM/YYYY or as MM/DD/YYYY; give the timestamp format',
    });
  });

  it("refuses cells that no format reads", () => {
    const result = detectTimestampFormat(["yesterday", "today"], "UTC");
    expect(result.ok).toBe(false);
    expect(result.ok ? "" : result.message).toContain('timestamps such as "yesterday", "today" match none of the formats');
  });
});

describe("formatInstant", () => {
  it("shows minutes, seconds or milliseconds only as far as they are set", () => {
    // ISO 8601 reduced precision
    expect(formatInstant(Date.UTC(2026, 2, 1, 10))).toBe("2026-03-01T10:00Z");
    expect(formatInstant(Date.UTC(2026, 2, 1, 10, 0, 5))).toBe("2026-03-01T10:00:05Z");
    expect(formatInstant(Date.UTC(2026, 2, 1, 10, 0, 5, 250))).toBe("2026-03-01T10:00:05.250Z");
  });
});
