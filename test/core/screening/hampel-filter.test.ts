import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { hampelDeviations, hampelFilter, MAD_SCALE_FACTOR } from "../../../lib/core/screening";
import { standardNormalQuantile } from "../../../lib/core/reconcile";
import { seededRandom } from "../../../lib/core/simulate";

/** Brute-force Hampel deviations (sort every window), the reference for the sliding implementation. */
function bruteForceDeviations(values: Float64Array, halfWidth: number, floor: number): Float64Array {
  const result = new Float64Array(values.length).fill(Number.NaN);
  const median = (sorted: number[]): number =>
    sorted.length % 2 === 1 ? (sorted[sorted.length >> 1] as number) : ((sorted[sorted.length / 2 - 1] as number) + (sorted[sorted.length / 2] as number)) / 2;
  for (let index = 0; index < values.length; index += 1) {
    if (!Number.isFinite(values[index] as number)) continue;
    const window: number[] = [];
    for (let j = Math.max(0, index - halfWidth); j <= Math.min(values.length - 1, index + halfWidth); j += 1) {
      if (Number.isFinite(values[j] as number)) window.push(values[j] as number);
    }
    if (window.length < halfWidth + 1) continue;
    window.sort((a, b) => a - b);
    const centre = median(window);
    const spread = median(window.map((value) => Math.abs(value - centre)).sort((a, b) => a - b));
    const scale = Math.max(1.4826 * spread, floor);
    const distance = Math.abs((values[index] as number) - centre);
    result[index] = distance === 0 ? 0 : scale > 0 ? distance / scale : Number.POSITIVE_INFINITY;
  }
  return result;
}

describe("MAD_SCALE_FACTOR", () => {
  it("is 1/Φ⁻¹(3/4) to the four decimals quoted", () => {
    // Rousseeuw & Croux (1993), J. Am. Stat. Assoc. 88:1273, Eq. 1 (from memory): b = 1/Φ⁻¹(3/4) = 1.4826
    expect(MAD_SCALE_FACTOR).toBeCloseTo(1 / standardNormalQuantile(0.75), 4);
  });
});

describe("hampelFilter", () => {
  const random = seededRandom(7);
  const noisy = Float64Array.from({ length: 200 }, (_, index) => 350 + 0.5 * random.normal() + 0.01 * index);

  it("flags an injected spike and nothing else on quiet data", () => {
    const values = Float64Array.from(noisy);
    values[100] = (values[100] as number) + 15;
    const flags = hampelFilter(values, { minimumScale: 0.5 });
    // simulation with known truth: a 30 σ spike is flagged
    expect(flags[100]).toBe(1);
    // simulation with known truth: with a 3 σ floor on the threshold, normal noise is flagged at most ~0.3 % of the time
    expect(flags.reduce((sum, value) => sum + value, 0)).toBeLessThanOrEqual(2);
  });

  it("does not flag a step change", () => {
    const values = noisy.map((value, index) => value + (index >= 100 ? 20 : 0));
    const flags = hampelFilter(values, { minimumScale: 0.5 });
    // Pearson (2002): a step is not an outlier to the moving-window identifier, each side holding the majority
    expect(Array.from(flags.slice(94, 107)).every((flag) => flag === 0)).toBe(true);
  });

  it("never flags missing values and leaves its input unchanged", () => {
    const values = Float64Array.from(noisy);
    values[50] = Number.NaN;
    const copy = Float64Array.from(values);
    const flags = hampelFilter(values);
    // definition: a missing value is not judged
    expect(flags[50]).toBe(0);
    expect(values).toEqual(copy);
  });

  it("matches a brute-force implementation on random data with gaps (property)", () => {
    fc.assert(
      fc.property(
        fc.array(fc.oneof(fc.double({ min: -5, max: 5, noNaN: true }), fc.constant(Number.NaN), fc.constant(1)), { minLength: 1, maxLength: 80 }),
        fc.integer({ min: 1, max: 8 }),
        fc.constantFrom(0, 0.3),
        (list, halfWidth, floor) => {
          const values = Float64Array.from(list);
          const fast = hampelDeviations(values, { halfWidth, minimumScale: floor });
          const slow = bruteForceDeviations(values, halfWidth, floor);
          for (let index = 0; index < values.length; index += 1) {
            const a = fast[index] as number;
            const b = slow[index] as number;
            // definition: identical statistic (exact up to rounding of the mean of the two middle values)
            if (!(Object.is(a, b) || Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(b)))) return false;
          }
          return true;
        },
      ),
      { numRuns: 300 },
    );
  });

  it("rejects a bad half-width or threshold", () => {
    expect(() => hampelFilter(new Float64Array(3), { halfWidth: 0 })).toThrow("half-width must be a positive integer, got 0");
    expect(() => hampelFilter(new Float64Array(3), { threshold: -1 })).toThrow("threshold must be positive, got -1");
  });
});
