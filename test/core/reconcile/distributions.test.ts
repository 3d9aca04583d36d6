import { chiSquaredDistributionTable } from "simple-statistics";
import { describe, expect, it } from "vitest";
import {
  chiSquareQuantile,
  complementaryErrorFunction,
  regularizedLowerGamma,
  sidakLevel,
  standardNormalCdf,
  standardNormalQuantile,
} from "../../../lib/core/reconcile";

function relative(actual: number, expected: number): number {
  return Math.abs(actual - expected) / Math.abs(expected);
}

describe("complementaryErrorFunction", () => {
  it("matches reference values across both branches and the far tail", () => {
    // scipy.special.erfc (from memory): erfc(0.5), erfc(1), erfc(2), erfc(3), erfc(5), erfc(10)
    const cases: [number, number][] = [
      [0.5, 0.4795001221869535],
      [1, 0.15729920705028513],
      [2, 0.004677734981047266],
      [3, 2.209049699858544e-5],
      [5, 1.5374597944280349e-12],
      [10, 2.088487583762545e-45],
    ];
    // tolerance 1e-13 relative (double-precision series and continued fraction)
    for (const [x, value] of cases) expect(relative(complementaryErrorFunction(x), value)).toBeLessThan(1e-13);
    // definition: erfc(−x) = 2 − erfc(x), erfc(0) = 1
    expect(complementaryErrorFunction(-1)).toBeCloseTo(2 - 0.15729920705028513, 15);
    expect(complementaryErrorFunction(0)).toBe(1);
  });
});

describe("standardNormalQuantile", () => {
  it("inverts the normal distribution to about 1e-14", () => {
    // scipy.stats.norm.ppf (from memory): 0.975 → 1.959963984540054, 0.75 → 0.6744897501960817, 1e-10 → −6.361340902404056
    expect(relative(standardNormalQuantile(0.975), 1.959963984540054)).toBeLessThan(1e-14);
    expect(relative(standardNormalQuantile(0.75), 0.6744897501960817)).toBeLessThan(1e-14);
    expect(relative(standardNormalQuantile(1e-10), -6.361340902404056)).toBeLessThan(1e-13);
    // definition: Φ(Φ⁻¹(p)) = p
    for (const p of [1e-6, 0.01, 0.3, 0.5, 0.9, 0.999]) expect(relative(standardNormalCdf(standardNormalQuantile(p)), p)).toBeLessThan(1e-13);
    expect(() => standardNormalQuantile(1.5)).toThrow("probability must be in [0, 1], got 1.5");
  });
});

describe("chiSquareQuantile", () => {
  it("gives χ²₀.₉₅ values of the reference table", () => {
    // simple-statistics chiSquaredDistributionTable (reference library, two decimals), column 0.05, ν = 1..10
    for (let nu = 1; nu <= 10; nu += 1) {
      const table = (chiSquaredDistributionTable as unknown as Record<number, Record<string, number>>)[nu]?.["0.05"];
      expect(table).toBeDefined();
      expect(Math.abs(chiSquareQuantile(0.95, nu) - (table as number))).toBeLessThan(0.006);
    }
  });

  it("is exact to about 1e-12 for ν = 1 (z²) and matches reference values for larger ν", () => {
    // FIELD-NOTES §6: χ²₁(1 − α) = z²(1 − α/2); scipy.stats.chi2.ppf(0.95, 1) = 3.841458820694124 (from memory)
    expect(relative(chiSquareQuantile(0.95, 1), 3.841458820694124)).toBeLessThan(1e-12);
    // scipy.stats.chi2.ppf(0.95, ν) for ν = 3, 10, 30 (from memory)
    expect(relative(chiSquareQuantile(0.95, 3), 7.814727903251178)).toBeLessThan(1e-10);
    expect(relative(chiSquareQuantile(0.95, 10), 18.307038053275146)).toBeLessThan(1e-10);
    expect(relative(chiSquareQuantile(0.95, 30), 43.77297182574219)).toBeLessThan(1e-10);
    // definition: P(ν/2, χ²/2) = p
    expect(regularizedLowerGamma(2.5, chiSquareQuantile(0.999, 5) / 2)).toBeCloseTo(0.999, 12);
  });
});

describe("sidakLevel", () => {
  it("gives the FIELD-NOTES value", () => {
    // FIELD-NOTES §6 [C]: n = 3, α = 0.05 → β = 0.016952
    expect(sidakLevel(0.05, 3)).toBeCloseTo(0.016952, 6);
    // definition: one test keeps its level
    expect(sidakLevel(0.05, 1)).toBeCloseTo(0.05, 15);
  });
});
