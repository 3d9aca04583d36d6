import { describe, expect, it } from "vitest";
import { seededRandom } from "../../../lib/core/simulate";
import { ASYMPTOTIC_TREND, FALLING_RATE_TREND, fitTrendModel, trendValue } from "../../../lib/core/trend";

function deepFreeze<T>(value: T): T {
  if (typeof value === "object" && value !== null) {
    for (const inner of Object.values(value)) deepFreeze(inner);
    Object.freeze(value);
  }
  return value;
}

const DAYS = Array.from({ length: 200 }, (_, day) => day);

describe("ASYMPTOTIC_TREND", () => {
  it("follows the Kern–Seaton closed form at θ and 3θ", () => {
    // Kern & Seaton 1959 closed form; FIELD-NOTES §4 [C]: Rf(θ) = 0.63212·R∞, Rf(3θ) = 0.95021·R∞ (5 decimals printed)
    const parameters = [0, 1e-3 / 100, Math.log(100)];
    expect(Math.abs(ASYMPTOTIC_TREND.value(parameters, 100, 0) / 1e-3 - 0.63212)).toBeLessThan(5e-6);
    expect(Math.abs(ASYMPTOTIC_TREND.value(parameters, 300, 0) / 1e-3 - 0.95021)).toBeLessThan(5e-6);
  });

  it("has an analytic gradient that agrees with central differences", () => {
    // common practice: derivative check by central differences, tolerance 1e-6 relative (step 1e-6 relative)
    const parameters = [1e-4, 8e-4 / 120, Math.log(120)];
    const gradient = new Float64Array(3);
    ASYMPTOTIC_TREND.gradient(parameters, 75, 0, gradient);
    for (let j = 0; j < 3; j += 1) {
      const step = 1e-6 * Math.max(1e-4, Math.abs(parameters[j] as number));
      const up = [...parameters];
      const down = [...parameters];
      up[j] = (up[j] as number) + step;
      down[j] = (down[j] as number) - step;
      const numeric = (ASYMPTOTIC_TREND.value(up, 75, 0) - ASYMPTOTIC_TREND.value(down, 75, 0)) / (2 * step);
      expect(Math.abs(numeric - (gradient[j] as number))).toBeLessThan(1e-6 * Math.max(1e-9, Math.abs(gradient[j] as number)));
    }
  });
});

describe("FALLING_RATE_TREND", () => {
  it("equals r0 + A at the reference time and r0 at t = 0", () => {
    // definition Rf = r0 + A·(t/T)^n
    expect(FALLING_RATE_TREND.value([1e-5, 3e-4, 0.5], 200, 200)).toBeCloseTo(3.1e-4, 15);
    expect(FALLING_RATE_TREND.value([1e-5, 3e-4, 0.5], 0, 200)).toBe(1e-5);
  });
});

describe("fitTrendModel", () => {
  it("recovers an asymptotic curve from noise-free data", () => {
    // simulation with known truth: r0 = 2e-5, R∞ = 8e-4, θ = 120 d; exact data, tolerance 1e-6 relative
    const values = DAYS.map((day) => 2e-5 + 8e-4 * -Math.expm1(-day / 120));
    const fit = fitTrendModel("asymptotic", { timeDays: DAYS, foulingM2KPerW: values });
    expect(fit?.converged).toBe(true);
    const byName = Object.fromEntries((fit?.parameters ?? []).map((parameter) => [parameter.name, parameter.value]));
    expect(Math.abs((byName.asymptote as number) / 8e-4 - 1)).toBeLessThan(1e-6);
    expect(Math.abs((byName.timeConstant as number) / 120 - 1)).toBeLessThan(1e-6);
  });

  it("recovers a falling-rate curve from noisy data within its standard errors", () => {
    // simulation with known truth: Rf = 1e-5 + 4e-5·t^0.5, σ = 1e-5 white noise; |error| < 3 SE (99.7 % if the SE is right)
    const random = seededRandom(7);
    const values = DAYS.map((day) => 1e-5 + 4e-5 * Math.sqrt(day) + 1e-5 * random.normal());
    const fit = fitTrendModel("falling-rate", { timeDays: DAYS, foulingM2KPerW: values });
    expect(fit?.converged).toBe(true);
    const exponent = fit?.parameters.find((parameter) => parameter.name === "exponent");
    expect(Math.abs((exponent?.value as number) - 0.5)).toBeLessThan(3 * (exponent?.standardError as number));
    const coefficient = fit?.parameters.find((parameter) => parameter.name === "coefficient");
    expect(Math.abs((coefficient?.value as number) - 4e-5)).toBeLessThan(3 * (coefficient?.standardError as number));
  });

  it("inflates the covariance for autocorrelated residuals and says by how much", () => {
    // simulation with known truth: linear trend + AR(1) noise with ρ = 0.8; inflation = (1 + ρ̂)/(1 − ρ̂) (Wilks 2011 Eq. 5.12)
    const random = seededRandom(11);
    let state = 0;
    const values = DAYS.map((day) => {
      state = 0.8 * state + 1e-5 * random.normal();
      return 1e-4 + 2e-6 * day + state;
    });
    const withInflation = fitTrendModel("linear", { timeDays: DAYS, foulingM2KPerW: values });
    const without = fitTrendModel("linear", { timeDays: DAYS, foulingM2KPerW: values }, { autocorrelation: "none" });
    const rho = withInflation?.lagOneAutocorrelation as number;
    expect(rho).toBeGreaterThan(0.6);
    expect(withInflation?.varianceInflation).toBeCloseTo((1 + rho) / (1 - rho), 12);
    const slopeError = (fit: typeof without) => fit?.parameters[1]?.standardError as number;
    expect(slopeError(withInflation) / slopeError(without)).toBeCloseTo(Math.sqrt((1 + rho) / (1 - rho)), 10);
  });

  it("returns null with fewer points than parameters", () => {
    expect(fitTrendModel("asymptotic", { timeDays: [0, 1], foulingM2KPerW: [0, 1e-5] })).toBeNull();
  });

  it("evaluates the fitted curve with trendValue", () => {
    // exact line Rf = 1e-4 + 1e-6·t: the fitted value at t = 300 is 4e-4 to round-off (1e-15 absolute)
    const fit = fitTrendModel("linear", { timeDays: DAYS, foulingM2KPerW: DAYS.map((day) => 1e-4 + 1e-6 * day) });
    expect(Math.abs(trendValue(fit!, 300) - 4e-4)).toBeLessThan(1e-15);
  });

  it("does not modify its inputs", () => {
    // STYLE.md: inputs never mutated
    const data = deepFreeze({ timeDays: [...DAYS], foulingM2KPerW: DAYS.map((day) => 1e-4 + 1e-6 * day) });
    expect(() => fitTrendModel("asymptotic", data)).not.toThrow();
  });

  it("rejects descending times and a prior of another model", () => {
    expect(() => fitTrendModel("linear", { timeDays: [0, 2, 1], foulingM2KPerW: [0, 0, 0] })).toThrow("fitTrendModel: times must be ascending");
    const prior = { kind: "falling-rate" as const, parameter: "exponent", mean: 0.5, standardDeviation: 0.1, residualScale: 1e-5, sourceCycles: [0] };
    expect(() => fitTrendModel("linear", { timeDays: [0, 1, 2], foulingM2KPerW: [0, 0, 0] }, { prior })).toThrow(
      "fitTrendModel: a falling-rate prior cannot constrain a linear model",
    );
  });
});
