import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { criticalFoulingResistance, referenceRating } from "../../../lib/core/forecast";
import { CMIN, CONDITIONS, counterflowFouling } from "./reference-conditions";

describe("criticalFoulingResistance", () => {
  it("inverts the counterflow ε–NTU relation for a duty threshold", () => {
    // Kays & London counterflow ε–NTU relation and its closed-form inverse (Incropera 6e Tables 11.3/11.4, FIELD-NOTES §2)
    const clean = referenceRating(CONDITIONS, 0).dutyW;
    const threshold = 0.85 * clean;
    const critical = criticalFoulingResistance(CONDITIONS, { kind: "duty", minimumDutyW: threshold });
    expect(critical.status).toBe("found");
    const expected = counterflowFouling(threshold / (CMIN * 100));
    // bisection to 1e-10 relative (criticalFoulingResistance); 1e-8 relative leaves room for the ε–NTU round-off
    expect(Math.abs((critical.foulingM2KPerW as number) / expected - 1)).toBeLessThan(1e-8);
  });

  it("finds the Rf at which the cold outlet falls to a minimum and the hot outlet rises to a maximum", () => {
    // energy balance: t_co = t_ci + Q/C_c and T_ho = T_hi − Q/C_h, then the same closed-form inverse
    const coldLimit = criticalFoulingResistance(CONDITIONS, { kind: "cold-outlet", minimumK: 340 });
    expect(Math.abs((coldLimit.foulingM2KPerW as number) / counterflowFouling((40 * 32_000) / (CMIN * 100)) - 1)).toBeLessThan(1e-8);
    const hotLimit = criticalFoulingResistance(CONDITIONS, { kind: "hot-outlet", maximumK: 340 });
    expect(Math.abs((hotLimit.foulingM2KPerW as number) / counterflowFouling((60 * 20_000) / (CMIN * 100)) - 1)).toBeLessThan(1e-8);
  });

  it("returns the allowance itself, or says when a limit is broken even clean or never", () => {
    expect(criticalFoulingResistance(CONDITIONS, { kind: "fouling-allowance", allowanceM2KPerW: 5e-4 })).toEqual({ foulingM2KPerW: 5e-4, status: "found" });
    const clean = referenceRating(CONDITIONS, 0).dutyW;
    expect(criticalFoulingResistance(CONDITIONS, { kind: "duty", minimumDutyW: clean * 1.01 }).status).toBe("broken-when-clean");
    expect(criticalFoulingResistance(CONDITIONS, { kind: "duty", minimumDutyW: 1 })).toEqual({ foulingM2KPerW: null, status: "never-broken" });
  });
});

describe("criticalFoulingResistance (properties)", () => {
  it("falls as the duty threshold rises and rates back to the threshold", () => {
    // monotonicity of the rating in Rf (ε rises with NTU): a higher threshold is reached at a lower Rf
    const clean = referenceRating(CONDITIONS, 0).dutyW;
    fc.assert(
      fc.property(fc.double({ min: 0.3, max: 0.98, noNaN: true }), fc.double({ min: 0.3, max: 0.98, noNaN: true }), (a, b) => {
        fc.pre(Math.abs(a - b) > 1e-3);
        const low = criticalFoulingResistance(CONDITIONS, { kind: "duty", minimumDutyW: Math.min(a, b) * clean });
        const high = criticalFoulingResistance(CONDITIONS, { kind: "duty", minimumDutyW: Math.max(a, b) * clean });
        expect(low.foulingM2KPerW as number).toBeGreaterThan(high.foulingM2KPerW as number);
        // round trip: rating at Rf* gives the threshold to the bisection tolerance (1e-10 relative in Rf)
        const duty = referenceRating(CONDITIONS, high.foulingM2KPerW as number).dutyW;
        expect(Math.abs(duty / (Math.max(a, b) * clean) - 1)).toBeLessThan(1e-8);
      }),
      { numRuns: 50 },
    );
  });
});
