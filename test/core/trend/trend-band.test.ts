import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { studentTQuantile } from "../../../lib/core/fit";
import { seededRandom } from "../../../lib/core/simulate";
import { fitTrendModel, trendBand } from "../../../lib/core/trend";
import { bandCoverage, type CoverageExperiment } from "./coverage-simulation";

describe("trendBand", () => {
  it("reproduces the FIELD-NOTES §8 OLS prediction interval check", () => {
    // FIELD-NOTES §8 [C]: x = 1..5, y = (2, 4, 5, 4, 5), x0 = 6: ŷ = 5.8, t_0.975(3) = 3.182446, 95 % PI [1.675078, 9.924922]
    const fit = fitTrendModel("linear", { timeDays: [1, 2, 3, 4, 5], foulingM2KPerW: [2, 4, 5, 4, 5] }, { autocorrelation: "none" });
    expect(fit?.degreesOfFreedom).toBe(3);
    const [point] = trendBand(fit!, [6]);
    // tolerances: 1e-12 for ŷ (exact data), 5e-7 for the 6-decimal printed bounds
    expect(Math.abs((point?.center as number) - 5.8)).toBeLessThan(1e-12);
    expect(Math.abs(studentTQuantile(0.975, 3) - 3.182446)).toBeLessThan(5e-7);
    expect(Math.abs((point?.lower95 as number) - 1.675078)).toBeLessThan(5e-7);
    expect(Math.abs((point?.upper95 as number) - 9.924922)).toBeLessThan(5e-7);
    // s·sqrt(1 + 1/n + (x0 − x̄)²/Sxx) = 0.894427·sqrt(2.1) (FIELD-NOTES §8 formula)
    expect(Math.abs((point?.standardErrorPrediction as number) - 0.894427191 * Math.sqrt(2.1))).toBeLessThan(1e-8);
  });

  it("widens with the forecast horizon", () => {
    // delta method: gᵀCov g grows with the distance from the data (common practice)
    const fit = fitTrendModel("linear", { timeDays: [1, 2, 3, 4, 5], foulingM2KPerW: [2, 4, 5, 4, 5] }, { autocorrelation: "none" });
    const band = trendBand(fit!, [6, 10, 20]);
    const widths = band.map((point) => point.upper80 - point.lower80);
    expect(widths[0]! < widths[1]! && widths[1]! < widths[2]!).toBe(true);
  });
});

/**
 * Coverage by seeded simulation with known truth: 200 replicates, 180 daily points (10 % missing), noise
 * σ = 2e-5 m²·K/W (about 2–4 % of the design fouling allowances in FIELD-NOTES §3, a realistic daily scatter of Rf),
 * forecasts 30, 60 and 90 days after the last point; a future noisy observation is inside or not.
 * Tolerance: within 5 percentage points of nominal (the brief). With 600 checks the binomial SE is about 1.6 pp (80 %)
 * and 0.9 pp (95 %) if the checks were independent; the three horizons of one replicate are correlated, so the
 * effective SE is larger, up to about 2.8 pp and 1.5 pp.
 */
const COMMON = { days: 180, missingFraction: 0.1, noiseStandardDeviation: 2e-5, horizonsDays: [30, 60, 90], replicates: 200 };
const LINEAR_TRUTH = (day: number) => 5e-5 + 1.5e-6 * day;
const ASYMPTOTIC_TRUTH = (day: number) => 2e-5 + 8e-4 * -Math.expm1(-day / 120);

describe("prediction-band coverage (seeded simulation with known truth)", () => {
  it.each<{ name: string; experiment: Omit<CoverageExperiment, keyof typeof COMMON> }>([
    { name: "linear cycle, independent noise", experiment: { kind: "linear", truth: LINEAR_TRUTH, noiseAutocorrelation: 0, seed: 101, autocorrelation: "ar1" } },
    { name: "asymptotic cycle, independent noise", experiment: { kind: "asymptotic", truth: ASYMPTOTIC_TRUTH, noiseAutocorrelation: 0, seed: 202, autocorrelation: "ar1" } },
    { name: "linear cycle, AR(1) noise rho 0.6, inflated", experiment: { kind: "linear", truth: LINEAR_TRUTH, noiseAutocorrelation: 0.6, seed: 303, autocorrelation: "ar1" } },
    { name: "asymptotic cycle, AR(1) noise rho 0.6, inflated", experiment: { kind: "asymptotic", truth: ASYMPTOTIC_TRUTH, noiseAutocorrelation: 0.6, seed: 404, autocorrelation: "ar1" } },
  ])("covers the nominal 80 and 95 percent within 5 points: $name", ({ experiment }) => {
    const result = bandCoverage({ ...COMMON, ...experiment });
    expect(result.fitted).toBe(200);
    expect(Math.abs(result.coverage80 - 0.8)).toBeLessThanOrEqual(0.05);
    expect(Math.abs(result.coverage95 - 0.95)).toBeLessThanOrEqual(0.05);
  });

  it("covers less without the AR(1) inflation when the noise is autocorrelated", () => {
    // same seeded AR(1) data with and without inflation: the inflation can only widen the bands
    const experiment = { ...COMMON, kind: "asymptotic" as const, truth: ASYMPTOTIC_TRUTH, noiseAutocorrelation: 0.6, seed: 404 };
    const inflated = bandCoverage({ ...experiment, autocorrelation: "ar1" });
    const plain = bandCoverage({ ...experiment, autocorrelation: "none" });
    expect(plain.coverage80).toBeLessThan(inflated.coverage80);
  });
});

describe("trendBand (properties)", () => {
  it("nests the 80 % band inside the 95 % band, symmetric about the centre", () => {
    // definition of symmetric t-bands: t_0.9 < t_0.975 for every ν
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 10_000 }), fc.double({ min: 0, max: 400, noNaN: true }), (seed, time) => {
        const random = seededRandom(seed);
        const days = Array.from({ length: 40 }, (_, day) => day);
        const fit = fitTrendModel("linear", { timeDays: days, foulingM2KPerW: days.map((day) => 1e-4 + 1e-6 * day + 1e-5 * random.normal()) });
        const [point] = trendBand(fit!, [time]);
        const p = point!;
        expect(p.lower95 <= p.lower80 && p.lower80 <= p.center && p.center <= p.upper80 && p.upper80 <= p.upper95).toBe(true);
        expect(Math.abs(p.upper80 - p.center - (p.center - p.lower80))).toBeLessThan(1e-15);
      }),
      { numRuns: 50 },
    );
  });
});
