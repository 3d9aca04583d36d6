import { describe, expect, it } from "vitest";
import { referenceDuty, referenceDutyCurve } from "../../../lib/core/simulate";
import { fixturePlan, fixtureSpec } from "./fixture-exchanger";

describe("referenceDutyCurve", () => {
  it("matches direct rating to 1e-10 relative inside its range and falls back to it outside", () => {
    const spec = fixtureSpec();
    const parameters = fixturePlan().cleanCoefficient;
    const curve = referenceDutyCurve(spec, parameters, 1e-5, 2e-3);
    for (let index = 0; index <= 400; index += 1) {
      const fouling = 1e-5 + ((2e-3 - 1e-5) * index) / 400 + 1.234e-7 * (index % 3);
      const exact = referenceDuty(spec, parameters, fouling);
      // The interpolant is accepted only if within 1e-10 at its check points; 1e-9 leaves room between them.
      expect(Math.abs(curve(fouling) - exact) / exact).toBeLessThan(1e-9);
    }
    expect(curve(5e-3)).toBe(referenceDuty(spec, parameters, 5e-3));
  });

  it("decreases as fouling grows", () => {
    const curve = referenceDutyCurve(fixtureSpec(), fixturePlan().cleanCoefficient, 0, 3e-3);
    let previous = Number.POSITIVE_INFINITY;
    for (let fouling = 0; fouling <= 3e-3; fouling += 1e-5) {
      const duty = curve(fouling);
      expect(duty).toBeLessThan(previous);
      previous = duty;
    }
  });
});
