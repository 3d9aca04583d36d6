import highsLoader, { type Highs } from "highs";
import { beforeAll, describe, expect, it } from "vitest";
import {
  comparePlans,
  locksFromPlan,
  planCleanings,
  PlanInputError,
  replanWithLocks,
  whatIfPlan,
  type PlanInput,
} from "../../../lib/core/plan";
import { DAY, linearAsset, START_MS, unitEconomics } from "./linear-asset";

let highs: Highs;
beforeAll(async () => {
  highs = await highsLoader();
});

const EXACT = { relativeGap: 0 };

function input(assets: PlanInput["assets"], site: Partial<PlanInput["site"]> = {}, weeks = 16): PlanInput {
  return { horizon: { startMs: START_MS, weeks }, site: { crewCapacity: 5, ...site }, assets };
}

describe("planCleanings", () => {
  it("cleans a lone asset in the week nearest its steady optimum τ* with the steady-cycle end charge", () => {
    // FIELD-NOTES §5 closed form with downtime: τ* = −1 + sqrt(1 + 2·122500/50) = 69.007 d; with the end charge the
    // plan cost is ∫₀^t (c − J*) dt + constant, smallest at t = τ*, so week 10 (day 70) beats week 9 (day 63)
    const plan = planCleanings(highs, input([linearAsset("101")]), EXACT);
    expect(plan.status).toBe("optimal");
    expect(plan.cleanings.map((cleaning) => cleaning.startWeek)).toEqual([10]);
    expect(plan.assets[0]?.bindingConstraints).toEqual([]);
    expect(plan.assets[0]?.individuallyBestWeeks).toEqual([10]);
    expect(plan.cleanings[0]?.startMs).toBe(START_MS + 70 * DAY);
    expect(plan.cleanings[0]?.returnMs).toBe(START_MS + 71 * DAY);
    expect(plan.totals.saving).toBeGreaterThan(0);
  });

  it("cleans in mid-horizon without the end charge (the horizon effect)", () => {
    // calculus: without an end charge the two partial cycles balance, c(t) = c(T − t − d) → t = (112 − 1)/2 = 55.5 d,
    // nearest week start 56 d = week 8
    const plan = planCleanings(highs, input([linearAsset("101")]), { ...EXACT, endOfHorizon: "none" });
    expect(plan.cleanings.map((cleaning) => cleaning.startWeek)).toEqual([8]);
  });

  it("moves one of two assets off a full crew week and names the crew as the reason", () => {
    // quadratic cost about τ* = 69.007 d: week 9 (63 d) is nearer than week 11 (77 d), so the second asset goes to 9
    const plan = planCleanings(highs, input([linearAsset("101"), linearAsset("102")], { crewCapacity: 1 }), EXACT);
    expect(plan.cleanings.map((cleaning) => cleaning.startWeek).sort()).toEqual([10, 9].sort());
    const moved = plan.assets.find((outcome) => outcome.startWeeks[0] === 9);
    expect(moved?.bindingConstraints).toEqual([{ kind: "crew-capacity", week: 10 }]);
    expect(moved?.alternative?.week).toBe(11);
    expect(moved?.alternative?.costIncrease).toBeGreaterThan(0);
  });

  it("keeps two exchangers of one train apart and names the group", () => {
    // group rule (at most one member out per week); week 9 is the nearer neighbour of τ* = 69.007 d (as above)
    const plan = planCleanings(
      highs,
      input([linearAsset("101"), linearAsset("102")], { groups: [{ name: "train A", assetIds: ["101", "102"] }] }),
      EXACT,
    );
    const moved = plan.assets.find((outcome) => outcome.startWeeks[0] !== 10);
    expect(moved?.startWeeks).toEqual([9]);
    expect(moved?.bindingConstraints).toEqual([
      { kind: "group-conflict", week: 10, group: "train A", assetIds: [plan.assets.find((o) => o.startWeeks[0] === 10)?.assetId] },
    ]);
  });

  it("avoids a blackout week", () => {
    // blackout rule; week 9 (63 d) is nearer to τ* = 69.007 d than week 11 (77 d)
    const plan = planCleanings(highs, input([linearAsset("101")], { blackoutWeeks: [10] }), EXACT);
    expect(plan.cleanings[0]?.startWeek).toBe(9);
    expect(plan.assets[0]?.bindingConstraints).toEqual([{ kind: "blackout", week: 10 }]);
  });

  it("moves a cleaning into a turnaround when the outage is expensive", () => {
    // definition of the event cost: 1 day of 200 000 lost production outside the turnaround, none inside it
    const asset = linearAsset("101", { economics: unitEconomics(122_500, 1, 200_000) });
    const plan = planCleanings(highs, input([asset], { turnarounds: [{ name: "TA-2025", firstWeek: 12, lastWeek: 12 }] }), EXACT);
    expect(plan.cleanings[0]?.startWeek).toBe(12);
    expect(plan.cleanings[0]?.window).toEqual({ kind: "turnaround", name: "TA-2025" });
    expect(plan.cleanings[0]?.chargedOutageDays).toBe(0);
  });

  it("cleans by the P10 threshold week and reports the margins", () => {
    // deadline = week containing the P10 crossing (day 45 → week 6); P50 at day 60
    const asset = linearAsset("101", { thresholdCrossing: { p10Ms: START_MS + 45 * DAY, p50Ms: START_MS + 60 * DAY } });
    const plan = planCleanings(highs, input([asset]), EXACT);
    const cleaning = plan.cleanings[0];
    expect(cleaning?.startWeek).toBe(6);
    expect(cleaning?.thresholds).toEqual([
      { quantile: "p10", crossingMs: START_MS + 45 * DAY, marginDays: 3 },
      { quantile: "p50", crossingMs: START_MS + 60 * DAY, marginDays: 18 },
    ]);
    expect(plan.assets[0]?.bindingConstraints).toEqual([{ kind: "deadline", deadlineWeek: 6 }]);
    expect(plan.violations).toEqual([]);
    // the P50 quantile moves the deadline to week 8
    expect(planCleanings(highs, input([asset]), { ...EXACT, deadlineQuantile: "p50" }).cleanings[0]?.startWeek).toBe(8);
  });

  it("reports a deadline that no crew can meet and cleans as soon as possible", () => {
    const asset = linearAsset("101", { thresholdCrossing: { p10Ms: START_MS + 45 * DAY, p50Ms: null } });
    const capacity = Array.from({ length: 16 }, (_, week) => (week <= 7 ? 0 : 1));
    const plan = planCleanings(highs, input([asset], { crewCapacity: capacity }), EXACT);
    expect(plan.status).toBe("optimal");
    expect(plan.cleanings[0]?.startWeek).toBe(8);
    expect(plan.violations).toHaveLength(1);
    expect(plan.violations[0]).toMatchObject({
      kind: "deadline",
      assetIds: ["101"],
      weeks: [6],
      blockedBy: [{ kind: "crew-capacity", week: 0 }],
      message: "E-101 misses its deadline week 6: its first cleaning is planned for week 8",
    });
    expect(plan.solver.phases.map((phase) => phase.name)).toEqual(["cost", "lateness", "cost-within-lateness"]);
  });

  it("keeps a lock, even in a blackout, and reports the conflict", () => {
    // planner rule: locks are kept as fixed and what they break is reported (docs/planner.md)
    const plan = planCleanings(highs, input([linearAsset("101", { lockedWeeks: [3] })], { blackoutWeeks: [3] }), EXACT);
    expect(plan.cleanings[0]).toMatchObject({ startWeek: 3, locked: true });
    expect(plan.assets[0]?.bindingConstraints).toEqual([{ kind: "lock" }]);
    expect(plan.violations).toEqual([
      { kind: "lock-blackout", assetIds: ["101"], weeks: [3], blockedBy: [], message: "locked cleaning of E-101 in week 3 runs in blackout week 3" },
    ]);
  });

  it("respects the minimum spacing after the last cleaning", () => {
    // earliest start: last return (day 0) + 84 days = week 12
    const plan = planCleanings(highs, input([linearAsset("101", { minimumDaysBetweenCleanings: 84 })]), EXACT);
    expect(plan.cleanings[0]?.startWeek).toBe(12);
    expect(plan.assets[0]?.bindingConstraints).toEqual([{ kind: "earliest-spacing", earliestWeek: 12 }]);
  });

  it("plans two cleanings when allowed and the horizon is long", () => {
    // a 40-week horizon spans about four steady cycles of 69 d; two cleanings beat one
    const plan = planCleanings(highs, input([linearAsset("101", { maximumCleanings: 2 })], {}, 40), EXACT);
    expect(plan.cleanings).toHaveLength(2);
    const [first, second] = plan.cleanings;
    expect((second?.startWeek ?? 0) - (first?.startWeek ?? 0)).toBeGreaterThanOrEqual(9);
  });

  it("leaves excluded assets out and rejects malformed input with the field named", () => {
    // input rules of checkPlanInput: week indices 0..W−1, whole-day UTC start, unique ids
    const plan = planCleanings(highs, input([linearAsset("101"), linearAsset("102", { excluded: true })]), EXACT);
    expect(plan.excludedAssetIds).toEqual(["102"]);
    expect(plan.assets.map((outcome) => outcome.assetId)).toEqual(["101"]);
    expect(() => planCleanings(highs, input([linearAsset("101", { lockedWeeks: [16] })]))).toThrow(
      new PlanInputError("assets[0].lockedWeeks[0]", "assets[0].lockedWeeks[0] must be a whole week index in 0..15, got 16"),
    );
    expect(() => planCleanings(highs, { ...input([]), horizon: { startMs: START_MS + 3600_000, weeks: 4 } })).toThrow(
      "horizon start must be 00:00 UTC of a date",
    );
    expect(() => planCleanings(highs, input([linearAsset("101"), linearAsset("101")]))).toThrow('asset id "101" appears more than once');
  });
});

