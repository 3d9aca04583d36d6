import { describe, expect, it } from "vitest";
import {
  assetCostTable,
  buildPlanningInstance,
  chargedOutageDays,
  cleaningSpacingWeeks,
  occupiedWeekCount,
  scheduleCost,
  weekOfInstant,
} from "../../../lib/core/plan";
import { referenceScheduleCost } from "./exhaustive-schedule";
import { DAY, linearAsset, START_MS, unitEconomics } from "./linear-asset";

describe("week arithmetic", () => {
  it("counts occupied weeks, spacing and the week of an instant", () => {
    // definitions: ceil(d/7) weeks, at least one; spacing ceil((d + m)/7); week = floor(Δt / 7 days)
    expect([occupiedWeekCount(0.5), occupiedWeekCount(7), occupiedWeekCount(7.5), occupiedWeekCount(14)]).toEqual([1, 1, 2, 2]);
    expect([cleaningSpacingWeeks(3, 0), cleaningSpacingWeeks(3, 60), cleaningSpacingWeeks(10, 4)]).toEqual([1, 9, 2]);
    expect([weekOfInstant(START_MS, START_MS), weekOfInstant(START_MS, START_MS + 7 * DAY - 1), weekOfInstant(START_MS, START_MS - 1)]).toEqual([0, 0, -1]);
  });

  it("charges only the outage days outside turnarounds, counting overlapping windows once", () => {
    // interval arithmetic with two identical windows over week 2 (days 14–21): a 10-day outage from day 14 has 7 days
    // covered and 3 charged; from day 7 (days 7–17) days 14–17 are covered and 7 charged
    const windows = [
      { name: "TA", firstWeek: 2, lastWeek: 2 },
      { name: "TA-overlap", firstWeek: 2, lastWeek: 2 },
    ];
    expect(chargedOutageDays(2, 10, windows)).toBe(3);
    expect(chargedOutageDays(1, 10, windows)).toBe(7);
    expect(chargedOutageDays(5, 4, windows)).toBe(4);
    expect(chargedOutageDays(2, 4, windows)).toBe(0);
  });
});

describe("assetCostTable", () => {
  // c = a·t with a = 50 per day², cleaning 122 500, 1-day outage (linear-asset.ts)
  const horizon = { startMs: START_MS, weeks: 12 };

  it("integrates the running and the new cycle in closed form", () => {
    // calculus: ∫ a·t dt from a0 to a0 + 7w = a·((a0 + 7w)² − a0²)/2, here a0 = 20 d (last cleaning 20 days before);
    // new cycle after a 1-day outage: ∫₀^(7g − 1) a·t dt = a·(7g − 1)²/2
    const asset = linearAsset("101", { lastReturnToServiceMs: START_MS - 20 * DAY });
    const { costs } = assetCostTable(asset, { horizon, turnarounds: [], endOfHorizon: "none" });
    for (const week of [0, 1, 5, 12]) {
      expect(costs.currentCycle[week]).toBeCloseTo((50 * ((20 + 7 * week) ** 2 - 400)) / 2, 6);
    }
    for (const gap of [1, 4, 12]) expect(costs.newCycle[gap]).toBeCloseTo((50 * (7 * gap - 1) ** 2) / 2, 6);
    expect(costs.newCycle[0]).toBe(0);
    expect(costs.event.every((cost) => cost === 122_500)).toBe(true);
    expect(costs.currentEndCharge).toBe(0);
    expect(costs.newEndCharge.every((charge) => charge === 0)).toBe(true);
  });

  it("waives outage costs inside a turnaround", () => {
    // cleaningEventCost: 122500 + 1 day × 20000 outside the turnaround, 122500 inside it
    const asset = linearAsset("101", { economics: unitEconomics(122_500, 1, 20_000) });
    const { costs } = assetCostTable(asset, { horizon, turnarounds: [{ name: "TA", firstWeek: 4, lastWeek: 5 }], endOfHorizon: "none" });
    expect(costs.event[3]).toBe(142_500);
    expect(costs.event[4]).toBe(122_500);
    expect(costs.event[5]).toBe(122_500);
    expect(costs.event[6]).toBe(142_500);
  });

  it("charges the end of the horizon with the relative value and credits an unfinished outage", () => {
    // relativeCycleValue: h(s) = C + ∫ₛ^τ* (c − J*) dt − J*·τd for s < τ*; h(0) = 0; an outage still running at the
    // horizon end is credited −J* per remaining day (FIELD-NOTES §5 model with downtime)
    const asset = linearAsset("101");
    const { costs, steady } = assetCostTable(asset, { horizon, turnarounds: [], endOfHorizon: "steady-cycle" });
    expect(steady.status).toBe("optimum");
    expect(costs.newEndCharge[0]).toBeCloseTo(-steady.averageCostPerDay * 1, 6);
    const s = 7 * 3 - 1;
    const expected =
      steady.eventCost + (50 * (steady.intervalDays ** 2 - s * s)) / 2 - steady.averageCostPerDay * (steady.intervalDays - s) - steady.averageCostPerDay;
    expect(costs.newEndCharge[3]).toBeCloseTo(expected, 3);
  });

  it("agrees with the schedule-cost definition", () => {
    // AssetCostTable definition, written again in exhaustive-schedule.ts
    const { costs } = assetCostTable(linearAsset("101"), { horizon, turnarounds: [], endOfHorizon: "steady-cycle" });
    for (const schedule of [[], [0], [3], [11], [2, 8]]) {
      expect(scheduleCost(costs, 12, schedule)).toBeCloseTo(referenceScheduleCost(costs, 12, schedule), 9);
    }
  });
});

describe("buildPlanningInstance", () => {
  it("turns dates into earliest and deadline weeks", () => {
    // earliest: last return (day −30) + 60 days = day 30 → first week starting on or after it: week 5 (day 35);
    // deadline: P10 crossing on day 45 → week 6; a crossing already passed → week 0; past the horizon → none
    const instance = buildPlanningInstance({
      horizon: { startMs: START_MS, weeks: 12 },
      site: { crewCapacity: [1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 2], groups: [{ name: "train", assetIds: ["1", "2", "3"] }] },
      assets: [
        linearAsset("1", { lastReturnToServiceMs: START_MS - 30 * DAY, minimumDaysBetweenCleanings: 60, thresholdCrossing: { p10Ms: START_MS + 45 * DAY, p50Ms: null } }),
        linearAsset("2", { thresholdCrossing: { p10Ms: START_MS - 3 * DAY, p50Ms: START_MS + 100 * DAY } }),
        linearAsset("3", { thresholdCrossing: { p10Ms: START_MS + 200 * DAY, p50Ms: null }, excluded: true }),
      ],
    });
    expect(instance.assets.map((asset) => [asset.id, asset.earliestWeek, asset.deadlineWeek])).toEqual([
      ["1", 5, 6],
      ["2", 0, 0],
    ]);
    expect(instance.groups).toEqual([{ name: "train", assetIds: ["1", "2"] }]);
    expect(instance.crewCapacity).toHaveLength(12);
  });
});
