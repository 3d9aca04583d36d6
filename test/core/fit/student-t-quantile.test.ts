import { describe, expect, it } from "vitest";
import { studentTQuantile } from "../../../lib/core/fit";

describe("studentTQuantile", () => {
  it("matches the tabulated two-sided 95 % values", () => {
    // FIELD-NOTES §8 [C] scipy 1.17.1: 12.7062047, 4.3026527, 2.5705818, 2.2281389, 2.0422725 (7 decimals printed)
    const expected: [number, number][] = [[1, 12.7062047], [2, 4.3026527], [5, 2.5705818], [10, 2.2281389], [30, 2.0422725]];
    for (const [dof, value] of expected) expect(Math.abs(studentTQuantile(0.975, dof) - value)).toBeLessThan(5e-8);
    // the brief: t(0.975, 10) = 2.2281388519862744 from @stdlib 0.2.3
    expect(studentTQuantile(0.975, 10)).toBe(2.2281388519862744);
  });

  it("rejects a probability outside (0, 1)", () => {
    expect(() => studentTQuantile(1, 3)).toThrow("studentTQuantile: probability must be in (0, 1), got 1");
  });
});
