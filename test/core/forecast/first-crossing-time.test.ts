import { describe, expect, it } from "vitest";
import { firstCrossingTime } from "../../../lib/core/forecast";

describe("firstCrossingTime", () => {
  it("finds the crossing of a straight line to 1e-4 day", () => {
    // exact: 2t = 7 at t = 3.5
    const time = firstCrossingTime((times) => times.map((t) => 2 * t), 7, 0, 10, 1);
    expect(Math.abs((time as number) - 3.5)).toBeLessThanOrEqual(1e-4);
    expect(firstCrossingTime((times) => times.map((t) => 2 * t), 30, 0, 10, 1)).toBeNull();
    expect(firstCrossingTime((times) => times.map(() => 9), 7, 2, 10, 1)).toBe(2);
  });
});
