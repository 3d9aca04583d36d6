import highsLoader from "highs";
import { describe, expect, it } from "vitest";
import { planCleanings, planToCsv, planToICalendar, type PlanInput } from "../../../lib/core/plan";
import { deepFreeze } from "../economics/support";
import { linearAsset, START_MS } from "./linear-asset";

describe("purity of the planner", () => {
  it("plans from frozen input without mutating it and repeats its answer", async () => {
    // STYLE.md: tests freeze inputs to prove purity; solver seconds are the only field allowed to differ
    const highs = await highsLoader();
    const build = (): PlanInput => ({
      horizon: { startMs: START_MS, weeks: 16 },
      site: { crewCapacity: 1, blackoutWeeks: [3], turnarounds: [{ name: "TA", firstWeek: 12, lastWeek: 13 }], groups: [{ name: "g", assetIds: ["1", "2"] }] },
      assets: [linearAsset("1"), linearAsset("2", { lockedWeeks: [5] }), linearAsset("3")],
    });
    const frozen = deepFreeze(build());
    const withoutTimes = (plan: ReturnType<typeof planCleanings>) => ({
      ...plan,
      solver: { ...plan.solver, solveSeconds: 0, phases: plan.solver.phases.map((phase) => ({ ...phase, seconds: 0 })) },
    });
    const first = planCleanings(highs, frozen, { relativeGap: 0 });
    expect(withoutTimes(planCleanings(highs, build(), { relativeGap: 0 }))).toEqual(withoutTimes(first));
    const frozenPlan = deepFreeze(first);
    expect(planToCsv(frozenPlan)).toBe(planToCsv(frozenPlan));
    expect(planToICalendar(frozenPlan, { dtstampMs: 0, uidDomain: "x" })).toBe(planToICalendar(frozenPlan, { dtstampMs: 0, uidDomain: "x" }));
  });
});
