import { beforeAll, describe, expect, it } from "vitest";
import { assessAsset, type Assessment } from "../../../lib/core/assessment";
import { DEMO_END_MS, demoFleet, simulateDemoFleet } from "../../../lib/demo";
import { assessmentAsset, cleaningRecords, dailyPeriods } from "./demo-periods";

/**
 * Acceptance test of the fouling assessment on the 24-asset demo fleet (simulation with known truth).
 *
 * Data: the simulator's measured hourly readings, screened and averaged to days by the test helper (demo-periods.ts):
 * no data-quality module is used, and the injected instrument-fault windows of E-1105 (crude outlet drift from
 * 2026-08-10 to the end), E-2201 (effluent flow span error from 2026-09-14 to the end) and E-3104 (stuck cooling-water
 * flow meter, 2026-07-06 to 08-24) are excluded using the simulation's fault list, since fault detection is another
 * module. E-1105 and E-2201 are therefore forecast from data ending 112 and 77 days before asOf.
 * Cleaning records: each cleaning's return to service, plus the service start before the data.
 * Criteria (the "done when"): Rf at the last timestamp within 15 % or 5e-5 m²·K/W of the truth; the true
 * crossing of the duty threshold between P10 and P90; P50 within 20 % of the true remaining time. E-1108 passed its
 * threshold before the data end: "already crossed", with the crossing date held to the same 20 %. E-3106 levels off
 * below its critical fouling: no P50 within the five-year horizon.
 */
const DAY_MS = 86_400_000;
const TAGS = demoFleet().assets.map((asset) => asset.spec.tag);

interface Outcome {
  assessment: Assessment;
  trueFouling: number;
  trueCrossingMs: number | null;
  trueEffectiveness: number[];
}

const outcomes = new Map<string, Outcome>();

beforeAll(() => {
  for (const simulation of simulateDemoFleet()) {
    const assessment = assessAsset({
      asset: assessmentAsset(simulation),
      periods: dailyPeriods(simulation),
      cleanings: cleaningRecords(simulation),
      asOfMs: DEMO_END_MS,
    });
    outcomes.set(simulation.asset.spec.tag, {
      assessment,
      trueFouling: simulation.result.truth[simulation.result.truth.length - 1]?.foulingM2KPerW as number,
      trueCrossingMs: simulation.trueCrossingMs,
      trueEffectiveness: simulation.result.cleanings.map((cleaning) => cleaning.effectiveness),
    });
  }
}, 180_000);

function outcome(tag: string): Outcome {
  const value = outcomes.get(tag);
  if (value === undefined) throw new Error(`no outcome for ${tag}`);
  return value;
}

describe("assessAsset on the demo fleet (simulation with known truth)", () => {
  it("covers all 24 demo assets", () => {
    expect(TAGS).toHaveLength(24);
    expect(outcomes.size).toBe(24);
  });

  it.each(TAGS)("%s: fouling resistance at the last timestamp within 15 %% or 5e-5 m²·K/W of the truth", (tag) => {
    const { assessment, trueFouling } = outcome(tag);
    const estimate = assessment.foulingResistance.current as number;
    // the brief: 15 % relative or 5e-5 m²·K/W absolute (simulation with known truth)
    const error = Math.abs(estimate - trueFouling);
    expect(error <= 0.15 * Math.abs(trueFouling) || error <= 5e-5).toBe(true);
  });

  it.each(TAGS.filter((tag) => tag !== "E-3106"))("%s: true crossing between P10 and P90, P50 within 20 %% of the remaining time", (tag) => {
    const { assessment, trueCrossingMs } = outcome(tag);
    const duty = assessment.forecasts.duty;
    expect(trueCrossingMs).not.toBeNull();
    const truth = trueCrossingMs as number;
    // P10 and P90 null mean "beyond the horizon" on that side (never the case here for P10)
    expect(duty.p10Ms).not.toBeNull();
    expect(duty.p10Ms as number).toBeLessThanOrEqual(truth);
    expect(duty.p90Ms === null || truth <= duty.p90Ms).toBe(true);
    // the brief: |P50 − truth| ≤ 20 % of |truth − asOf|
    expect(duty.p50Ms).not.toBeNull();
    expect(Math.abs((duty.p50Ms as number) - truth)).toBeLessThanOrEqual(0.2 * Math.abs(truth - DEMO_END_MS));
    expect(duty.status).toBe(truth <= DEMO_END_MS ? "already-crossed" : "ahead");
  });

  it("reports E-1108 as already past its threshold, with the date it crossed", () => {
    // demo truth: E-1108 crossed on 2026-09-25, about two months before the data end
    const { assessment, trueCrossingMs } = outcome("E-1108");
    expect(assessment.forecasts.duty.status).toBe("already-crossed");
    expect(Math.abs((assessment.forecasts.duty.crossedAtMs as number) - (trueCrossingMs as number))).toBeLessThan(0.2 * (DEMO_END_MS - (trueCrossingMs as number)));
  });

  it("reports no crossing within the horizon for E-3106, which levels off below its critical fouling", () => {
    // demo truth: asymptote at 60 % of the critical fouling, trueCrossingMs null
    const { assessment, trueCrossingMs } = outcome("E-3106");
    expect(trueCrossingMs).toBeNull();
    expect(assessment.forecasts.duty.status).toBe("beyond-horizon");
    expect(assessment.forecasts.duty.p50).toBeNull();
  });

  it.each(TAGS)("%s: estimates each cleaning's effectiveness within 0.1 of the truth", (tag) => {
    // simulation with known truth; tolerance 0.1: the week after a cleaning already holds new growth, which biases
    // the estimate low, most for falling-rate fouling (E-2205: about 0.09)
    const { assessment, trueEffectiveness } = outcome(tag);
    const estimates = assessment.cycles.slice(0, -1).map((cycle) => cycle.effectivenessOfCleaningThatEndedIt);
    const inData = estimates.slice(estimates.length - trueEffectiveness.length);
    inData.forEach((estimate, index) => {
      expect(estimate).not.toBeNull();
      expect(Math.abs((estimate?.value as number) - (trueEffectiveness[index] as number))).toBeLessThanOrEqual(0.1);
    });
  });

  it("chooses the true fouling model for the current cycle of most assets", () => {
    // simulation with known truth: AICc picks the generating model; E-1108 (linear truth) may look asymptotic
    const fleet = demoFleet().assets;
    const matches = fleet.filter((asset) => outcome(asset.spec.tag).assessment.trend?.model === asset.plan.fouling.cycles[asset.plan.fouling.cycles.length - 1]?.kind);
    expect(matches.length).toBeGreaterThanOrEqual(22);
  });

  it("borrows a shape prior from earlier cycles whenever there are some", () => {
    for (const tag of TAGS) {
      const { assessment } = outcome(tag);
      if (assessment.cycles.length > 1) expect(assessment.trend?.priorUsed?.sourceCycles.length).toBeGreaterThan(0);
    }
  });

  it("keeps the remaining time in days consistent with the ISO dates", () => {
    const { assessment } = outcome("E-1102");
    expect(Date.parse(assessment.forecasts.duty.p50 as string)).toBe(assessment.forecasts.duty.p50Ms);
    expect(((assessment.forecasts.duty.p50Ms as number) - DEMO_END_MS) / DAY_MS).toBeGreaterThan(0);
  });
});
