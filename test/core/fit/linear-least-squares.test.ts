import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { linearLeastSquares } from "../../../lib/core/fit";
import { readStrd, significantDigits } from "./nist-strd";

describe("linearLeastSquares", () => {
  it("reproduces the NIST StRD Norris certified values to at least 10 significant digits", () => {
    const { y, x } = readStrd("Norris.dat");
    expect(y.length).toBe(36);
    const design = x.flatMap((value) => [1, value]);
    const fit = linearLeastSquares({ design, response: y, columns: 2 });
    // NIST StRD Norris certified values (B0, B1, their standard deviations, residual SD, R², residual SS, 34 d.f.)
    const certified = {
      b0: -0.262323073774029,
      b1: 1.00211681802045,
      sd0: 0.232818234301152,
      sd1: 0.429796848199937e-3,
      residualSd: 0.884796396144373,
      rSquared: 0.999993745883712,
      residualSs: 26.6173985294224,
    };
    // Tolerance: the brief asks ≥ 10 digits; the certificate gives 15.
    expect(significantDigits(fit.coefficients[0] as number, certified.b0)).toBeGreaterThanOrEqual(10);
    expect(significantDigits(fit.coefficients[1] as number, certified.b1)).toBeGreaterThanOrEqual(10);
    expect(significantDigits(fit.standardErrors[0] as number, certified.sd0)).toBeGreaterThanOrEqual(10);
    expect(significantDigits(fit.standardErrors[1] as number, certified.sd1)).toBeGreaterThanOrEqual(10);
    expect(significantDigits(fit.residualStandardDeviation as number, certified.residualSd)).toBeGreaterThanOrEqual(10);
    expect(significantDigits(fit.rSquared as number, certified.rSquared)).toBeGreaterThanOrEqual(10);
    expect(significantDigits(fit.residualSumOfSquares, certified.residualSs)).toBeGreaterThanOrEqual(10);
    expect(fit.degreesOfFreedom).toBe(34);
  });

  it("matches the FIELD-NOTES §8 regression check (x = 1..5, y = 2, 4, 5, 4, 5)", () => {
    const fit = linearLeastSquares({ design: [1, 1, 1, 2, 1, 3, 1, 4, 1, 5], response: [2, 4, 5, 4, 5], columns: 2 });
    // FIELD-NOTES §8 [C]: b0 = 2.2, b1 = 0.6, s = 0.894427; tolerance 1e-12 (exact rational data) and 5e-7 (6 decimals printed)
    expect(fit.coefficients[0]).toBeCloseTo(2.2, 12);
    expect(fit.coefficients[1]).toBeCloseTo(0.6, 12);
    expect(Math.abs((fit.residualStandardDeviation as number) - 0.894427)).toBeLessThan(5e-7);
  });

  it("weights rows: a weight of 4 equals repeating the row four times", () => {
    // common practice: weighted least squares with integer weights equals row replication
    const weighted = linearLeastSquares({ design: [1, 0, 1, 1, 1, 2], response: [0, 2, 1], columns: 2, weights: [1, 4, 1] });
    const repeated = linearLeastSquares({ design: [1, 0, 1, 1, 1, 1, 1, 1, 1, 1, 1, 2], response: [0, 2, 2, 2, 2, 1], columns: 2 });
    expect(weighted.coefficients[0]).toBeCloseTo(repeated.coefficients[0] as number, 12);
    expect(weighted.coefficients[1]).toBeCloseTo(repeated.coefficients[1] as number, 12);
  });

  it("reports rank deficiency with null covariance instead of dividing by zero", () => {
    const fit = linearLeastSquares({ design: [1, 2, 1, 2, 1, 2], response: [1, 2, 3], columns: 2 });
    expect(fit.rank).toBe(1);
    expect(fit.covariance).toBeNull();
    expect(fit.standardErrors).toEqual([null, null]);
  });

  it("recovers any exact straight line (property test)", () => {
    fc.assert(
      fc.property(fc.double({ min: -1e3, max: 1e3, noNaN: true }), fc.double({ min: -1e3, max: 1e3, noNaN: true }), (intercept, slope) => {
        const x = [0, 1, 2, 3, 4, 5];
        const fit = linearLeastSquares({ design: x.flatMap((value) => [1, value]), response: x.map((value) => intercept + slope * value), columns: 2 });
        // round-off only: tolerance 1e-9 of the data scale
        const scale = 1 + Math.abs(intercept) + 5 * Math.abs(slope);
        expect(Math.abs((fit.coefficients[0] as number) - intercept)).toBeLessThan(1e-9 * scale);
        expect(Math.abs((fit.coefficients[1] as number) - slope)).toBeLessThan(1e-9 * scale);
      }),
    );
  });

  it("rejects mismatched sizes with a message", () => {
    expect(() => linearLeastSquares({ design: [1, 2, 3], response: [1, 2], columns: 2 })).toThrow(
      "linearLeastSquares: design must hold 2×2 values, got 3",
    );
  });
});
