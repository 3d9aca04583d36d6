import { describe, expect, it } from "vitest";
import {
  cycleIndexAt,
  cycleResistance,
  foulingHistory,
  referenceDuty,
  trueThresholdCrossing,
  type ExchangerSpec,
  type FoulingCycle,
  type SimulationPlan,
} from "../../../lib/core/simulate";
import { DAY_MS, FIXTURE_CLEANING, FIXTURE_END_MS, HOUR_MS, fixturePlan, fixtureSpec } from "./fixture-exchanger";

/** Brute force: first hourly instant from `fromMs` at which the duty at reference conditions is below the threshold. */
function scanHourly(spec: ExchangerSpec, plan: SimulationPlan, fromMs: number, horizonMs: number): number | null {
  const cycles = foulingHistory(plan.fouling, plan.cleanings);
  const cycle = cycles[cycleIndexAt(cycles, fromMs)] as FoulingCycle;
  for (let timeMs = fromMs; timeMs <= fromMs + horizonMs; timeMs += HOUR_MS) {
    if (referenceDuty(spec, plan.cleanCoefficient, cycleResistance(cycle, timeMs)) < spec.dutyThresholdW) return timeMs;
  }
  return null;
}

describe("trueThresholdCrossing", () => {
  const spec = fixtureSpec();
  const plan = fixturePlan();

  it("agrees with an hourly brute-force scan", () => {
    const crossing = trueThresholdCrossing(spec, plan, FIXTURE_END_MS);
    const scanned = scanHourly(spec, plan, FIXTURE_END_MS, 3 * 365 * DAY_MS);
    expect(crossing).not.toBeNull();
    expect(scanned).not.toBeNull();
    // The scan finds the first whole hour below the threshold, so the exact crossing lies in the hour before it.
    expect(crossing as number).toBeLessThanOrEqual(scanned as number);
    expect(crossing as number).toBeGreaterThan((scanned as number) - HOUR_MS);
    const cycles = foulingHistory(plan.fouling, plan.cleanings);
    const cycle = cycles[cycles.length - 1] as FoulingCycle;
    // Bisection tolerance 1 s: just before the crossing the duty is still at or above the threshold.
    expect(referenceDuty(spec, plan.cleanCoefficient, cycleResistance(cycle, (crossing as number) - 1000))).toBeGreaterThanOrEqual(spec.dutyThresholdW);
    expect(referenceDuty(spec, plan.cleanCoefficient, cycleResistance(cycle, crossing as number))).toBeLessThan(spec.dutyThresholdW);
  });

  it("continues the current cycle and ignores cleanings planned after fromMs", () => {
    const beforeCleaning = FIXTURE_CLEANING.startMs - 10 * DAY_MS;
    const withoutCleaning: SimulationPlan = { ...plan, cleanings: [], fouling: { ...plan.fouling, cycles: plan.fouling.cycles.slice(0, 1) } };
    expect(trueThresholdCrossing(spec, plan, beforeCleaning)).toBe(trueThresholdCrossing(spec, withoutCleaning, beforeCleaning));
  });

  it("returns null when the fouling levels off above the threshold duty", () => {
    const mild: SimulationPlan = {
      ...plan,
      fouling: { ...plan.fouling, cycles: [plan.fouling.cycles[0] as SimulationPlan["fouling"]["cycles"][number], { kind: "asymptotic", asymptoteM2KPerW: 1e-5, timeConstantS: 1e6 }] },
    };
    expect(trueThresholdCrossing(spec, mild, FIXTURE_END_MS)).toBeNull();
  });

  it("returns an instant at or before fromMs when the exchanger is already below its threshold", () => {
    const strict: ExchangerSpec = { ...spec, dutyThresholdW: referenceDuty(spec, plan.cleanCoefficient, 0) * 0.999 };
    const crossing = trueThresholdCrossing(strict, plan, FIXTURE_END_MS);
    expect(crossing).not.toBeNull();
    expect(crossing as number).toBeLessThanOrEqual(FIXTURE_END_MS);
    expect(crossing as number).toBeGreaterThanOrEqual(FIXTURE_CLEANING.startMs);
  });
});
