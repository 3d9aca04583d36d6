import { describe, expect, it } from "vitest";
import { heatBalance, streamDuty, ThermalInputError } from "../../../lib/core/thermal";
import { relativeError } from "./relative-error";

const WATER = { kind: "constant", jPerKgK: 4180 } as const;
const OIL = { kind: "linear", interceptJPerKgK: 800, slopeJPerKgK2: 3.5 } as const;

describe("streamDuty", () => {
  it("is m·cp·|ΔT| for a constant specific heat", () => {
    // 2 kg/s · 4180 J/(kg·K) · 10 K = 83 600 W (energy balance, computed)
    expect(streamDuty({ massFlowKgPerS: 2, heatCapacity: WATER, inletK: 300, outletK: 310 })).toBeCloseTo(83600, 9);
  });

  it("is a magnitude, the same for heating and cooling", () => {
    // definition in this module: |∫cp dT|
    const heating = streamDuty({ massFlowKgPerS: 2, heatCapacity: OIL, inletK: 300, outletK: 400 });
    const cooling = streamDuty({ massFlowKgPerS: 2, heatCapacity: OIL, inletK: 400, outletK: 300 });
    expect(heating).toBe(cooling);
  });

  it("integrates a linear specific heat exactly", () => {
    // m·[a(T2 − T1) + b(T2² − T1²)/2] = 1.5·[800·100 + 3.5·(400² − 300²)/2] = 1.5·202 500 = 303 750 W (computed)
    const duty = streamDuty({ massFlowKgPerS: 1.5, heatCapacity: OIL, inletK: 400, outletK: 300 });
    expect(relativeError(duty, 303750)).toBeLessThan(1e-14);
  });

  it("rejects zero flow", () => {
    expect(() => streamDuty({ massFlowKgPerS: 0, heatCapacity: WATER, inletK: 300, outletK: 310 })).toThrow(
      "mass flow must be positive, got 0 kg/s",
    );
  });
});

describe("heatBalance", () => {
  it("reports both duties, their mean, the imbalance and the closure", () => {
    // hot 1.5 kg/s oil 400→300 K: 303 750 W (above); cold 2 kg/s water 300→336 K: 300 960 W (computed)
    const balance = heatBalance({
      hot: { massFlowKgPerS: 1.5, heatCapacity: OIL, inletK: 400, outletK: 300 },
      cold: { massFlowKgPerS: 2, heatCapacity: WATER, inletK: 300, outletK: 336 },
    });
    expect(relativeError(balance.hotDutyW, 303750)).toBeLessThan(1e-14);
    expect(relativeError(balance.coldDutyW, 300960)).toBeLessThan(1e-13);
    expect(relativeError(balance.meanDutyW, 302355)).toBeLessThan(1e-13);
    expect(relativeError(balance.imbalanceW, 2790)).toBeLessThan(1e-9);
    expect(relativeError(balance.closure, 2790 / 302355)).toBeLessThan(1e-9);
  });

  it("gives zero closure when nothing is transferred", () => {
    // convention of this module: 0/0 closure reported as 0
    const balance = heatBalance({
      hot: { massFlowKgPerS: 1, heatCapacity: WATER, inletK: 350, outletK: 350 },
      cold: { massFlowKgPerS: 1, heatCapacity: WATER, inletK: 300, outletK: 300 },
    });
    expect(balance.closure).toBe(0);
  });

  it("names the side of a bad stream", () => {
    try {
      heatBalance({
        hot: { massFlowKgPerS: -2, heatCapacity: WATER, inletK: 350, outletK: 330 },
        cold: { massFlowKgPerS: 1, heatCapacity: WATER, inletK: 300, outletK: 310 },
      });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(ThermalInputError);
      expect((error as ThermalInputError).quantity).toBe("hot mass flow");
      expect((error as ThermalInputError).value).toBe(-2);
      expect((error as Error).message).toBe("hot mass flow must be positive, got -2 kg/s");
    }
  });
});
