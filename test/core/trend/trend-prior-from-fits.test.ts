import { describe, expect, it } from "vitest";
import { seededRandom } from "../../../lib/core/simulate";
import { fitTrendModel, trendPriorFromFits } from "../../../lib/core/trend";

function noisy(truth: (day: number) => number, seed: number, sigma: number, days: number[]): number[] {
  const random = seededRandom(seed);
  return days.map((day) => truth(day) + sigma * random.normal());
}

describe("trendPriorFromFits", () => {
  it("lets a short cycle borrow the time constant of earlier cycles", () => {
    // simulation with known truth: three cycles with θ = 150 d; the current one has only 45 days of data
    const theta = 150;
    const truth = (scale: number) => (day: number) => 2e-5 + scale * 7e-4 * -Math.expm1(-day / theta);
    const earlier = [0, 1].map((cycleIndex) => {
      const days = Array.from({ length: 400 }, (_, day) => day);
      return { cycleIndex, fit: fitTrendModel("asymptotic", { timeDays: days, foulingM2KPerW: noisy(truth(1 + 0.1 * cycleIndex), 50 + cycleIndex, 1.5e-5, days) })! };
    });
    const prior = trendPriorFromFits("asymptotic", earlier);
    expect(prior?.sourceCycles).toEqual([0, 1]);
    expect(prior?.parameter).toBe("logTimeConstant");
    // floor 0.35 in ln θ (trendPriorFromFits default): the prior SD is at least that
    expect(prior?.standardDeviation).toBeGreaterThanOrEqual(0.35);
    const shortDays = Array.from({ length: 45 }, (_, day) => day);
    const shortValues = noisy(truth(1.05), 99, 1.5e-5, shortDays);
    const withPrior = fitTrendModel("asymptotic", { timeDays: shortDays, foulingM2KPerW: shortValues }, { prior });
    const without = fitTrendModel("asymptotic", { timeDays: shortDays, foulingM2KPerW: shortValues });
    const thetaOf = (fit: typeof without) => fit?.parameters.find((parameter) => parameter.name === "timeConstant")?.value as number;
    const errorOf = (fit: typeof without) => Math.abs(Math.log(thetaOf(fit) / theta));
    expect(withPrior?.prior?.sourceCycles).toEqual([0, 1]);
    // the prior must pull θ to within a factor 1.5 of the truth, and closer than the unpenalised fit
    expect(errorOf(withPrior)).toBeLessThan(Math.log(1.5));
    expect(errorOf(withPrior)).toBeLessThanOrEqual(errorOf(without));
  });

  it("returns null without usable sources", () => {
    expect(trendPriorFromFits("falling-rate", [])).toBeNull();
  });
});
