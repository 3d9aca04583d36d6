import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { integrateAdaptiveSimpson } from "../../../lib/core/economics";
import { relativeError } from "./support";

describe("integrateAdaptiveSimpson", () => {
  it("integrates polynomials up to cubics exactly", () => {
    // calculus: ∫0^3 x² dx = 9; ∫-1^2 (x³ − 2x + 1) dx = 15/4 − 3 + 3 = 3.75
    expect(relativeError(integrateAdaptiveSimpson((x) => x * x, 0, 3), 9)).toBeLessThan(1e-15);
    expect(relativeError(integrateAdaptiveSimpson((x) => x ** 3 - 2 * x + 1, -1, 2), 3.75)).toBeLessThan(1e-14);
  });

  it("reaches the requested relative accuracy on smooth functions", () => {
    // calculus: ∫0^π sin x dx = 2; ∫0^1 e^x dx = e − 1
    expect(relativeError(integrateAdaptiveSimpson(Math.sin, 0, Math.PI), 2)).toBeLessThan(1e-10);
    expect(relativeError(integrateAdaptiveSimpson(Math.exp, 0, 1), Math.E - 1)).toBeLessThan(1e-10);
  });

  it("resolves a kink and a jump by bisection", () => {
    // calculus: ∫0^2 |x − 0.7| dx = 0.245 + 0.845 = 1.09; ∫0^1 [x > 1/3] dx = 2/3
    expect(relativeError(integrateAdaptiveSimpson((x) => Math.abs(x - 0.7), 0, 2), 1.09)).toBeLessThan(1e-9);
    expect(relativeError(integrateAdaptiveSimpson((x) => (x > 1 / 3 ? 1 : 0), 0, 1), 2 / 3)).toBeLessThan(1e-9);
  });

  it("changes sign when the limits are swapped and is additive over adjacent intervals", () => {
    // property of the integral (calculus)
    fc.assert(
      fc.property(
        fc.double({ min: -5, max: 5, noNaN: true }),
        fc.double({ min: -5, max: 5, noNaN: true }),
        fc.double({ min: -5, max: 5, noNaN: true }),
        (a, b, c) => {
          const f = (x: number): number => Math.exp(-x * x) + 0.1 * x;
          const ab = integrateAdaptiveSimpson(f, a, b);
          expect(integrateAdaptiveSimpson(f, b, a)).toBeCloseTo(-ab, 12);
          expect(ab + integrateAdaptiveSimpson(f, b, c)).toBeCloseTo(integrateAdaptiveSimpson(f, a, c), 8);
        },
      ),
      { seed: 5, numRuns: 100 },
    );
  });
});
