import fc from "fast-check";
import type { AssetCostTable, InstanceAsset, PlanningInstance } from "../../../lib/core/plan";

/** Bounds of a random planning instance. */
export interface InstanceBounds {
  maximumAssets: number;
  maximumWeeks: number;
  /** Most assets allowed two cleanings. */
  maximumTwoCleaningAssets: number;
  /**
   * "random": every cost drawn independently (any real table is valid for the solver); "convex": fouling costs that
   * grow with the square of the cycle age and cheap events, so that schedules with two cleanings are common.
   */
  costShape?: "random" | "convex";
}

const money = fc.integer({ min: -2_000, max: 20_000 }).map((value) => value / 8);

function randomCostTable(weeks: number): fc.Arbitrary<AssetCostTable> {
  return fc.record({
    currentCycle: fc.array(money, { minLength: weeks + 1, maxLength: weeks + 1 }),
    currentEndCharge: money,
    event: fc.array(money, { minLength: weeks, maxLength: weeks }),
    newCycle: fc.array(money, { minLength: weeks + 1, maxLength: weeks + 1 }),
    newEndCharge: fc.array(money, { minLength: weeks + 1, maxLength: weeks + 1 }),
  });
}

function convexCostTable(weeks: number): fc.Arbitrary<AssetCostTable> {
  return fc
    .record({
      rate: fc.integer({ min: 5, max: 100 }),
      age: fc.integer({ min: 0, max: 6 }),
      event: fc.array(fc.integer({ min: 0, max: 1600 }).map((value) => value / 8), { minLength: weeks, maxLength: weeks }),
      endCharge: fc.array(money, { minLength: weeks + 2, maxLength: weeks + 2 }),
    })
    .map(({ rate, age, event, endCharge }) => ({
      currentCycle: Array.from({ length: weeks + 1 }, (_, week) => rate * ((week + age) ** 2 - age ** 2)),
      currentEndCharge: endCharge[weeks + 1] as number,
      event,
      newCycle: Array.from({ length: weeks + 1 }, (_, gap) => rate * gap * gap),
      newEndCharge: endCharge.slice(0, weeks + 1).map((value) => value / 10),
    }));
}

function asset(id: string, weeks: number, twoCleanings: boolean, costShape: "random" | "convex"): fc.Arbitrary<InstanceAsset> {
  return fc
    .record({
      durationWeeks: fc.integer({ min: 1, max: 2 }),
      earliestWeek: fc.oneof(fc.constant(0), fc.integer({ min: 0, max: weeks })),
      deadlineWeek: fc.oneof(fc.constant(null), fc.constant(null), fc.integer({ min: 0, max: weeks - 1 })),
      extraSpacing: fc.integer({ min: 0, max: 2 }),
      lock: fc.oneof(fc.constant(null), fc.constant(null), fc.constant(null), fc.integer({ min: 0, max: weeks - 1 })),
      costs: costShape === "convex" ? convexCostTable(weeks) : randomCostTable(weeks),
    })
    .map((drawn) => ({
      id,
      durationWeeks: drawn.durationWeeks,
      earliestWeek: drawn.earliestWeek,
      deadlineWeek: drawn.deadlineWeek,
      maximumCleanings: twoCleanings ? 2 : 1,
      spacingWeeks: drawn.durationWeeks + drawn.extraSpacing,
      lockedWeeks: drawn.lock === null ? [] : [drawn.lock],
      costs: drawn.costs,
    }));
}

/** Random small fleets: capacities, blackouts, groups, locks, deadlines and cost tables (any real costs). */
export function instanceArbitrary(bounds: InstanceBounds): fc.Arbitrary<PlanningInstance> {
  return fc
    .record({
      weeks: fc.integer({ min: 2, max: bounds.maximumWeeks }),
      assetCount: fc.integer({ min: 1, max: bounds.maximumAssets }),
      twoCleaningCount: fc.integer({ min: 0, max: bounds.maximumTwoCleaningAssets }),
    })
    .chain(({ weeks, assetCount, twoCleaningCount }) => {
      const ids = Array.from({ length: assetCount }, (_, index) => `A${index}`);
      return fc.record({
        weeks: fc.constant(weeks),
        crewCapacity: fc.array(fc.integer({ min: 0, max: 3 }), { minLength: weeks, maxLength: weeks }),
        blackoutWeeks: fc.uniqueArray(fc.integer({ min: 0, max: weeks - 1 }), { maxLength: Math.max(1, Math.floor(weeks / 3)) }),
        groups:
          ids.length < 2
            ? fc.constant([])
            : fc
                .array(
                  fc.record({
                    name: fc.constantFrom("train", "bypass"),
                    assetIds: fc.uniqueArray(fc.constantFrom(...ids), { minLength: 2, maxLength: Math.min(3, ids.length) }),
                  }),
                  { maxLength: 2 },
                )
                .map((groups) => groups.map((group, index) => ({ ...group, name: `${group.name}-${index}` }))),
        assets: fc.tuple(...ids.map((id, index) => asset(id, weeks, index < twoCleaningCount, bounds.costShape ?? "random"))),
      });
    });
}
