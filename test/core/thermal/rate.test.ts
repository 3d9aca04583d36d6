import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  meanTemperatureDifference,
  observedU,
  rate,
  streamDuty,
  ThermalInputError,
  type Arrangement,
  type HeatCapacity,
  type RatingInput,
} from "../../../lib/core/thermal";
import { kelvin, relativeError } from "./relative-error";

const ARRANGEMENTS: readonly { name: string; arrangement: Arrangement }[] = [
  { name: "counterflow", arrangement: { kind: "counterflow" } },
  { name: "parallel", arrangement: { kind: "parallel" } },
  { name: "1 shell", arrangement: { kind: "shell-and-tube", shells: 1 } },
  { name: "2 shells", arrangement: { kind: "shell-and-tube", shells: 2 } },
  { name: "4 shells", arrangement: { kind: "shell-and-tube", shells: 4 } },
  { name: "crossflow both unmixed", arrangement: { kind: "crossflow-unmixed" } },
  { name: "crossflow hot mixed", arrangement: { kind: "crossflow-mixed", mixedStream: "hot" } },
  { name: "crossflow cold mixed", arrangement: { kind: "crossflow-mixed", mixedStream: "cold" } },
];

const HOT_CP = 2300;
const COLD_CP = 4180;
const MINIMUM_RATE_W_PER_K = 5000;
const AREA_M2 = 25;

/** Streams with a chosen Cmin side and capacity ratio, constant cp; hot 450 K, cold 300 K. */
function ratingInput(arrangement: Arrangement, ntu: number, capacityRatio: number, cminStream: "hot" | "cold"): RatingInput {
  const maximumRate = MINIMUM_RATE_W_PER_K / capacityRatio;
  const hotRate = cminStream === "hot" ? MINIMUM_RATE_W_PER_K : maximumRate;
  const coldRate = cminStream === "cold" ? MINIMUM_RATE_W_PER_K : maximumRate;
  return {
    uWPerM2K: (ntu * MINIMUM_RATE_W_PER_K) / AREA_M2,
    areaM2: AREA_M2,
    arrangement,
    hot: { massFlowKgPerS: hotRate / HOT_CP, heatCapacity: { kind: "constant", jPerKgK: HOT_CP }, inletK: 450 },
    cold: { massFlowKgPerS: coldRate / COLD_CP, heatCapacity: { kind: "constant", jPerKgK: COLD_CP }, inletK: 300 },
  };
}

