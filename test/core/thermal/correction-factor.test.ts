import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  capacityRatioR,
  correctionFactor,
  effectivenessFromNTU,
  meanTemperatureDifference,
  parallelFlowLMTD,
  thermalEffectivenessP,
  ThermalInputError,
  type Arrangement,
  type TerminalTemperatures,
} from "../../../lib/core/thermal";
import { kelvin, relativeError } from "./relative-error";

// 130→110 °C against 15→85 °C: the CalebBell/ht F test case [FIELD-NOTES §1]
const HT_CASE: TerminalTemperatures = {
  hotInK: kelvin(130),
  hotOutK: kelvin(110),
  coldInK: kelvin(15),
  coldOutK: kelvin(85),
};

describe("thermalEffectivenessP", () => {
  it("is the cold temperature rise over the inlet temperature difference", () => {
    // P = (85 − 15)/(130 − 15) = 70/115 = 0.6087 [FIELD-NOTES §1]; kelvin offsets cost ~1e-15
    expect(relativeError(thermalEffectivenessP(HT_CASE), 70 / 115)).toBeLessThan(1e-13);
  });

  it("rejects a cold stream that cools", () => {
    expect(() => thermalEffectivenessP({ ...HT_CASE, coldOutK: kelvin(10) })).toThrow(ThermalInputError);
  });
});

describe("capacityRatioR", () => {
  it("is the hot temperature drop over the cold temperature rise", () => {
    // R = (130 − 110)/(85 − 15) = 0.2857 [FIELD-NOTES §1]
    expect(relativeError(capacityRatioR(HT_CASE), 20 / 70)).toBeLessThan(1e-13);
  });

  it("rejects an isothermal cold stream, for which R is undefined", () => {
    expect(() => capacityRatioR({ ...HT_CASE, coldOutK: HT_CASE.coldInK })).toThrow(
      "cold temperature rise must be positive for R to be defined, got 0 K",
    );
  });
});

