import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { optimalCleaningInterval, relativeCycleValue } from "../../../lib/core/economics";
import { forecastFromCostRate, unitEconomics } from "./support";

describe("relativeCycleValue", () => {
  const economics = unitEconomics(10_000);
  const forecast = forecastFromCostRate((t) => 50 * t);
  const steady = optimalCleaningInterval(economics, forecast, { includeDowntime: false });

  it("is zero for a freshly cleaned exchanger on its own steady cycle", () => {
    // definition: h(0) = ∫₀^τ* (c − J*) dt + C − J*·τd = 0 because J* = (C + ∫₀^τ* c)/(τ* + τd)
    expect(Math.abs(relativeCycleValue(economics, forecast, steady, 0))).toBeLessThan(1e-6);
  });

  it("follows the closed form for a linear loss", () => {
    // closed form (c = a·t, τ* = 20, J* = 1000, C = 10000, FIELD-NOTES §5 [C]):
    // h(s) = C + a(τ*² − s²)/2 − J*(τ* − s) for s ≤ τ*, and h(s) = C beyond (clean at once)
    for (const s of [0, 5, 12.5, 19.9]) {
      const expected = 10_000 + 25 * (400 - s * s) - 1000 * (20 - s);
      expect(relativeCycleValue(economics, forecast, steady, s)).toBeCloseTo(expected, 4);
    }
    expect(relativeCycleValue(economics, forecast, steady, 30)).toBeCloseTo(10_000, 6);
  });

  it("never decreases with age for a non-decreasing loss", () => {
    // property of the relative value: dh/ds = J* − c(s) for s before the crossing, and 0 after (FIELD-NOTES §5 model)
    fc.assert(
      fc.property(fc.double({ min: 0, max: 40, noNaN: true }), fc.double({ min: 0, max: 40, noNaN: true }), (a, b) => {
        const [young, old] = a <= b ? [a, b] : [b, a];
        expect(relativeCycleValue(economics, forecast, steady, old)).toBeGreaterThanOrEqual(
          relativeCycleValue(economics, forecast, steady, young) - 1e-6,
        );
      }),
      { seed: 3, numRuns: 60 },
    );
  });

  it("subtracts the steady average over the downtime", () => {
    // definition: with τd > 0, h(s ≥ τ*) = C − J*·τd
    const withDowntime = unitEconomics(10_000, 5);
    const downtimeSteady = optimalCleaningInterval(withDowntime, forecast);
    expect(relativeCycleValue(withDowntime, forecast, downtimeSteady, 40)).toBeCloseTo(
      10_000 - downtimeSteady.averageCostPerDay * 5,
      6,
    );
  });
});
