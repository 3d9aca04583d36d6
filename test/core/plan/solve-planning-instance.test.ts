import fc from "fast-check";
import highsLoader, { type Highs } from "highs";
import { beforeAll, describe, expect, it } from "vitest";
import { solvePlanningInstance, type PlanningInstance } from "../../../lib/core/plan";
import { checkSchedule } from "./check-schedule";
import { exhaustiveSchedule, referenceLateness } from "./exhaustive-schedule";
import { instanceArbitrary } from "./instance-arbitrary";

let highs: Highs;
beforeAll(async () => {
  highs = await highsLoader();
});

const EXACT = { relativeGap: 0, timeLimitSeconds: 20 };

describe("solvePlanningInstance", () => {
  it("matches an exhaustive search on small fleets (≤ 5 assets × ≤ 8 weeks)", () => {
    // exhaustive search: least (missed deadlines, weeks late, cost) over every joint schedule; cost to 1e-9 relative;
    // half the runs force branch and cut instead of accepting the LP rounding
    fc.assert(
      fc.property(instanceArbitrary({ maximumAssets: 5, maximumWeeks: 8, maximumTwoCleaningAssets: 1 }), fc.boolean(), (instance, lpRounding) => {
        const solution = solvePlanningInstance(highs, instance, { ...EXACT, lpRounding });
        const reference = exhaustiveSchedule(instance);
        expect(reference).not.toBeNull();
        if (!reference) return;
        let missed = 0;
        let weeksLate = 0;
        for (const asset of instance.assets) {
          const [assetMissed, assetWeeksLate] = referenceLateness(asset.deadlineWeek, instance.weeks, solution.startWeeks[asset.id] ?? []);
          missed += assetMissed;
          weeksLate += assetWeeksLate;
        }
        expect(solution.status).toBe("optimal");
        expect([missed, weeksLate]).toEqual([reference.missed, reference.weeksLate]);
        expect(Math.abs(solution.solver.objective - reference.cost)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(reference.cost)));
      }),
      { seed: 20_250_601, numRuns: 150 },
    );
  });

  it("matches an exhaustive search when several assets may be cleaned twice", () => {
    // exhaustive search, as above, with convex fouling costs and cheap events so that two cleanings are frequent
    fc.assert(
      fc.property(
        instanceArbitrary({ maximumAssets: 3, maximumWeeks: 8, maximumTwoCleaningAssets: 3, costShape: "convex" }),
        fc.boolean(),
        (instance, lpRounding) => {
          const solution = solvePlanningInstance(highs, instance, { ...EXACT, lpRounding });
          const reference = exhaustiveSchedule(instance);
          if (!reference) throw new Error("the exhaustive search always finds a schedule (no cleaning is allowed)");
          expect(Math.abs(solution.solver.objective - reference.cost)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(reference.cost)));
        },
      ),
      { seed: 99, numRuns: 100 },
    );
  });

  it("never breaks a constraint without reporting it on random fleets", () => {
    // independent checker written from the specification (check-schedule.ts)
    fc.assert(
      fc.property(
        fc
          .constantFrom("random" as const, "convex" as const)
          .chain((costShape) => instanceArbitrary({ maximumAssets: 12, maximumWeeks: 16, maximumTwoCleaningAssets: 4, costShape })),
        fc.boolean(),
        (instance, lpRounding) => {
        const solution = solvePlanningInstance(highs, instance, { relativeGap: 1e-6, timeLimitSeconds: 20, lpRounding });
        expect(solution.status).not.toBe("no-solution");
        expect(checkSchedule(instance, solution)).toEqual([]);
        },
      ),
      { seed: 7, numRuns: 300 },
    );
  });
});
