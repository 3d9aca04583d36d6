import { describe, expect, it } from "vitest";
import { caoRhinehartRStatistic, R_STATISTIC_DEFAULTS } from "../../../lib/core/screening";
import { seededRandom } from "../../../lib/core/simulate";

const MINUTE_MS = 60_000;

function times(count: number, stepMs = MINUTE_MS): Float64Array {
  return Float64Array.from({ length: count }, (_, index) => index * stepMs);
}

function whiteNoise(seed: number, count: number, mean: number, sigma: number): Float64Array {
  const random = seededRandom(seed);
  return Float64Array.from({ length: count }, () => mean + sigma * random.normal());
}

describe("caoRhinehartRStatistic", () => {
  it("uses the published filter factors by default", () => {
    // FIELD-NOTES §6 [V] (ddss/IdentificacaoEE:PP_Rstatistics.m): λ1 = 0.2, λ2 = λ3 = 0.1
    expect(R_STATISTIC_DEFAULTS).toMatchObject({ meanFilter: 0.2, varianceFilter: 0.1, differenceFilter: 0.1 });
  });

  it("averages about 1 on white noise, for several seeds", () => {
    for (const seed of [11, 12, 13]) {
      const statistic = caoRhinehartRStatistic(whiteNoise(seed, 50_000, 350, 0.4), times(50_000));
      const finite = Array.from(statistic).filter(Number.isFinite);
      const mean = finite.reduce((sum, value) => sum + value, 0) / finite.length;
      // FIELD-NOTES §6 [C]: E[R] ≈ 1 for white noise (ratio of the expectations, var(x − x̄) = 2σ²/(2 − λ1)); the mean
      // of the ratio sits about 4 % higher (Jensen's inequality; simulation with known truth gives 1.036–1.041 on
      // 100 000 samples), so the tolerance is [0.98, 1.10]
      expect(mean).toBeGreaterThan(0.98);
      expect(mean).toBeLessThan(1.1);
      const steadyShare = finite.filter((value) => value < 2).length / finite.length;
      // simulation with known truth: R < 2 for about 99.7 % of white-noise samples; at least 99 % asserted
      expect(steadyShare).toBeGreaterThan(0.99);
    }
  });

  it("rises far above 2 on a ramp and after a step", () => {
    const noise = whiteNoise(21, 400, 0, 0.2);
    const ramp = noise.map((value, index) => 400 + value + 0.4 * index);
    const rampStatistic = caoRhinehartRStatistic(ramp, times(400));
    // derived from the filters (FIELD-NOTES §6): on a ramp of slope s the filtered value lags by s(1 − λ1)/λ1, so
    // R → (2 − λ1)·(((1 − λ1)/λ1)²s² + 2σ²/(2 − λ1))/(s² + 2σ²) ≈ 19.5 for s = 2σ; asserted R > 10
    expect(rampStatistic[399]).toBeGreaterThan(10);
    const step = noise.map((value, index) => 400 + value + (index >= 200 ? 5 : 0));
    const stepStatistic = caoRhinehartRStatistic(step, times(400));
    const afterStep = Array.from(stepStatistic.slice(200, 230));
    // simulation with known truth: after a pure step of 25 σ, δ² takes the jump at once while ν² builds up as x̄ lags,
    // so R peaks near 5 a few samples later and stays above 2 for about 10 samples; asserted peak > 4, ≥ 5 samples > 2
    expect(Math.max(...afterStep)).toBeGreaterThan(4);
    expect(afterStep.filter((value) => value > 2).length).toBeGreaterThanOrEqual(5);
    // simulation with known truth: 100 samples after the step the filters have forgotten it (R back below 2)
    expect(stepStatistic[399]).toBeLessThan(2);
  });

  it("marks missing samples NaN, repeats the last value over skipped samples, and restarts after a gap", () => {
    const values = whiteNoise(31, 60, 300, 0.3);
    values[30] = Number.NaN;
    const skip = new Uint8Array(60);
    skip[40] = 1;
    const time = times(60);
    for (let index = 50; index < 60; index += 1) time[index] = (time[index] as number) + 10 * MINUTE_MS;
    const statistic = caoRhinehartRStatistic(values, time, { skip });
    // definition: warm-up of round(1/λ3) = 10 updates after the first sample gives NaN
    expect(Number.isNaN(statistic[9] as number)).toBe(true);
    expect(Number.isFinite(statistic[11] as number)).toBe(true);
    expect(Number.isNaN(statistic[30] as number)).toBe(true);
    expect(statistic[40]).toBe(statistic[39]);
    // definition: a gap of 11 steps (> 3) restarts the filters, so the 10 samples after it are in warm-up again
    expect(Array.from(statistic.slice(50, 60)).every(Number.isNaN)).toBe(true);
  });

  it("gives 0 for a perfectly constant signal and leaves its inputs unchanged", () => {
    const values = new Float64Array(30).fill(5);
    const time = times(30);
    const copy = Float64Array.from(values);
    const statistic = caoRhinehartRStatistic(values, time);
    // definition: ν² = δ² = 0 → R reported as 0 (steady)
    expect(statistic[29]).toBe(0);
    expect(values).toEqual(copy);
  });

  it("rejects filter factors outside (0, 1]", () => {
    expect(() => caoRhinehartRStatistic(new Float64Array(3), times(3), { meanFilter: 0 })).toThrow("filter factor λ1 must be in (0, 1], got 0");
    expect(() => caoRhinehartRStatistic(new Float64Array(3), times(2))).toThrow("values and timeMs must have the same length");
  });
});