describe("planner workflow", () => {
  const fleet = input([linearAsset("101"), linearAsset("102"), linearAsset("103")], { crewCapacity: 1 });

  it("re-plans with kept cleanings and compares the plans", () => {
    // optimality: forcing one asset to week 2 can only raise the cost of an optimal plan; keeping every cleaning
    // reproduces the plan
    const first = planCleanings(highs, fleet, EXACT);
    const moved = replanWithLocks(highs, fleet, [{ assetId: "103", startWeeks: [2] }], EXACT);
    expect(moved.cleanings.find((cleaning) => cleaning.assetId === "103")).toMatchObject({ startWeek: 2, locked: true });
    const comparison = comparePlans(first, moved);
    expect(comparison.changes.some((change) => change.assetId === "103" && change.toWeeks[0] === 2)).toBe(true);
    // a forced move cannot make an optimal plan cheaper
    expect(comparison.costDifference).toBeGreaterThanOrEqual(-1e-6);
    const kept = replanWithLocks(highs, fleet, locksFromPlan(first), EXACT);
    expect(comparePlans(first, kept).changes).toEqual([]);
    expect(() => replanWithLocks(highs, fleet, [{ assetId: "999", startWeeks: [1] }])).toThrow('cannot lock "999": no such planned asset');
  });

  it("compares a dearer fuel and an extra crew against the baseline", () => {
    // FIELD-NOTES §5: τ* = −1 + sqrt(1 + 2C/a) shrinks when the loss rate a triples (69.0 d → 39.4 d)
    const fuel = whatIfPlan(highs, input([linearAsset("101")]), { fuelPriceFactor: 3 }, EXACT);
    expect(fuel.baseline.cleanings[0]?.startWeek).toBe(10);
    expect((fuel.scenario.cleanings[0]?.startWeek ?? 99)).toBeLessThan(10);
    expect(fuel.comparison.changes[0]?.change).toBe("moved");
    // with 3 crews the three identical assets all take their best week 10, which cannot cost more
    const crews = whatIfPlan(highs, fleet, { crewCapacityDelta: 2 }, EXACT);
    expect(crews.comparison.costDifference).toBeLessThanOrEqual(1e-6);
    expect(crews.scenario.cleanings.every((cleaning) => cleaning.startWeek === 10)).toBe(true);
  });
});
