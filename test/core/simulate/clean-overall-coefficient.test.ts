import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { cleanOverallCoefficient } from "../../../lib/core/simulate";
import { fixturePlan } from "./fixture-exchanger";

const PARAMETERS = fixturePlan().cleanCoefficient;

describe("cleanOverallCoefficient", () => {
  it("equals 1/(hot film + cold film + wall) at the reference flows", () => {
    // 1/(0.0012 + 0.0006 + 0.0002) = 500 W/(m²·K), hand arithmetic.
    expect(cleanOverallCoefficient(PARAMETERS, 10, 15)).toBeCloseTo(500, 9);
  });

  it("scales a film resistance by flow^-0.8 (Dittus–Boelter exponent)", () => {
    // Doubling the hot flow: hot film 0.0012·2^-0.8 = 0.0012·0.5743491775 (2^-0.8 computed) = 6.8921901e-4,
    // so U = 1/(6.8921901e-4 + 0.0006 + 0.0002) = 671.4929 W/(m²·K) (hand arithmetic).
    const expected = 1 / (0.0012 * Math.pow(2, -0.8) + 0.0006 + 0.0002);
    expect(cleanOverallCoefficient(PARAMETERS, 20, 15)).toBeCloseTo(expected, 9);
    expect(expected).toBeCloseTo(671.4929, 3);
  });

  it("grows with either flow", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 100, noNaN: true }), fc.double({ min: 0.1, max: 100, noNaN: true }), (hot, cold) => {
        const base = cleanOverallCoefficient(PARAMETERS, hot, cold);
        expect(cleanOverallCoefficient(PARAMETERS, hot * 1.1, cold)).toBeGreaterThan(base);
        expect(cleanOverallCoefficient(PARAMETERS, hot, cold * 1.1)).toBeGreaterThan(base);
        expect(base).toBeLessThan(1 / PARAMETERS.wallResistanceM2KPerW);
      }),
    );
  });

  it("rejects a flow that is not positive", () => {
    expect(() => cleanOverallCoefficient(PARAMETERS, 0, 15)).toThrow("cleanOverallCoefficient: flows must be positive, got hot 0, cold 15");
  });
});
