import fc from "fast-check";
import highsLoader, { type Highs } from "highs";
import { beforeAll, describe, expect, it } from "vitest";
import { explainSolution, individuallyBestSchedule, solvePlanningInstance } from "../../../lib/core/plan";
import { referenceScheduleCost } from "./exhaustive-schedule";
import { instanceArbitrary } from "./instance-arbitrary";

let highs: Highs;
beforeAll(async () => {
  highs = await highsLoader();
});

describe("explainSolution", () => {
  it("explains every departure from the individually best schedule by a constraint at an exact optimum", () => {
    // optimality argument: a move to a week no constraint blocks would be feasible, so at a proven optimum (gap 0) it
    // cannot be cheaper; hence no "optimality-gap", no cheaper feasible alternative, and a blocker for every missed
    // deadline (a free week up to the deadline would lower the number of misses)
    fc.assert(
      fc.property(instanceArbitrary({ maximumAssets: 8, maximumWeeks: 12, maximumTwoCleaningAssets: 2 }), (instance) => {
        const solution = solvePlanningInstance(highs, instance, { relativeGap: 0 });
        const outcomes = explainSolution(instance, solution);
        for (const outcome of outcomes) {
          const same =
            outcome.startWeeks.length === outcome.individuallyBestWeeks.length &&
            outcome.startWeeks.every((week, index) => week === outcome.individuallyBestWeeks[index]);
          expect(outcome.bindingConstraints.length === 0).toBe(same);
          expect(outcome.bindingConstraints.map((constraint) => constraint.kind)).not.toContain("optimality-gap");
          if (outcome.alternative) expect(outcome.alternative.costIncrease).toBeGreaterThanOrEqual(-1e-9);
          expect(outcome.savingVsNoCleaning).toBeCloseTo(outcome.noCleaningCost - outcome.planCost, 9);
        }
        for (const violation of solution.violations) {
          if (violation.kind === "deadline") expect(violation.blockedBy.length).toBeGreaterThan(0);
        }
      }),
      { seed: 41, numRuns: 120 },
    );
  });
});

describe("individuallyBestSchedule", () => {
  it("finds the cheapest schedule of a lone asset by dynamic programming", () => {
    // exhaustive enumeration of the asset's schedules (count and spacing only) against the dynamic programme
    fc.assert(
      fc.property(instanceArbitrary({ maximumAssets: 1, maximumWeeks: 10, maximumTwoCleaningAssets: 1, costShape: "convex" }), (instance) => {
        const asset = instance.assets[0];
        if (!asset) return;
        const weeks = instance.weeks;
        let best = referenceScheduleCost(asset.costs, weeks, []);
        for (let first = 0; first < weeks; first += 1) {
          best = Math.min(best, referenceScheduleCost(asset.costs, weeks, [first]));
          if (asset.maximumCleanings < 2) continue;
          for (let second = first + asset.spacingWeeks; second < weeks; second += 1) {
            best = Math.min(best, referenceScheduleCost(asset.costs, weeks, [first, second]));
          }
        }
        expect(individuallyBestSchedule(asset, weeks).cost).toBeCloseTo(best, 9);
      }),
      { seed: 5, numRuns: 200 },
    );
  });
});
