import { describe, expect, it } from "vitest";
import { deriveSeed, seededRandom } from "../../../lib/core/simulate";

const SAMPLES = 100_000;

describe("seededRandom", () => {
  it("gives the same sequence for the same seed and a different one for another seed", () => {
    const first = seededRandom(42);
    const second = seededRandom(42);
    const other = seededRandom(43);
    const a = Array.from({ length: 1000 }, () => first.normal());
    const b = Array.from({ length: 1000 }, () => second.normal());
    const c = Array.from({ length: 1000 }, () => other.normal());
    expect(b).toEqual(a);
    expect(c).not.toEqual(a);
  });

  it("draws uniform numbers in [0, 1) with mean 1/2 and variance 1/12", () => {
    const random = seededRandom(7);
    let sum = 0;
    let sumSquares = 0;
    let lowest = Number.POSITIVE_INFINITY;
    let highest = Number.NEGATIVE_INFINITY;
    for (let index = 0; index < SAMPLES; index += 1) {
      const value = random.uniform();
      lowest = Math.min(lowest, value);
      highest = Math.max(highest, value);
      sum += value;
      sumSquares += value * value;
    }
    expect(lowest).toBeGreaterThanOrEqual(0);
    expect(highest).toBeLessThan(1);
    const mean = sum / SAMPLES;
    const variance = sumSquares / SAMPLES - mean * mean;
    // Uniform(0,1): mean 1/2, variance 1/12 (textbook). Standard error of the mean sqrt(1/12/1e5) = 9.1e-4,
    // so 0.005 is about 5.5 standard errors; variance tolerance 0.002 is about 7 standard errors (sd of the
    // sample variance of U(0,1) is sqrt((1/80 - 1/144)/1e5) = 2.4e-4).
    expect(Math.abs(mean - 0.5)).toBeLessThan(0.005);
    expect(Math.abs(variance - 1 / 12)).toBeLessThan(0.002);
  });

  it("draws standard normal numbers with mean 0 and variance 1 (Box–Muller)", () => {
    const random = seededRandom(2024);
    let sum = 0;
    let sumSquares = 0;
    let sumCubes = 0;
    let sumFourth = 0;
    for (let index = 0; index < SAMPLES; index += 1) {
      const value = random.normal();
      sum += value;
      sumSquares += value * value;
      sumCubes += value ** 3;
      sumFourth += value ** 4;
    }
    const mean = sum / SAMPLES;
    const variance = sumSquares / SAMPLES - mean * mean;
    // Tolerances for 1e5 samples: standard error of the mean 1/sqrt(1e5) = 0.0032 -> 0.015 is about 5 standard
    // errors; sd of the sample variance sqrt(2/1e5) = 0.0045 -> 0.025 is about 5.6 (normal-theory, textbook).
    expect(Math.abs(mean)).toBeLessThan(0.015);
    expect(Math.abs(variance - 1)).toBeLessThan(0.025);
    // Skewness 0 and kurtosis 3 for a normal distribution (textbook); sd of the sample skewness sqrt(6/n) = 0.0077
    // and of the kurtosis sqrt(24/n) = 0.015, tolerances about 6 standard errors.
    expect(Math.abs(sumCubes / SAMPLES)).toBeLessThan(0.05);
    expect(Math.abs(sumFourth / SAMPLES - 3)).toBeLessThan(0.1);
  });

  it("draws integers over the whole inclusive range", () => {
    const random = seededRandom(5);
    const counts = new Map<number, number>();
    for (let index = 0; index < 6000; index += 1) {
      const value = random.integer(1, 6);
      counts.set(value, (counts.get(value) ?? 0) + 1);
    }
    expect([...counts.keys()].sort()).toEqual([1, 2, 3, 4, 5, 6]);
    // Each face expects 1000; binomial sd sqrt(6000·(1/6)·(5/6)) = 28.9, so ±150 is about 5 sd.
    for (const count of counts.values()) expect(Math.abs(count - 1000)).toBeLessThan(150);
  });

  it("rejects a seed that is not finite", () => {
    expect(() => seededRandom(Number.NaN)).toThrow("seededRandom: seed must be a finite number, got NaN");
  });
});

describe("deriveSeed", () => {
  it("is deterministic and separates labels and parents", () => {
    expect(deriveSeed(1, "noise")).toBe(deriveSeed(1, "noise"));
    const seeds = new Set([deriveSeed(1, "noise"), deriveSeed(1, "gaps"), deriveSeed(2, "noise"), deriveSeed(2, "gaps")]);
    expect(seeds.size).toBe(4);
    for (const seed of seeds) {
      expect(Number.isInteger(seed)).toBe(true);
      expect(seed).toBeGreaterThanOrEqual(0);
      expect(seed).toBeLessThan(2 ** 32);
    }
  });

  it("gives streams that are uncorrelated", () => {
    const first = seededRandom(deriveSeed(9, "a"));
    const second = seededRandom(deriveSeed(9, "b"));
    let product = 0;
    for (let index = 0; index < SAMPLES; index += 1) product += first.normal() * second.normal();
    // Sample correlation of independent normals has sd 1/sqrt(n) = 0.0032; 0.015 is about 5 sd.
    expect(Math.abs(product / SAMPLES)).toBeLessThan(0.015);
  });
});
