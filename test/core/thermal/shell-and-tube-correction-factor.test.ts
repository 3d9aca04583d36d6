import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  correctionFactor,
  maximumEffectiveness,
  ntuFromEffectiveness,
  shellAndTubeCorrectionFactor,
  ThermalInputError,
} from "../../../lib/core/thermal";
import { kelvin, relativeError } from "./relative-error";

const oneShell = (P: number, R: number): number => shellAndTubeCorrectionFactor({ P, R, shells: 1 });

describe("shellAndTubeCorrectionFactor", () => {
  it("reproduces the ht test value for 130→110 °C against 15→85 °C", () => {
    // CalebBell/ht tests/test_hx.py test_F_LMTD_Fakheri, printed to 6 decimals [FIELD-NOTES §1, V]
    const F = correctionFactor(
      { hotInK: kelvin(130), hotOutK: kelvin(110), coldInK: kelvin(15), coldOutK: kelvin(85) },
      { kind: "shell-and-tube", shells: 1 },
    );
    expect(Math.abs(F - 0.943836)).toBeLessThan(5e-7);
  });

  it("reproduces the ht test value on the R = 1 branch", () => {
    // CalebBell/ht tests/test_hx.py test_F_LMTD_Fakheri (130, 110, 15, 35 °C), 6 decimals [FIELD-NOTES §1, V]
    const F = correctionFactor(
      { hotInK: kelvin(130), hotOutK: kelvin(110), coldInK: kelvin(15), coldOutK: kelvin(35) },
      { kind: "shell-and-tube", shells: 1 },
    );
    expect(Math.abs(F - 0.992569)).toBeLessThan(5e-7);
  });

  it.each([
    // Bowman–Mueller–Nagle formula, computed, 4 decimals [FIELD-NOTES §1, C]
    { P: 0.5, R: 1, expected: 0.8023 },
    // Bowman–Mueller–Nagle formula, computed, 4 decimals [FIELD-NOTES §1, C]
    { P: 0.3, R: 2, expected: 0.8829 },
    // Bowman–Mueller–Nagle formula, computed, 4 decimals [FIELD-NOTES §1, C]
    { P: 0.2, R: 4, expected: 0.8135 },
    // Bowman–Mueller–Nagle formula, computed, 4 decimals [FIELD-NOTES §1, C]
    { P: 0.5, R: 0.5, expected: 0.942 },
  ])("gives F = $expected at P = $P, R = $R for one shell", ({ P, R, expected }) => {
    expect(Math.abs(oneShell(P, R) - expected)).toBeLessThan(5e-5);
  });

  it("gives the formula value 0.8917 for Kern example 7.3, not the chart reading 0.905", () => {
    // Kern (1950) Example 7.3: 390→200 °F against 100→170 °F; formula 0.8917, chart 0.905
    // [FIELD-NOTES §1, V for the chart reading in FOSSEE/Scilab-TBC-Uploads 3516/CH7/EX7.3]
    const fahrenheitToKelvin = (degreesF: number): number => (degreesF + 459.67) / 1.8;
    const F = correctionFactor(
      {
        hotInK: fahrenheitToKelvin(390),
        hotOutK: fahrenheitToKelvin(200),
        coldInK: fahrenheitToKelvin(100),
        coldOutK: fahrenheitToKelvin(170),
      },
      { kind: "shell-and-tube", shells: 1 },
    );
    expect(Math.abs(F - 0.8917)).toBeLessThan(5e-5);
    // mpmath 1.3.0, 50 digits, Bowman–Mueller–Nagle at P = 70/290, R = 190/70: 0.89168727052460777804
    expect(relativeError(oneShell(70 / 290, 190 / 70), 0.8916872705246078)).toBeLessThan(1e-14);
    // the chart reading differs from the formula by more than 0.01 [FIELD-NOTES §1]
    expect(Math.abs(F - 0.905)).toBeGreaterThan(0.01);
  });

  it.each([
    // Fakheri (2003) general form, mpmath 1.3.0 at 50 digits (computed)
    { P: 0.5, R: 0.5, shells: 2, expected: 0.986117262217324 },
    // Fakheri (2003) general form, mpmath 1.3.0 at 50 digits (computed)
    { P: 0.4, R: 1.5, shells: 4, expected: 0.9896336160988656 },
    // Fakheri (2003) R = 1 branch, mpmath 1.3.0 at 50 digits (computed)
    { P: 0.6, R: 1, shells: 3, expected: 0.9568453972970874 },
  ])("gives $expected for $shells shells at P = $P, R = $R", ({ P, R, shells, expected }) => {
    expect(relativeError(shellAndTubeCorrectionFactor({ P, R, shells }), expected)).toBeLessThan(1e-13);
  });

  it("is continuous through R = 1", () => {
    // Fakheri (2003) general form at R = 1 ± 1e-6, mpmath 1.3.0 at 50 digits (computed)
    expect(relativeError(oneShell(0.5, 1.000001), 0.802277676701396)).toBeLessThan(1e-13);
    // same source
    expect(relativeError(oneShell(0.5, 0.999999), 0.8022786467460677)).toBeLessThan(1e-13);
    // R = 1 branch (Fakheri 2003), mpmath 1.3.0 at 50 digits: 0.80227816172447720746
    expect(relativeError(oneShell(0.5, 1), 0.8022781617244772)).toBeLessThan(1e-14);
  });

  it("is 1 when P is 0 or tends to 0", () => {
    // limit of the formula: no heat transferred, any arrangement is as good as counterflow (derived)
    expect(oneShell(0, 2)).toBe(1);
    // same limit; F = 1 − O(P²), so P = 1e-9 leaves 1 within 1e-15
    expect(Math.abs(oneShell(1e-9, 3) - 1)).toBeLessThan(1e-15);
  });

  it("is 1 when R is 0 or tends to 0", () => {
    // limit of the formula: an isothermal hot stream (condensing) makes all arrangements equal (derived)
    expect(Math.abs(oneShell(0.7, 0) - 1)).toBeLessThan(1e-15);
    // same limit, R = 1e-10
    expect(Math.abs(oneShell(0.7, 1e-10) - 1)).toBeLessThan(1e-9);
  });

  it("increases with the number of shells at fixed P and R and tends to 1", () => {
    // property of the formula: more shells in series approach counterflow (Fakheri 2003)
    let previous = 0;
    for (let shells = 1; shells <= 12; shells += 1) {
      const F = shellAndTubeCorrectionFactor({ P: 0.5, R: 0.5, shells });
      expect(F).toBeGreaterThan(previous);
      previous = F;
    }
    // Fakheri (2003) general form at N = 1000, mpmath 1.3.0 at 50 digits: 0.99999994519934584932
    const many = shellAndTubeCorrectionFactor({ P: 0.5, R: 0.5, shells: 1000 });
    expect(Math.abs(many - 0.9999999451993458)).toBeLessThan(1e-14);
  });

  it("agrees with the ratio of counterflow NTU to shell NTU from the Incropera inverse relations", () => {
    // identity F = NTU_counterflow/NTU_arrangement (Shah & Sekulic 2003, Sect. 3.7, from memory); the two sides use
    // independent formulas (Fakheri's F; Incropera 6e Table 11.4 inverse), so agreement checks both
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 0.99, noNaN: true }),
        fc.double({ min: 0.05, max: 1, noNaN: true }),
        fc.integer({ min: 1, max: 6 }),
        (fraction, capacityRatio, shells) => {
          const limit = maximumEffectiveness(capacityRatio, { shells });
          const effectiveness = fraction * limit;
          // Incropera 6e Table 11.4 counterflow inverse, NTU = ln[(1 − εCr)/(1 − ε)]/(1 − Cr), ε/(1 − ε) at Cr = 1
          const counterflowNTU =
            capacityRatio === 1
              ? effectiveness / (1 - effectiveness)
              : Math.log1p((effectiveness * (1 - capacityRatio)) / (1 - effectiveness)) / (1 - capacityRatio);
          const viaNTU = counterflowNTU / ntuFromEffectiveness(effectiveness, capacityRatio, { shells });
          const formula = shellAndTubeCorrectionFactor({ P: effectiveness, R: capacityRatio, shells });
          return relativeError(formula, viaNTU) < 1e-9;
        },
      ),
    );
  });

  it("rejects P at or above the limiting value for R and N as a temperature cross", () => {
    try {
      oneShell(0.7, 1);
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(ThermalInputError);
      const typed = error as ThermalInputError;
      expect(typed.reason).toBe("temperature-cross");
      expect(typed.quantity).toBe("thermal effectiveness P");
      expect(typed.value).toBe(0.7);
      // limit for R = 1, one shell: 2/(2 + √2) = 2 − √2 = 0.58578… (Incropera 6e Table 11.3 as NTU → ∞, derived)
      expect(typed.message).toMatch(
        /^thermal effectiveness P must be below the limiting value 0\.5857864376269\d* for R = 1 and 1 shell \(no finite area reaches it\), got 0\.7$/,
      );
    }
  });

  it("rejects P·R ≥ 1 (hot side beyond its own limit) as a temperature cross", () => {
    expect(() => oneShell(0.3, 4)).toThrow(/limiting value .* for R = 4 and 1 shell/);
  });

  it("accepts P just below the limit that a second shell raises", () => {
    // limit for one shell at R = 1 is 0.5858 (derived above); two shells in series reach further (Fakheri 2003)
    expect(() => oneShell(0.6, 1)).toThrow(ThermalInputError);
    expect(shellAndTubeCorrectionFactor({ P: 0.6, R: 1, shells: 2 })).toBeGreaterThan(0);
  });

  it("rejects a P of 1 or more, negative inputs and bad shell counts", () => {
    expect(() => oneShell(1, 0.5)).toThrow("thermal effectiveness P must be below 1, got 1");
    expect(() => oneShell(-0.1, 0.5)).toThrow("thermal effectiveness P must not be negative, got -0.1");
    expect(() => oneShell(0.3, -1)).toThrow("capacity ratio R must not be negative, got -1");
    expect(() => shellAndTubeCorrectionFactor({ P: 0.3, R: 1, shells: 0 })).toThrow(
      "number of shells must be a whole number of at least 1, got 0",
    );
    expect(() => shellAndTubeCorrectionFactor({ P: 0.3, R: 1, shells: 1.5 })).toThrow(
      "number of shells must be a whole number of at least 1, got 1.5",
    );
    expect(() => oneShell(Number.POSITIVE_INFINITY, 1)).toThrow(
      "thermal effectiveness P must be a finite number, got Infinity",
    );
  });
});
