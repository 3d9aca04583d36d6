import { describe, expect, it } from "vitest";
import { fitOverallCoefficientModel, predictOverallCoefficient } from "../../../lib/core/faults";
import { seededRandom } from "../../../lib/core/simulate";

const DAY_MS = 86_400_000;

describe("fitOverallCoefficientModel", () => {
  it("recovers a known flow- and time-dependent U from noisy points and predicts it a few days ahead", () => {
    // simulation with known truth: 1/U = 0.0008 + 0.006·m_h^−0.8 + 0.01·m_c^−0.8 + 2e-6·days
    const truth = (mh: number, mc: number, days: number) => 1 / (0.0008 + 0.006 * mh ** -0.8 + 0.01 * mc ** -0.8 + 2e-6 * days);
    const random = seededRandom(9);
    const count = 336;
    const timeMs: number[] = [];
    const hot: number[] = [];
    const cold: number[] = [];
    const u: number[] = [];
    for (let index = 0; index < count; index += 1) {
      const mh = 10 * (1 + 0.1 * random.normal());
      const mc = 20 * (1 + 0.1 * random.normal());
      timeMs.push(index * 3_600_000);
      hot.push(mh);
      cold.push(mc);
      u.push(truth(mh, mc, index / 24) * (1 + 0.01 * random.normal()) * (index === 100 ? 1.5 : 1));
    }
    const model = fitOverallCoefficientModel({ timeMs, hotFlowKgPerS: hot, coldFlowKgPerS: cold, uWPerM2K: u });
    if (model === null) throw new Error("no model");
    // simulation with known truth: the 1 % noise shows as the robust residual spread (the 50 % outlier is trimmed)
    expect(model.relativeResidualStandardDeviation).toBeGreaterThan(0.007);
    expect(model.relativeResidualStandardDeviation).toBeLessThan(0.013);
    expect(model.count).toBe(count - 1);
    const lastMs = timeMs[count - 1] as number;
    for (const [mh, mc] of [
      [10, 20],
      [11, 18],
      [9, 22],
    ] as const) {
      const predicted = predictOverallCoefficient(model, mh, mc, lastMs + 3 * DAY_MS);
      // simulation with known truth: 3 days past the window, inside the flow range, within 1 %
      expect(predicted / truth(mh, mc, count / 24 + 3)).toBeCloseTo(1, 2);
    }
    expect(model.hotCoefficient).toBeGreaterThanOrEqual(0);
    expect(model.timeCoefficient).toBeGreaterThanOrEqual(0);
  });

  it("keeps the coefficients non-negative when the flows move together, and needs 8 points", () => {
    const random = seededRandom(10);
    const timeMs: number[] = [];
    const hot: number[] = [];
    const cold: number[] = [];
    const u: number[] = [];
    for (let index = 0; index < 200; index += 1) {
      const throughput = 1 + 0.1 * random.normal();
      timeMs.push(index * 3_600_000);
      hot.push(10 * throughput);
      cold.push(20 * throughput * (1 + 0.002 * random.normal()));
      u.push(400 * (1 + 0.02 * random.normal()));
    }
    const model = fitOverallCoefficientModel({ timeMs, hotFlowKgPerS: hot, coldFlowKgPerS: cold, uWPerM2K: u });
    // physics: film resistances and the fouling rate are not negative
    expect(model?.hotCoefficient).toBeGreaterThanOrEqual(0);
    expect(model?.coldCoefficient).toBeGreaterThanOrEqual(0);
    expect(model?.timeCoefficient).toBeGreaterThanOrEqual(0);
    expect(fitOverallCoefficientModel({ timeMs: [0], hotFlowKgPerS: [1], coldFlowKgPerS: [1], uWPerM2K: [1] })).toBeNull();
  });
});
