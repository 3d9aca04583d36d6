import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { foulingHistory, foulingGrowth, foulingResistanceAt, type FoulingPlan, type PlannedCleaning } from "../../../lib/core/simulate";

const DAY_MS = 86_400_000;
const START = Date.UTC(2025, 0, 1);
const LINEAR = { kind: "linear" as const, initialM2KPerW: 0, rateM2KPerWPerS: 1e-3 / (365 * 86_400) };
const ASYMPTOTIC = { kind: "asymptotic" as const, asymptoteM2KPerW: 8e-4, timeConstantS: 100 * 86_400 };

function plan(cycles: FoulingPlan["cycles"]): FoulingPlan {
  return { serviceStartMs: START, initialResistanceM2KPerW: 5e-5, cycles };
}

describe("foulingHistory", () => {
  const cleaning: PlannedCleaning = { startMs: START + 200 * DAY_MS, endMs: START + 204 * DAY_MS, effectiveness: 0.8, method: "hydroblast" };

  it("leaves (1 - effectiveness) of the fouling present when the cleaning starts", () => {
    const cycles = foulingHistory(plan([ASYMPTOTIC, LINEAR]), [cleaning]);
    const before = 5e-5 + foulingGrowth(ASYMPTOTIC, 200 * 86_400);
    expect(cycles[1]?.foulingBeforeCleaningM2KPerW).toBeCloseTo(before, 15);
    expect(cycles[1]?.residualM2KPerW).toBeCloseTo(0.2 * before, 15);
    expect(foulingResistanceAt(cycles, cleaning.startMs - 1)).toBeCloseTo(before, 12);
    expect(foulingResistanceAt(cycles, cleaning.startMs)).toBeCloseTo(0.2 * before, 15);
  });

  it("holds the residual while isolated and then continues with the next cycle's model from zero", () => {
    const cycles = foulingHistory(plan([ASYMPTOTIC, LINEAR]), [cleaning]);
    const residual = cycles[1]?.residualM2KPerW ?? Number.NaN;
    expect(foulingResistanceAt(cycles, cleaning.startMs + 2 * DAY_MS)).toBe(residual);
    const later = cleaning.endMs + 50 * DAY_MS;
    expect(foulingResistanceAt(cycles, later)).toBeCloseTo(residual + foulingGrowth(LINEAR, 50 * 86_400), 15);
  });

  it("resets by the stated effectiveness for any effectiveness in [0, 1]", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1, noNaN: true }), fc.integer({ min: 1, max: 900 }), (effectiveness, day) => {
        const startMs = START + day * DAY_MS;
        const cycles = foulingHistory(plan([ASYMPTOTIC, LINEAR]), [{ startMs, endMs: startMs + DAY_MS, effectiveness, method: "" }]);
        const before = 5e-5 + foulingGrowth(ASYMPTOTIC, day * 86_400);
        expect(foulingResistanceAt(cycles, startMs)).toBeCloseTo((1 - effectiveness) * before, 14);
      }),
    );
  });

  it("rejects inconsistent plans with a message", () => {
    expect(() => foulingHistory(plan([ASYMPTOTIC]), [cleaning])).toThrow("foulingHistory: need one fouling model per cycle (2), got 1");
    expect(() => foulingHistory(plan([ASYMPTOTIC, LINEAR]), [{ ...cleaning, effectiveness: 1.2 }])).toThrow(
      "foulingHistory: cleaning effectiveness must be in [0, 1], got 1.2",
    );
    expect(() =>
      foulingHistory(plan([ASYMPTOTIC, LINEAR, LINEAR]), [cleaning, { ...cleaning, startMs: cleaning.startMs + DAY_MS, endMs: cleaning.endMs + DAY_MS }]),
    ).toThrow("foulingHistory: cleanings must be sorted, not overlap, and start after the service start");
  });
});