describe("rate", () => {
  it("reproduces Holman Example 10-9 (steam mixed, oil unmixed crossflow) as worked in the ht doctest", () => {
    // Holman, Heat Transfer 10e, Example 10-9, as computed in the CalebBell/ht hx.py effectiveness_from_NTU doctest:
    // Cr = 0.1424214226633, NTU = 2.16007259528, ε = 0.831218036142, Q = 131675.3271504 W,
    // t_co = 110.5900741563 °C, T_ho = 116.3859256461 °C (read in the ht source during this work)
    const rating = rate({
      uWPerM2K: 275,
      areaM2: 10.82,
      arrangement: { kind: "crossflow-mixed", mixedStream: "hot" },
      hot: { massFlowKgPerS: 5.2, heatCapacity: { kind: "constant", jPerKgK: 1860 }, inletK: kelvin(130) },
      cold: { massFlowKgPerS: 0.725, heatCapacity: { kind: "constant", jPerKgK: 1900 }, inletK: kelvin(15) },
    });
    expect(rating.cminStream).toBe("cold");
    expect(relativeError(rating.capacityRatio, 0.1424214226633)).toBeLessThan(1e-12);
    expect(relativeError(rating.ntu, 2.16007259528)).toBeLessThan(1e-11);
    expect(relativeError(rating.effectiveness, 0.831218036142)).toBeLessThan(1e-11);
    expect(relativeError(rating.dutyW, 131675.3271504)).toBeLessThan(1e-12);
    // printed to 10 decimals in °C; kelvin offset adds ~1e-13 K of rounding
    expect(Math.abs(rating.coldOutletK - kelvin(110.5900741563))).toBeLessThan(1e-9);
    expect(Math.abs(rating.hotOutletK - kelvin(116.3859256461))).toBeLessThan(1e-9);
  });

  it.each(ARRANGEMENTS)(
    "agrees with U·A·F·LMTD from its own outlet temperatures over a grid of NTU, Cr and Cmin side ($name)",
    ({ arrangement }) => {
      // THE KEY IDENTITY: ε–NTU rating (Incropera 6e Table 11.3) and the F·LMTD method (Bowman–Mueller–Nagle /
      // Fakheri 2003 for shells, F = NTU_cf/NTU otherwise) describe the same exchanger. Required agreement 1e-6;
      // checked to 1e-9 (worst seen 3e-12, parallel flow at NTU = 6, Cr = 1, where T_ho − t_co is 1e-3 K)
      for (const ntu of [0.05, 0.3, 1, 2.5, 6]) {
        for (const capacityRatio of [0.1, 0.4, 0.75, 1]) {
          for (const cminStream of ["hot", "cold"] as const) {
            const input = ratingInput(arrangement, ntu, capacityRatio, cminStream);
            const rating = rate(input);
            const temperatures = {
              hotInK: input.hot.inletK,
              hotOutK: rating.hotOutletK,
              coldInK: input.cold.inletK,
              coldOutK: rating.coldOutletK,
            };
            const mean = meanTemperatureDifference(temperatures, arrangement);
            const viaLMTD = input.uWPerM2K * input.areaM2 * mean.meanK;
            expect(relativeError(viaLMTD, rating.dutyW)).toBeLessThan(1e-9);
            expect(relativeError(rating.ntu, ntu)).toBeLessThan(1e-12);
            expect(relativeError(rating.capacityRatio, capacityRatio)).toBeLessThan(1e-12);
            if (capacityRatio < 1) {
              expect(rating.cminStream).toBe(cminStream);
            }
          }
        }
      }
    },
  );

  it.each(ARRANGEMENTS)("returns outlets whose observed U is the U it was given ($name)", ({ arrangement }) => {
    // observedU inverts rate: U = Q/(A·F·LMTD) (Incropera 6e Sect. 11.3); property test over NTU, Cr, Cmin side
    fc.assert(
      fc.property(
        fc.double({ min: 0.05, max: 5, noNaN: true }),
        fc.double({ min: 0.05, max: 1, noNaN: true }),
        fc.constantFrom("hot" as const, "cold" as const),
        (ntu, capacityRatio, cminStream) => {
          const input = ratingInput(arrangement, ntu, capacityRatio, cminStream);
          const rating = rate(input);
          const observed = observedU({
            dutyW: rating.dutyW,
            areaM2: input.areaM2,
            arrangement,
            temperatures: {
              hotInK: input.hot.inletK,
              hotOutK: rating.hotOutletK,
              coldInK: input.cold.inletK,
              coldOutK: rating.coldOutletK,
            },
          });
          return relativeError(observed.uWPerM2K, input.uWPerM2K) < 1e-6;
        },
      ),
      { numRuns: 40 },
    );
  });

  it("conserves energy with a temperature-dependent specific heat", () => {
    // energy balance: hot enthalpy drop = cold enthalpy rise; converged to 1e-9 K, so 1e-9 relative is ample
    const crude: HeatCapacity = { kind: "linear", interceptJPerKgK: 800, slopeJPerKgK2: 3.5 };
    const water: HeatCapacity = { kind: "linear", interceptJPerKgK: 3800, slopeJPerKgK2: 1.1 };
    for (const arrangement of ARRANGEMENTS.map((entry) => entry.arrangement)) {
      const input: RatingInput = {
        uWPerM2K: 350,
        areaM2: 120,
        arrangement,
        hot: { massFlowKgPerS: 12, heatCapacity: crude, inletK: 520 },
        cold: { massFlowKgPerS: 9, heatCapacity: water, inletK: 300 },
      };
      const rating = rate(input);
      const hotDuty = streamDuty({ ...input.hot, outletK: rating.hotOutletK });
      const coldDuty = streamDuty({ ...input.cold, outletK: rating.coldOutletK });
      expect(relativeError(hotDuty, coldDuty)).toBeLessThan(1e-9);
      // the duty returned is streamDuty() of the hot side (documented contract)
      expect(rating.dutyW).toBe(hotDuty);
    }
  });

  it("gives the constant-cp result for a linear fit with zero slope", () => {
    // a linear fit with slope 0 is a constant (definition)
    const constant = ratingInput({ kind: "crossflow-unmixed" }, 1.7, 0.6, "hot");
    const linear: RatingInput = {
      ...constant,
      hot: { ...constant.hot, heatCapacity: { kind: "linear", interceptJPerKgK: HOT_CP, slopeJPerKgK2: 0 } },
    };
    const fromConstant = rate(constant);
    const fromLinear = rate(linear);
    expect(relativeError(fromLinear.dutyW, fromConstant.dutyW)).toBeLessThan(1e-14);
    expect(Math.abs(fromLinear.hotOutletK - fromConstant.hotOutletK)).toBeLessThan(1e-12);
  });

  it("reports the cold stream as Cmin when the capacity rates are equal", () => {
    // documented tie rule (the relations coincide at Cr = 1)
    const input: RatingInput = {
      uWPerM2K: 100,
      areaM2: 10,
      arrangement: { kind: "counterflow" },
      hot: { massFlowKgPerS: 1, heatCapacity: { kind: "constant", jPerKgK: 2000 }, inletK: 400 },
      cold: { massFlowKgPerS: 0.5, heatCapacity: { kind: "constant", jPerKgK: 4000 }, inletK: 300 },
    };
    const rating = rate(input);
    expect(rating.cminStream).toBe("cold");
    expect(rating.capacityRatio).toBe(1);
    // counterflow at Cr = 1: ε = NTU/(1 + NTU) = 0.5/1.5 (Incropera 6e Table 11.3)
    expect(relativeError(rating.effectiveness, 1 / 3)).toBeLessThan(1e-15);
  });

  it("rejects a negative mass flow, naming the side", () => {
    const input = ratingInput({ kind: "counterflow" }, 1, 0.5, "hot");
    try {
      rate({ ...input, hot: { ...input.hot, massFlowKgPerS: -2 } });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(ThermalInputError);
      expect((error as ThermalInputError).reason).toBe("non-positive");
      expect((error as ThermalInputError).quantity).toBe("hot mass flow");
      expect((error as Error).message).toBe("hot mass flow must be positive, got -2 kg/s");
    }
  });

  it("rejects a zero area", () => {
    const input = ratingInput({ kind: "counterflow" }, 1, 0.5, "hot");
    expect(() => rate({ ...input, areaM2: 0 })).toThrow("heat-transfer area must be positive, got 0 m²");
  });

  it("rejects a non-finite U", () => {
    const input = ratingInput({ kind: "counterflow" }, 1, 0.5, "hot");
    expect(() => rate({ ...input, uWPerM2K: Number.POSITIVE_INFINITY })).toThrow(
      "overall heat-transfer coefficient U must be a finite number, got Infinity W/(m²·K)",
    );
  });

  it("rejects a hot inlet that is not above the cold inlet", () => {
    const input = ratingInput({ kind: "counterflow" }, 1, 0.5, "hot");
    try {
      rate({ ...input, hot: { ...input.hot, inletK: 290 } });
      expect.unreachable();
    } catch (error) {
      expect((error as ThermalInputError).reason).toBe("non-positive");
      expect((error as ThermalInputError).quantity).toBe("inlet temperature difference");
      expect((error as Error).message).toBe(
        "hot inlet must be above cold inlet: inlet temperature difference (hot inlet minus cold inlet) must be positive, got -10 K",
      );
    }
  });

  it("rejects a specific-heat fit that goes non-positive inside the stream's range", () => {
    // cp = −2000 + 10·T reaches 0 at 200 K; a large exchanger cools the hot stream towards the 150 K cold inlet
    const input: RatingInput = {
      uWPerM2K: 5000,
      areaM2: 1000,
      arrangement: { kind: "counterflow" },
      hot: { massFlowKgPerS: 1, heatCapacity: { kind: "linear", interceptJPerKgK: -2000, slopeJPerKgK2: 10 }, inletK: 450 },
      cold: { massFlowKgPerS: 10, heatCapacity: { kind: "constant", jPerKgK: 4180 }, inletK: 150 },
    };
    expect(() => rate(input)).toThrow(/^hot specific heat at [\d.]+ K must be positive, got -?[\d.e+-]+ J\/\(kg·K\)$/);
  });

  it("rejects a shell count that is not a whole number", () => {
    const input = ratingInput({ kind: "shell-and-tube", shells: 2 }, 1, 0.5, "hot");
    expect(() => rate({ ...input, arrangement: { kind: "shell-and-tube", shells: 2.5 } })).toThrow(
      "number of shells must be a whole number of at least 1, got 2.5",
    );
  });
});
