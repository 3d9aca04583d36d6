import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  dutyLossFromResistance,
  EconomicsInputError,
  foulingRatingCurve,
  integrateAdaptiveSimpson,
  sampledDutyLoss,
} from "../../../lib/core/economics";
import type { RatingInput } from "../../../lib/core/thermal";
import { relativeError } from "./support";

describe("sampledDutyLoss", () => {
  const forecast = sampledDutyLoss({ elapsedDays: [0, 10, 30], dutyLossW: [0, 1000, 2000] });

  it("interpolates linearly and holds the end values", () => {
    // linear interpolation by hand: t = 5 → 500; t = 20 → 1500; before 0 → 0; after 30 → 2000
    expect(forecast.dutyLossW(5)).toBe(500);
    expect(forecast.dutyLossW(20)).toBe(1500);
    expect(forecast.dutyLossW(-3)).toBe(0);
    expect(forecast.dutyLossW(45)).toBe(2000);
  });

  it("integrates the interpolant exactly", () => {
    // trapezoids by hand: ∫₀^30 = 10·500 + 20·1500 = 35000 W·d; ∫₅^20 = 5·(500 + 1000)/2 + 10·(1000 + 1500)/2
    // = 3750 + 12500 = 16250;
    // beyond the last sample the held value: ∫₃₀^40 = 20000
    expect(forecast.dutyLossIntegralWDays?.(0, 30)).toBe(35_000);
    expect(forecast.dutyLossIntegralWDays?.(5, 20)).toBe(16_250);
    expect(forecast.dutyLossIntegralWDays?.(30, 40)).toBe(20_000);
  });

  it("agrees with quadrature of its own interpolant", () => {
    // property: the exact integral equals adaptive Simpson on dutyLossW (which resolves the kinks)
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0, max: 1e6, noNaN: true }), { minLength: 2, maxLength: 12 }),
        fc.double({ min: -5, max: 60, noNaN: true }),
        fc.double({ min: -5, max: 60, noNaN: true }),
        (losses, a, b) => {
          const series = sampledDutyLoss({ elapsedDays: losses.map((_, index) => 5 * index), dutyLossW: losses });
          const exact = series.dutyLossIntegralWDays?.(a, b) ?? NaN;
          const numeric = integrateAdaptiveSimpson(series.dutyLossW, a, b, { initialPanels: 64 });
          expect(Math.abs(exact - numeric)).toBeLessThanOrEqual(1e-6 * Math.max(1, Math.abs(exact)));
        },
      ),
      { seed: 17, numRuns: 100 },
    );
  });

  it("rejects a non-increasing series with a message", () => {
    expect(() => sampledDutyLoss({ elapsedDays: [0, 2, 2], dutyLossW: [0, 1, 2] })).toThrow(
      new EconomicsInputError(
        "duty-loss series",
        "duty-loss series needs finite strictly increasing ages from >= 0 and finite losses >= 0; sample 2 is (2 days, 2 W)",
      ),
    );
    expect(() => sampledDutyLoss({ elapsedDays: [], dutyLossW: [] })).toThrow("equal, non-zero numbers");
  });
});

describe("dutyLossFromResistance with foulingRatingCurve", () => {
  // counterflow, Cmin = cold = 5000 W/K, Cr = 0.7, NTU = 5 when clean; hot 450 K, cold 300 K
  const clean: RatingInput = {
    uWPerM2K: 1000,
    areaM2: 25,
    arrangement: { kind: "counterflow" },
    hot: { massFlowKgPerS: 5000 / 0.7 / 2300, heatCapacity: { kind: "constant", jPerKgK: 2300 }, inletK: 450 },
    cold: { massFlowKgPerS: 5000 / 4180, heatCapacity: { kind: "constant", jPerKgK: 4180 }, inletK: 300 },
  };
  const curve = foulingRatingCurve(clean);

  it("rates the clean and the half-coefficient exchanger", () => {
    // FIELD-NOTES §2 counterflow relation [V]: ε(NTU 5, Cr 0.7) = 0.920670368605 → Q = ε·5000·150;
    // Rf = 1/U_clean halves U → NTU 2.5: ε = 0.7882851118681374 (same formula, Python float arithmetic)
    expect(relativeError(curve(0), 0.920670368605 * 750_000)).toBeLessThan(1e-9);
    expect(relativeError(curve(1e-3), 0.7882851118681374 * 750_000)).toBeLessThan(1e-9);
  });

  it("turns a resistance forecast into a growing duty loss", () => {
    // definition ΔQ = Q(0) − Q(Rf(t)); at t = 100 d with Rf = 1e-5·t the loss is Q(0) − Q(1e-3)
    const forecast = dutyLossFromResistance((days) => 1e-5 * days, curve);
    expect(forecast.dutyLossW(0)).toBe(0);
    expect(relativeError(forecast.dutyLossW(100), (0.920670368605 - 0.7882851118681374) * 750_000)).toBeLessThan(1e-8);
    expect(forecast.dutyLossW(50)).toBeGreaterThan(0);
    expect(forecast.dutyLossW(50)).toBeLessThan(forecast.dutyLossW(100));
  });

  it("rejects a negative resistance", () => {
    expect(() => curve(-1e-4)).toThrow("fouling resistance must be a finite number >= 0, got -0.0001 m²·K/W");
  });
});
