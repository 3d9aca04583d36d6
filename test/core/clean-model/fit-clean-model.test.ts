import { describe, expect, it } from "vitest";
import {
  cleanResistance,
  cleanWindowMembership,
  fitCleanModel,
  fitPercent,
  tiledWindowOrigins,
  type FitCleanModelInput,
} from "../../../lib/core/clean-model";
import { BASE_RECORD, DESIGN, START_MS, syntheticRecord, TRUTH, type SyntheticRecord } from "./synthetic-exchanger";

const DAY_MS = 86_400_000;

function input(settings: SyntheticRecord, options: FitCleanModelInput["options"] = {}): FitCleanModelInput {
  const { points, cleaningsMs } = syntheticRecord(settings);
  return {
    points,
    windowOriginsMs: [points[0]!.timeMs, ...cleaningsMs],
    reference: { hotFlowKgPerS: TRUTH.hotFlowRefKgPerS, coldFlowKgPerS: TRUTH.coldFlowRefKgPerS },
    design: DESIGN,
    options,
  };
}

function deepFreeze<T>(value: T): T {
  if (typeof value === "object" && value !== null) {
    for (const inner of Object.values(value)) deepFreeze(inner);
    Object.freeze(value);
  }
  return value;
}

describe("cleanResistance", () => {
  it("is the sum of the three resistances at the reference flows and scales films as flow^-0.8", () => {
    // model definition (Wilson 1915 series resistances; Dittus–Boelter exponent 0.8, FIELD-NOTES §4); round-off tolerance
    expect(cleanResistance(TRUTH, 10, 20)).toBeCloseTo(2e-3, 15);
    expect(cleanResistance(TRUTH, 20, 20)).toBeCloseTo(1.2e-3 * Math.pow(2, -0.8) + 0.8e-3, 15);
  });

  it("rejects a zero flow", () => {
    expect(() => cleanResistance(TRUTH, 0, 20)).toThrow("cleanResistance: flows must be positive, got hot 0 kg/s, cold 20 kg/s");
  });
});

describe("fitPercent", () => {
  it("is 100 for a perfect fit and 0 for the group means", () => {
    // Ljung 1999 Sect. 16.6 NRMSE fit definition
    expect(fitPercent([1, 2, 3, 10, 12], [1, 2, 3, 10, 12], [0, 0, 0, 1, 1])).toBe(100);
    expect(fitPercent([1, 2, 3, 10, 12], [2, 2, 2, 11, 11], [0, 0, 0, 1, 1])).toBeCloseTo(0, 12);
    expect(fitPercent([1, 1], [1, 1], [0, 0])).toBeNull();
  });
});

describe("window origins", () => {
  it("tiles the record and restarts at every cleaning", () => {
    // rule of tiledWindowOrigins: origin + j·window until the next origin
    const origins = tiledWindowOrigins([0, 45 * DAY_MS], 100 * DAY_MS, 30);
    expect(origins.map((ms) => ms / DAY_MS)).toEqual([0, 30, 45, 75]);
  });

  it("assigns points to the latest origin within the window length", () => {
    const membership = cleanWindowMembership([0, 10, 35, 50].map((day) => day * DAY_MS), [0, 40 * DAY_MS], 30);
    expect(Array.from(membership.window)).toEqual([0, 0, -1, 1]);
    expect(Array.from(membership.elapsedDays)).toEqual([0, 10, 0, 10]);
  });
});

