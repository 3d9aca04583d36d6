import { describe, expect, it } from "vitest";
import { detectSpikeBursts } from "../../../lib/core/faults";
import type { ExchangerModel, InstrumentRole } from "../../../lib/core/screening";

const HOUR_MS = 3_600_000;
const DAY_HOURS = 24;
const MODEL: ExchangerModel = {
  arrangement: { kind: "counterflow" },
  areaM2: 10,
  hotHeatCapacity: { kind: "constant", jPerKgK: 2000 },
  coldHeatCapacity: { kind: "constant", jPerKgK: 4181 },
  instruments: (["hotIn", "hotOut", "coldIn", "coldOut", "hotFlow", "coldFlow"] as const).map((role) => ({ role, tag: `X-${role}`, standardUncertainty: 1 })),
};

function flagsAt(count: number, role: InstrumentRole, hours: number[]): Record<InstrumentRole, Uint8Array> {
  const empty = () => new Uint8Array(count);
  const flags = { hotIn: empty(), hotOut: empty(), coldIn: empty(), coldOut: empty(), hotFlow: empty(), coldFlow: empty() };
  for (const hour of hours) flags[role][hour] = 1;
  return flags;
}

describe("detectSpikeBursts", () => {
  const count = 60 * DAY_HOURS;
  const time = Float64Array.from({ length: count }, (_, index) => index * HOUR_MS);

  it("raises a spikes alert for five outliers within seven days, not for four", () => {
    const five = [100, 130, 160, 200, 250];
    const [alert, ...rest] = detectSpikeBursts(time, flagsAt(count, "coldOut", five), MODEL);
    expect(rest).toHaveLength(0);
    // brief: ≥ 5 Hampel outliers in 7 days; alert from the first to one step after the last, size = count
    expect(alert).toMatchObject({ role: "coldOut", kind: "spikes", startMs: 100 * HOUR_MS, endMs: 251 * HOUR_MS, detectedMs: 250 * HOUR_MS, size: 5, sizeUnit: "count" });
    expect(detectSpikeBursts(time, flagsAt(count, "coldOut", five.slice(0, 4)), MODEL)).toHaveLength(0);
    // definition: five outliers spread over more than 7 days are isolated spikes, not a burst
    expect(detectSpikeBursts(time, flagsAt(count, "coldOut", [0, 50, 100, 150, 200 + 7 * DAY_HOURS]), MODEL)).toHaveLength(0);
  });

  it("keeps the alert open when the spikes go on to the end of the data", () => {
    const hours = [count - 100, count - 80, count - 60, count - 40, count - 20, count - 5];
    const [alert] = detectSpikeBursts(time, flagsAt(count, "hotFlow", hours), MODEL);
    expect(alert).toMatchObject({ role: "hotFlow", endMs: null, size: 6 });
  });

  it("raises the threshold when a window holds many samples (one-minute data)", () => {
    const minutes = 8 * DAY_HOURS * 60;
    const minuteTime = Float64Array.from({ length: minutes }, (_, index) => index * 60_000);
    const hours = Array.from({ length: 30 }, (_, k) => 1000 + k * 300);
    // definition: λ = 0.003 × 10 080 samples = 30.2 false flags expected per week, threshold ⌈λ + 4√λ⌉ = 53
    expect(detectSpikeBursts(minuteTime, flagsAt(minutes, "hotIn", hours), MODEL)).toHaveLength(0);
  });
});
