import { describe, expect, it } from "vitest";
import { faultActive, instrumentFaultEffect, type PlannedFault } from "../../../lib/core/simulate";

const DAY_MS = 86_400_000;
const DRIFT: PlannedFault = { role: "coldOut", kind: "drift", startMs: 0, endMs: 40 * DAY_MS, size: 6, rampMs: 21 * DAY_MS, description: "" };

describe("instrumentFaultEffect", () => {
  it("drifts linearly to its full size over the ramp and then stays", () => {
    expect(instrumentFaultEffect(DRIFT, 0, 300, 0)).toBe(300);
    expect(instrumentFaultEffect(DRIFT, 10.5 * DAY_MS, 300, 0)).toBeCloseTo(303, 12);
    expect(instrumentFaultEffect(DRIFT, 21 * DAY_MS, 300, 0)).toBe(306);
    expect(instrumentFaultEffect(DRIFT, 30 * DAY_MS, 300, 0)).toBe(306);
  });

  it("applies bias, scale and stuck faults", () => {
    const base = { role: "hotFlow" as const, startMs: 0, endMs: null, description: "" };
    expect(instrumentFaultEffect({ ...base, kind: "bias", size: -2 }, 5, 20, 0)).toBe(18);
    expect(instrumentFaultEffect({ ...base, kind: "scale", size: 0.08 }, 5, 20, 0)).toBeCloseTo(21.6, 12);
    expect(instrumentFaultEffect({ ...base, kind: "stuck", size: 0 }, 5, 20, 17.5)).toBe(17.5);
  });
});

describe("faultActive", () => {
  it("includes the start, excludes the end, and never ends with a null end", () => {
    expect(faultActive(DRIFT, -1)).toBe(false);
    expect(faultActive(DRIFT, 0)).toBe(true);
    expect(faultActive(DRIFT, 40 * DAY_MS)).toBe(false);
    expect(faultActive({ ...DRIFT, endMs: null }, 1e15)).toBe(true);
  });
});
