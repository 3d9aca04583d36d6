import { describe, expect, it } from "vitest";
import {
  heatBalance,
  meanTemperatureDifference,
  observedU,
  rate,
  type RatingInput,
} from "../../../lib/core/thermal";

/** Recursively freezes an object so any write throws in strict mode (ES modules are strict). */
function deepFreeze<T>(value: T): T {
  if (typeof value === "object" && value !== null) {
    for (const inner of Object.values(value)) {
      deepFreeze(inner);
    }
    Object.freeze(value);
  }
  return value;
}

const INPUT: RatingInput = {
  uWPerM2K: 300,
  areaM2: 80,
  arrangement: { kind: "shell-and-tube", shells: 2 },
  hot: { massFlowKgPerS: 10, heatCapacity: { kind: "linear", interceptJPerKgK: 900, slopeJPerKgK2: 3 }, inletK: 500 },
  cold: { massFlowKgPerS: 8, heatCapacity: { kind: "constant", jPerKgK: 4180 }, inletK: 300 },
};

describe("purity of the thermal core", () => {
  it("rates, balances and back-calculates from frozen inputs without mutating them", () => {
    // STYLE.md: tests freeze inputs to prove purity
    const frozen = deepFreeze(structuredClone(INPUT));
    const rating = rate(frozen);
    expect(rate(structuredClone(INPUT))).toEqual(rating);
    const temperatures = deepFreeze({
      hotInK: frozen.hot.inletK,
      hotOutK: rating.hotOutletK,
      coldInK: frozen.cold.inletK,
      coldOutK: rating.coldOutletK,
    });
    const arrangement = frozen.arrangement;
    expect(() => meanTemperatureDifference(temperatures, arrangement)).not.toThrow();
    expect(() => observedU(deepFreeze({ dutyW: rating.dutyW, areaM2: 80, arrangement, temperatures }))).not.toThrow();
    expect(() =>
      heatBalance(
        deepFreeze({
          hot: { ...frozen.hot, outletK: rating.hotOutletK },
          cold: { ...frozen.cold, outletK: rating.coldOutletK },
        }),
      ),
    ).not.toThrow();
    expect(frozen).toEqual(INPUT);
  });

  it("gives identical results on repeated calls", () => {
    // no hidden state: same input, same output
    expect(rate(INPUT)).toEqual(rate(structuredClone(INPUT)));
  });
});