describe("fitCleanModel", () => {
  it("recovers the film coefficients of a simulated exchanger and its fouling offsets", () => {
    // simulation with known truth (synthetic-exchanger.ts): a_h = 1.2e-3, a_c = 0.6e-3, R_w = 0.2e-3 m²·K/W
    const fit = fitCleanModel(input(BASE_RECORD));
    expect(fit.filmTerms.mode).toBe("both-estimated");
    expect(fit.anchor).toBe("design");
    const hot = fit.parameters.hotFilmResistanceRefM2KPerW;
    const cold = fit.parameters.coldFilmResistanceRefM2KPerW;
    // within 3 standard errors (99.7 % if the SEs are right) and within 10 % of the truth
    expect(Math.abs(hot - 1.2e-3)).toBeLessThan(3 * (fit.standardErrors.hotFilm as number));
    expect(Math.abs(cold - 0.6e-3)).toBeLessThan(3 * (fit.standardErrors.coldFilm as number));
    expect(Math.abs(hot / 1.2e-3 - 1)).toBeLessThan(0.1);
    expect(Math.abs(cold / 0.6e-3 - 1)).toBeLessThan(0.1);
    // residual SD close to the simulated noise 1e-5 (20 %: estimation of a variance from ~400 points and the drift model)
    expect(Math.abs((fit.residualStandardDeviationM2KPerW as number) / 1e-5 - 1)).toBeLessThan(0.2);
    // the window after the cleaning starts at the residual 2e-5 (3 SE)
    const afterCleaning = fit.windows.find((window) => window.startMs >= START_MS + 199 * DAY_MS);
    expect(Math.abs((afterCleaning?.offsetM2KPerW as number) - 2e-5)).toBeLessThan(3 * (afterCleaning?.offsetStandardError as number));
    expect(fit.fitPercent.estimation).toBeGreaterThan(50);
    expect(fit.fitPercent.validation).toBeGreaterThan(50);
    expect(fit.cleanUAtReferenceWPerM2K).toBeCloseTo(500, 9);
  });

  it("uses only the windows after cleanings when asked", () => {
    // same record; 2 windows of 30 days hold 60 points
    const fit = fitCleanModel(input(BASE_RECORD, { windows: "after-cleanings" }));
    expect(fit.pointCount).toBe(60);
    expect(fit.windows).toHaveLength(2);
  });

  it("holds the hot film term at the design split when the hot flow does not vary", () => {
    // simulation with known truth: constant hot flow, so a_h is aliased with the wall resistance and the offsets
    const fit = fitCleanModel(input({ ...BASE_RECORD, hotSwing: 0, coupling: 0 }));
    expect(fit.filmTerms.mode).toBe("hot-fixed");
    // design split default 0.45 of R0 = 2e-3 (resolveCleanModelOptions)
    expect(fit.parameters.hotFilmResistanceRefM2KPerW).toBeCloseTo(0.45 * 2e-3, 15);
    expect(fit.standardErrors.hotFilm).toBeNull();
    expect(fit.notes.join(" ")).toMatch(/Hot film term not identifiable/);
    expect(Math.abs(fit.parameters.coldFilmResistanceRefM2KPerW / 0.6e-3 - 1)).toBeLessThan(0.1);
  });

  it("estimates only the sum of the film terms when both flows move nearly together", () => {
    // simulation with known truth: cold flow follows the hot flow with 3 % own variation, so a_h and a_c are confounded
    const fit = fitCleanModel(input({ ...BASE_RECORD, coupling: 0.97 }));
    expect(fit.filmTerms.mode).toBe("ratio-fixed");
    expect(Math.abs(fit.filmTerms.correlation as number)).toBeGreaterThan(0.95);
    expect(fit.filmTerms.conditionNumber).toBeGreaterThan(39);
    expect(fit.notes.join(" ")).toMatch(/cannot be separated/);
    const sum = fit.parameters.hotFilmResistanceRefM2KPerW + fit.parameters.coldFilmResistanceRefM2KPerW;
    // truth a_h + a_c = 1.8e-3; 10 % (the ratio is held at 1 while the truth is 2, so the sum absorbs a little bias)
    expect(Math.abs(sum / 1.8e-3 - 1)).toBeLessThan(0.1);
  });

  it("estimates only the sum of the film terms when both flows move exactly together", () => {
    // simulation with known truth: cold flow ratio equals the hot flow ratio, so only a_h + a_c is identifiable
    const fit = fitCleanModel(input({ ...BASE_RECORD, coupling: 1 }));
    expect(fit.filmTerms.mode).toBe("ratio-fixed");
    // exactly proportional flows: the joint fit is singular, so no correlation can be computed
    expect(fit.filmTerms.correlation).toBeNull();
    const sum = fit.parameters.hotFilmResistanceRefM2KPerW + fit.parameters.coldFilmResistanceRefM2KPerW;
    // truth a_h + a_c = 1.8e-3; 5 % (the flow sensitivity of the sum is well determined)
    expect(Math.abs(sum / 1.8e-3 - 1)).toBeLessThan(0.05);
    expect(fit.parameters.hotFilmResistanceRefM2KPerW / fit.parameters.coldFilmResistanceRefM2KPerW).toBeCloseTo(1, 12);
  });

  it("fits the film exponents within their bounds when asked", () => {
    // simulation with known truth: n_h = 0.6, n_c = 0.9, larger flow swings (±20 %) so the curvature is visible
    const truth = { ...TRUTH, exponentHot: 0.6, exponentCold: 0.9 };
    const fit = fitCleanModel(input({ ...BASE_RECORD, truth, hotSwing: 0.2, coldSwing: 0.2, noise: 5e-6 }, { fitExponents: true }));
    expect(fit.filmTerms.mode).toBe("both-estimated");
    // within 3 SE of the truth
    expect(Math.abs(fit.parameters.exponentHot - 0.6)).toBeLessThan(3 * (fit.standardErrors.exponentHot as number));
    expect(Math.abs(fit.parameters.exponentCold - 0.9)).toBeLessThan(3 * (fit.standardErrors.exponentCold as number));
  });

  it("lowers the clean resistance when the data start cleaner than the data sheet allows", () => {
    // simulation with known truth: true R0 = 2e-3, the data sheet claims 2.2e-3 (U = 370.37, Rf = 5e-4); fouling starts at 0
    const record = { ...BASE_RECORD, initialFouling: 0, residualAfterCleaning: 0 };
    const fit = fitCleanModel({ ...input(record), design: { uWPerM2K: 1 / 2.7e-3, foulingM2KPerW: 5e-4 } });
    expect(fit.anchor).toBe("lowered-to-data");
    // within 1 % of the true 2e-3 (offset SE about 2e-6 m²·K/W)
    expect(Math.abs(fit.cleanResistanceAtReferenceM2KPerW / 2e-3 - 1)).toBeLessThan(0.01);
    expect(fit.notes.join(" ")).toMatch(/clean U at reference raised/);
  });

  it("falls back to the design split with a note when there are too few points", () => {
    const few = input({ ...BASE_RECORD, days: 5, cleaningDays: [] });
    const fit = fitCleanModel(few);
    expect(fit.filmTerms.mode).toBe("both-fixed");
    expect(fit.notes).toContain("Too few clean points (5) to fit the clean model: design split used.");
  });

  it("does not modify its input", () => {
    // STYLE.md: inputs never mutated
    expect(() => fitCleanModel(deepFreeze(input(BASE_RECORD)))).not.toThrow();
  });

  it("rejects design data with a non-positive clean resistance", () => {
    expect(() => fitCleanModel({ ...input(BASE_RECORD), design: { uWPerM2K: 400, foulingM2KPerW: 3e-3 } })).toThrow(
      /1\/U_design − Rf_design must be positive/,
    );
  });
});