describe("correctionFactor", () => {
  it("is 1 for counterflow", () => {
    // definition: F is relative to the counterflow LMTD
    expect(correctionFactor(HT_CASE, { kind: "counterflow" })).toBe(1);
  });

  it("is 1 when either stream is isothermal", () => {
    // Cr = 0: every arrangement has ε = 1 − e^(−NTU) (Incropera 6e Table 11.3), so F = 1 (derived)
    const condensing = { ...HT_CASE, hotOutK: HT_CASE.hotInK };
    const boiling = { ...HT_CASE, coldOutK: HT_CASE.coldInK };
    for (const arrangement of [
      { kind: "parallel" },
      { kind: "shell-and-tube", shells: 1 },
      { kind: "crossflow-unmixed" },
      { kind: "crossflow-mixed", mixedStream: "cold" },
    ] as const) {
      expect(correctionFactor(condensing, arrangement)).toBe(1);
      expect(correctionFactor(boiling, arrangement)).toBe(1);
    }
  });

  it("makes F·LMTD_counterflow equal the parallel-flow LMTD", () => {
    // identity F = NTU_cf/NTU_pf against the direct parallel LMTD (Incropera 6e Sect. 11.3); both computed
    const t = { hotInK: 400, hotOutK: 360, coldInK: 300, coldOutK: 330 };
    const mean = meanTemperatureDifference(t, { kind: "parallel" });
    expect(relativeError(mean.meanK, parallelFlowLMTD(t))).toBeLessThan(1e-13);
  });

  it("uses the shell-and-tube formula for TEMA E shells", () => {
    // CalebBell/ht tests/test_hx.py test_F_LMTD_Fakheri, 6 decimals [FIELD-NOTES §1, V]
    expect(Math.abs(correctionFactor(HT_CASE, { kind: "shell-and-tube", shells: 1 }) - 0.943836)).toBeLessThan(5e-7);
  });

  it("orders crossflow between one shell and counterflow for the same terminals", () => {
    // F ordering follows the ε ordering of the CalebBell/ht doctest values [FIELD-NOTES §2]
    const t = { hotInK: 420, hotOutK: 380, coldInK: 300, coldOutK: 350 };
    const shell = correctionFactor(t, { kind: "shell-and-tube", shells: 1 });
    const crossflow = correctionFactor(t, { kind: "crossflow-unmixed" });
    const parallel = correctionFactor(t, { kind: "parallel" });
    expect(parallel).toBeLessThan(shell);
    expect(shell).toBeLessThan(crossflow);
    expect(crossflow).toBeLessThan(1);
  });

  it("is the same for a mixed stream whichever side the capacity rates make Cmin, when they are equal", () => {
    // at Cr = 1 the Cmin-mixed and Cmax-mixed relations coincide (Incropera 6e Table 11.3), derived
    const t = { hotInK: 400, hotOutK: 360, coldInK: 300, coldOutK: 340 };
    const hotMixed = correctionFactor(t, { kind: "crossflow-mixed", mixedStream: "hot" });
    const coldMixed = correctionFactor(t, { kind: "crossflow-mixed", mixedStream: "cold" });
    expect(relativeError(hotMixed, coldMixed)).toBeLessThan(1e-12);
  });

  it("recovers the counterflow-relative F from ε–NTU for crossflow: F = NTU_cf/NTU", () => {
    // construct terminals from ε–NTU (Incropera 6e Table 11.3) and check F·NTU = NTU_cf (derived identity)
    const ntu = 1.5;
    const capacityRatio = 0.6;
    const effectiveness = effectivenessFromNTU(ntu, capacityRatio, "crossflow-cmax-mixed");
    // cold is Cmin and unmixed, hot (Cmax) mixed: ΔT_inlet = 100 K
    const t = {
      hotInK: 400,
      hotOutK: 400 - effectiveness * 100 * capacityRatio,
      coldInK: 300,
      coldOutK: 300 + effectiveness * 100,
    };
    const counterflowNTU = Math.log((1 - effectiveness * capacityRatio) / (1 - effectiveness)) / (1 - capacityRatio);
    const F = correctionFactor(t, { kind: "crossflow-mixed", mixedStream: "hot" });
    expect(relativeError(F * ntu, counterflowNTU)).toBeLessThan(1e-10);
  });

  it("lies in (0, 1] for every arrangement on random valid terminals", () => {
    // F ≤ 1: counterflow is the best single-stream arrangement (Incropera 6e Sect. 11.3); property test
    const arrangements: Arrangement[] = [
      { kind: "parallel" },
      { kind: "shell-and-tube", shells: 2 },
      { kind: "crossflow-unmixed" },
      { kind: "crossflow-mixed", mixedStream: "hot" },
    ];
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 0.95, noNaN: true }),
        fc.double({ min: 0.05, max: 1, noNaN: true }),
        fc.boolean(),
        fc.constantFrom(...arrangements),
        (fractionOfLimit, capacityRatio, coldIsCmin, arrangement) => {
          // stay inside the parallel-flow limit 1/(1 + Cr), which is the tightest of the four
          const effectiveness = (fractionOfLimit / (1 + capacityRatio)) * 0.999;
          const hotDrop = coldIsCmin ? effectiveness * 100 * capacityRatio : effectiveness * 100;
          const coldRise = coldIsCmin ? effectiveness * 100 : effectiveness * 100 * capacityRatio;
          const t = { hotInK: 450, hotOutK: 450 - hotDrop, coldInK: 350, coldOutK: 350 + coldRise };
          const F = correctionFactor(t, arrangement);
          return F > 0 && F <= 1 + 1e-12;
        },
      ),
    );
  });

  it("rejects a cold outlet above the hot outlet in parallel flow as a temperature cross", () => {
    try {
      correctionFactor({ hotInK: 400, hotOutK: 340, coldInK: 300, coldOutK: 350 }, { kind: "parallel" });
      expect.unreachable();
    } catch (error) {
      expect((error as ThermalInputError).reason).toBe("temperature-cross");
      expect((error as ThermalInputError).quantity).toBe("hot outlet minus cold outlet temperature difference");
    }
  });

  it("rejects terminals beyond the one-shell limit as a temperature cross", () => {
    // P = 0.6, R = 1 lies beyond the one-shell limit 0.5858 (Incropera 6e Table 11.3 as NTU → ∞, derived)
    try {
      correctionFactor({ hotInK: 400, hotOutK: 340, coldInK: 300, coldOutK: 360 }, { kind: "shell-and-tube", shells: 1 });
      expect.unreachable();
    } catch (error) {
      expect((error as ThermalInputError).reason).toBe("temperature-cross");
      expect((error as Error).message).toMatch(/^thermal effectiveness P must be below the limiting value 0\.5857/);
    }
  });

  it("rejects terminals beyond the mixed-crossflow limit as a temperature cross", () => {
    // Cmax mixed at Cr = 1: limit 1 − e^(−1) = 0.632 (Incropera 6e Table 11.3 as NTU → ∞); ε = 0.65 is beyond it
    try {
      correctionFactor({ hotInK: 400, hotOutK: 335, coldInK: 300, coldOutK: 365 }, { kind: "crossflow-mixed", mixedStream: "hot" });
      expect.unreachable();
    } catch (error) {
      expect((error as ThermalInputError).reason).toBe("temperature-cross");
      expect((error as Error).message).toMatch(
        /^crossflow-mixed effectiveness must be below 0\.632120558828557\d* \(the infinite-area limit at capacity ratio 1\), got 0\.65/,
      );
    }
  });

  it("rejects a non-positive terminal difference before looking at the arrangement", () => {
    expect(() =>
      correctionFactor({ hotInK: 400, hotOutK: 290, coldInK: 300, coldOutK: 350 }, { kind: "crossflow-unmixed" }),
    ).toThrow("hot outlet minus cold inlet temperature difference must be positive, got -10 K");
  });
});

describe("meanTemperatureDifference", () => {
  it("returns the counterflow LMTD, F and their product", () => {
    // definition ΔT_m = F·LMTD_cf (Incropera 6e Sect. 11.3); F from the ht test case [FIELD-NOTES §1]
    const result = meanTemperatureDifference(HT_CASE, { kind: "shell-and-tube", shells: 1 });
    const lmtd = (45 - 95) / Math.log(45 / 95);
    expect(relativeError(result.lmtdK, lmtd)).toBeLessThan(1e-12);
    expect(Math.abs(result.correctionFactor - 0.943836)).toBeLessThan(5e-7);
    expect(result.meanK).toBe(result.correctionFactor * result.lmtdK);
  });
});
