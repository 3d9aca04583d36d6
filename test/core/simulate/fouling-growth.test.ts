import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { foulingGrowth, validateFoulingModel, type FoulingModel } from "../../../lib/core/simulate";

const DAY_S = 86_400;

describe("foulingGrowth", () => {
  it("follows the linear law Rf = Rf0 + k·t", () => {
    const model: FoulingModel = { kind: "linear", initialM2KPerW: 1e-4, rateM2KPerWPerS: 1e-10 };
    // 1e-4 + 1e-10·1e6 = 2e-4 (hand arithmetic).
    expect(foulingGrowth(model, 1e6)).toBeCloseTo(2e-4, 15);
    expect(foulingGrowth(model, 0)).toBe(1e-4);
  });

  it("reaches 0.63212 and 0.95021 of the asymptote at θ and 3θ (Kern & Seaton 1959 closed form)", () => {
    const model: FoulingModel = { kind: "asymptotic", asymptoteM2KPerW: 1e-3, timeConstantS: 90 * DAY_S };
    // Kern & Seaton 1959 closed form, FIELD-NOTES §4 [C]: Rf(θ) = 0.63212·Rf_inf, Rf(3θ) = 0.95021·Rf_inf
    // (five printed digits, so the tolerance is half a unit in the fifth decimal).
    expect(Math.abs(foulingGrowth(model, 90 * DAY_S) / 1e-3 - 0.63212)).toBeLessThan(5e-6);
    expect(Math.abs(foulingGrowth(model, 270 * DAY_S) / 1e-3 - 0.95021)).toBeLessThan(5e-6);
    // Initial slope Rf_inf/θ (FIELD-NOTES §4 [C]); over one second the curvature changes it by 1/(2θ) relative.
    expect(foulingGrowth(model, 1) / (1e-3 / (90 * DAY_S))).toBeCloseTo(1, 6);
  });

  it("follows the falling-rate power law Rf = k·t^n", () => {
    const model: FoulingModel = { kind: "falling-rate", coefficient: 2e-7, exponent: 0.5 };
    // 2e-7·sqrt(1e6) = 2e-4 (hand arithmetic); quadrupling t doubles Rf when n = 1/2.
    expect(foulingGrowth(model, 1e6)).toBeCloseTo(2e-4, 15);
    expect(foulingGrowth(model, 4e6) / foulingGrowth(model, 1e6)).toBeCloseTo(2, 12);
    expect(foulingGrowth(model, 0)).toBe(0);
  });

  it("treats times before the cycle start as the start", () => {
    expect(foulingGrowth({ kind: "linear", initialM2KPerW: 3e-5, rateM2KPerWPerS: 1e-9 }, -100)).toBe(3e-5);
    expect(foulingGrowth({ kind: "asymptotic", asymptoteM2KPerW: 1e-3, timeConstantS: 10 }, -5)).toBe(0);
  });

  it("never decreases with time for valid parameters", () => {
    const models = fc.oneof(
      fc.record({ kind: fc.constant("linear" as const), initialM2KPerW: fc.double({ min: 0, max: 1e-3, noNaN: true }), rateM2KPerWPerS: fc.double({ min: 0, max: 1e-9, noNaN: true }) }),
      fc.record({ kind: fc.constant("asymptotic" as const), asymptoteM2KPerW: fc.double({ min: 0, max: 1e-2, noNaN: true }), timeConstantS: fc.double({ min: 1, max: 1e9, noNaN: true }) }),
      fc.record({ kind: fc.constant("falling-rate" as const), coefficient: fc.double({ min: 0, max: 1e-5, noNaN: true }), exponent: fc.double({ min: 0.05, max: 1, noNaN: true }) }),
    );
    fc.assert(
      fc.property(models, fc.double({ min: 0, max: 1e9, noNaN: true }), fc.double({ min: 0, max: 1e8, noNaN: true }), (model, time, step) => {
        expect(foulingGrowth(model, time + step)).toBeGreaterThanOrEqual(foulingGrowth(model, time));
      }),
    );
  });
});

describe("validateFoulingModel", () => {
  it("names the broken rule", () => {
    expect(() => validateFoulingModel({ kind: "linear", initialM2KPerW: 0, rateM2KPerWPerS: -1 })).toThrow(
      "linear fouling model needs initialM2KPerW >= 0 and rateM2KPerWPerS >= 0",
    );
    expect(() => validateFoulingModel({ kind: "asymptotic", asymptoteM2KPerW: 1e-3, timeConstantS: 0 })).toThrow(
      "asymptotic fouling model needs asymptoteM2KPerW >= 0 and timeConstantS > 0",
    );
    expect(() => validateFoulingModel({ kind: "falling-rate", coefficient: 1e-7, exponent: 1.5 })).toThrow(
      "falling-rate fouling model needs coefficient >= 0 and 0 < exponent <= 1",
    );
  });
});
