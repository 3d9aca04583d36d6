import { describe, expect, it } from "vitest";
import type { AssessmentSummary } from "../../lib/planning/assessment-summary";
import { fleetStatus } from "../../lib/planning/fleet-status";

const NOW = Date.UTC(2026, 11, 1);
const DAY = 86_400_000;
function summary(status: string, p10DaysAhead: number | null): AssessmentSummary {
  const p10 = p10DaysAhead === null ? null : new Date(NOW + p10DaysAhead * DAY).toISOString();
  return {
    asOf: new Date(NOW).toISOString(), currentUWPerM2K: 300, percentOfClean: 80, foulingM2KPerW: 5e-4, cleanDutyW: 1e6, dutyLossW: 1e5,
    threshold: { status, p10, p50: p10, p90: p10, crossedAt: null }, trendModel: "linear", economics: null, economicsNote: null, sparkline: [],
  };
}

describe("fleetStatus (categories of our own; lead times 30/180/365 days are our choice, common practice)", () => {
  it("puts a crossed threshold and a P10 date within 30 days under act now", () => {
    expect(fleetStatus(summary("already-crossed", null), NOW)).toBe("act-now");
    expect(fleetStatus(summary("ahead", 30), NOW)).toBe("act-now");
  });
  it("grades later P10 dates by the lead time left", () => {
    expect(fleetStatus(summary("ahead", 31), NOW)).toBe("plan-cleaning");
    expect(fleetStatus(summary("ahead", 180), NOW)).toBe("plan-cleaning");
    expect(fleetStatus(summary("ahead", 181), NOW)).toBe("watch");
    expect(fleetStatus(summary("ahead", 366), NOW)).toBe("good");
    expect(fleetStatus(summary("beyond-horizon", null), NOW)).toBe("good");
  });
  it("says no estimate without a trend or an assessment", () => {
    expect(fleetStatus(summary("no-trend", null), NOW)).toBe("no-estimate");
    expect(fleetStatus(null, NOW)).toBe("no-estimate");
  });
});
