import { describe, expect, it } from "vitest";
import { cycleLostEnergy, referenceRating } from "../../../lib/core/forecast";
import { fitTrendModel } from "../../../lib/core/trend";
import { CONDITIONS } from "./reference-conditions";

describe("cycleLostEnergy", () => {
  it("integrates a constant duty loss exactly", () => {
    // constant Rf = 3e-4 for 10 days: E = (Q(0) − Q(3e-4))·10·86400 s (trapezoid is exact for a constant)
    const constant = fitTrendModel("linear", { timeDays: [0, 1, 2, 3], foulingM2KPerW: [3e-4, 3e-4, 3e-4, 3e-4] })!;
    const loss = referenceRating(CONDITIONS, 0).dutyW - referenceRating(CONDITIONS, 3e-4).dutyW;
    expect(Math.abs(cycleLostEnergy(CONDITIONS, constant, 0, 10) / (loss * 10 * 86_400) - 1)).toBeLessThan(1e-9);
    expect(cycleLostEnergy(CONDITIONS, constant, 5, 5)).toBe(0);
  });
});
