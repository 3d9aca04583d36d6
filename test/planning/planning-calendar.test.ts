import { describe, expect, it } from "vitest";
import { isoDate, parseIsoDate, planningStartDate, weekStartOfDate, weeksOfDateRange } from "../../lib/planning/planning-calendar";

describe("planningStartDate", () => {
  it("starts on the first Monday on or after the site's calendar date", () => {
    // 2026-12-01 is a Tuesday (ISO 8601 calendar; checked with `date -d 2026-12-01 +%A`)
    expect(isoDate(planningStartDate(Date.UTC(2026, 11, 1, 12), "Europe/Amsterdam"))).toBe("2026-12-07");
    // a Monday starts the horizon itself
    expect(isoDate(planningStartDate(Date.UTC(2026, 11, 7, 9), "Europe/Amsterdam"))).toBe("2026-12-07");
  });

  it("reads the date in the site's time zone, not in UTC", () => {
    // 2026-12-06T23:30Z is already Monday 00:30 in Amsterdam (UTC+1 in winter, IANA tz database)
    expect(isoDate(planningStartDate(Date.UTC(2026, 11, 6, 23, 30), "Europe/Amsterdam"))).toBe("2026-12-07");
    // ... but still Sunday in New York (UTC−5), so its next Monday is the same day
    expect(isoDate(planningStartDate(Date.UTC(2026, 11, 6, 23, 30), "America/New_York"))).toBe("2026-12-07");
    // 2026-12-07T03:00Z is Sunday 22:00 in New York: the horizon starts on Monday the 7th
    expect(isoDate(planningStartDate(Date.UTC(2026, 11, 7, 3), "America/New_York"))).toBe("2026-12-07");
    // 2026-12-07T23:30Z is Tuesday in Amsterdam: next Monday
    expect(isoDate(planningStartDate(Date.UTC(2026, 11, 7, 23, 30), "Europe/Amsterdam"))).toBe("2026-12-14");
  });
});

describe("week arithmetic", () => {
  const start = Date.UTC(2026, 11, 7);
  it("maps a date to the Monday of its planning week", () => {
    expect(isoDate(weekStartOfDate(start, Date.UTC(2027, 0, 1)))).toBe("2026-12-28");
    expect(isoDate(weekStartOfDate(start, Date.UTC(2026, 11, 13)))).toBe("2026-12-07");
  });
  it("lists the weeks an inclusive date range touches, clipped to the horizon", () => {
    expect(weeksOfDateRange(start, 52, Date.UTC(2026, 11, 19), Date.UTC(2027, 0, 3))).toEqual([1, 2, 3]);
    expect(weeksOfDateRange(start, 52, Date.UTC(2026, 10, 1), Date.UTC(2026, 11, 8))).toEqual([0]);
    expect(weeksOfDateRange(start, 2, Date.UTC(2027, 5, 1), Date.UTC(2027, 5, 5))).toEqual([]);
  });
  it("parses only real calendar dates", () => {
    expect(parseIsoDate("2027-02-28")).toBe(Date.UTC(2027, 1, 28));
    expect(parseIsoDate("2027-02-29")).toBeNull(); // 2027 is not a leap year (Gregorian rule)
    expect(parseIsoDate("28/02/2027")).toBeNull();
  });
});
