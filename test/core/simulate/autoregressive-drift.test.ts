import { describe, expect, it } from "vitest";
import { autoregressiveDrift, seededRandom } from "../../../lib/core/simulate";

describe("autoregressiveDrift", () => {
  it("keeps the stated standard deviation and its lag-one correlation exp(-Δt/τ)", () => {
    const next = autoregressiveDrift(seededRandom(3), { standardDeviation: 2, correlationHours: 10 }, 3_600_000);
    const count = 200_000;
    const values = Array.from({ length: count }, () => next());
    const mean = values.reduce((sum, value) => sum + value, 0) / count;
    const variance = values.reduce((sum, value) => sum + (value - mean) ** 2, 0) / count;
    let lagProduct = 0;
    for (let index = 1; index < count; index += 1) lagProduct += ((values[index] as number) - mean) * ((values[index - 1] as number) - mean);
    const lagCorrelation = lagProduct / (count - 1) / variance;
    // AR(1) stationary variance σ² and lag-one autocorrelation φ = exp(-1/10) = 0.904837 (textbook AR(1)).
    // With φ = 0.905 the effective sample size is n(1-φ)/(1+φ) ≈ 1e4, so the sd estimate is good to about 1 %;
    // 5 % tolerance on the sd, 0.01 on the correlation.
    expect(Math.abs(Math.sqrt(variance) / 2 - 1)).toBeLessThan(0.05);
    expect(Math.abs(lagCorrelation - Math.exp(-0.1))).toBeLessThan(0.01);
  });
});
