import { describe, expect, it } from "vitest";
import { inMonth, monthContaining, monthsWithData, nextMonth, previousMonth, reportMonth } from "../../lib/report/report-month";

const AMSTERDAM = "Europe/Amsterdam";

describe("reportMonth", () => {
  it("opens and closes the month at local midnight of the site", () => {
    const november = reportMonth("2026-11", AMSTERDAM);
    // IANA tz database: Europe/Amsterdam is UTC+1 (CET) from 2026-10-25 to 2027-03-28, so local midnight is 23:00 UTC the day before
    expect(new Date(november.startMs).toISOString()).toBe("2026-10-31T23:00:00.000Z");
    expect(new Date(november.endMs).toISOString()).toBe("2026-11-30T23:00:00.000Z");
    expect(november.label).toBe("November 2026");
  });

  it("puts 2026-10-31T23:30Z in November in Amsterdam but in October in UTC", () => {
    const instant = Date.parse("2026-10-31T23:30:00Z");
    expect(inMonth(instant, reportMonth("2026-11", AMSTERDAM))).toBe(true);
    expect(inMonth(instant, reportMonth("2026-10", AMSTERDAM))).toBe(false);
    expect(inMonth(instant, reportMonth("2026-10", "UTC"))).toBe(true);
    expect(monthContaining(instant, AMSTERDAM).key).toBe("2026-11");
  });

  it("gives October 2026 its extra hour of the change to winter time", () => {
    const october = reportMonth("2026-10", AMSTERDAM);
    // 31 days plus the hour repeated on 2026-10-25 (CEST → CET)
    expect(october.endMs - october.startMs).toBe((31 * 24 + 1) * 3_600_000);
  });

  it("steps across year ends", () => {
    expect(previousMonth(reportMonth("2026-01", AMSTERDAM)).key).toBe("2025-12");
    expect(nextMonth(reportMonth("2026-12", AMSTERDAM)).key).toBe("2027-01");
    expect(nextMonth(reportMonth("2026-12", AMSTERDAM)).startMs).toBe(reportMonth("2026-12", AMSTERDAM).endMs);
  });

  it("refuses a malformed month", () => {
    expect(() => reportMonth("2026-13", AMSTERDAM)).toThrow('month must be YYYY-MM, got "2026-13"');
    expect(() => reportMonth("2026-1", AMSTERDAM)).toThrow("month must be YYYY-MM");
  });
});

describe("monthsWithData", () => {
  it("lists the demo span newest first and marks only whole months complete", () => {
    // demo data: daily UTC periods from 2024-09-01 to the end of 2026-11-30
    const months = monthsWithData(Date.parse("2024-09-01T00:00:00Z"), Date.parse("2026-12-01T00:00:00Z"), AMSTERDAM);
    expect(months[0]?.month.key).toBe("2026-11");
    expect(months[0]?.complete).toBe(true);
    expect(months.at(-1)?.month.key).toBe("2024-09");
    // 2024-09 through 2026-11: 4 + 12 + 11 months
    expect(months).toHaveLength(27);
  });

  it("marks a month whose data stop half-way as incomplete", () => {
    const months = monthsWithData(Date.parse("2026-09-01T00:00:00Z"), Date.parse("2026-11-15T00:00:00Z"), AMSTERDAM);
    expect(months.map((entry) => [entry.month.key, entry.complete])).toEqual([
      ["2026-11", false],
      ["2026-10", true],
      ["2026-09", true],
    ]);
  });
});

describe("monthsWithData at the edges", () => {
  it("leaves out a month the UTC daily data reach by only the zone offset", () => {
    // data to 2026-12-01T00:00Z reach 01:00 on 1 December in Amsterdam; data from 2024-09-01T00:00Z start at 02:00 local
    const months = monthsWithData(Date.parse("2024-09-01T00:00:00Z"), Date.parse("2026-12-01T00:00:00Z"), "Europe/Amsterdam");
    expect(months.some((entry) => entry.month.key === "2026-12" || entry.month.key === "2024-08")).toBe(false);
    // New York (UTC−5 in winter): the UTC day 2026-11-30 ends at 19:00 local, so November misses five hours and still counts whole
    const newYork = monthsWithData(Date.parse("2024-09-01T00:00:00Z"), Date.parse("2026-12-01T00:00:00Z"), "America/New_York");
    expect(newYork[0]).toMatchObject({ month: { key: "2026-11" }, complete: true });
    // the data start at 20:00 on 31 August in New York: August is left out, September is whole
    expect(newYork.at(-1)).toMatchObject({ month: { key: "2024-09" }, complete: true });
  });
});
