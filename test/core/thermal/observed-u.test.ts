import { describe, expect, it } from "vitest";
import { foulingResistance, observedU, ThermalInputError } from "../../../lib/core/thermal";
import { relativeError } from "./relative-error";

const TEMPERATURES = { hotInK: 400, hotOutK: 350, coldInK: 300, coldOutK: 340 };

describe("observedU", () => {
  it("divides the duty by area times the mean temperature difference", () => {
    // U = Q/(A·LMTD) for counterflow, LMTD(60, 50) = 10/ln 1.2 (Incropera 6e Sect. 11.3, computed)
    const result = observedU({ dutyW: 1e6, areaM2: 100, arrangement: { kind: "counterflow" }, temperatures: TEMPERATURES });
    const lmtd = 10 / Math.log(1.2);
    expect(relativeError(result.uWPerM2K, 1e6 / (100 * lmtd))).toBeLessThan(1e-14);
    expect(result.correctionFactor).toBe(1);
    expect(result.lmtdK).toBe(result.meanTemperatureDifferenceK);
  });

  it("divides by F·LMTD for a shell-and-tube exchanger", () => {
    // F from the CalebBell/ht test case (130, 110, 15, 85 °C) = 0.943836 [FIELD-NOTES §1, V]
    const result = observedU({
      dutyW: 5e5,
      areaM2: 40,
      arrangement: { kind: "shell-and-tube", shells: 1 },
      temperatures: { hotInK: 403.15, hotOutK: 383.15, coldInK: 288.15, coldOutK: 358.15 },
    });
    expect(Math.abs(result.correctionFactor - 0.943836)).toBeLessThan(5e-7);
    expect(relativeError(result.uWPerM2K, 5e5 / (40 * result.correctionFactor * result.lmtdK))).toBeLessThan(1e-15);
  });

  it("rejects a zero duty and a negative area", () => {
    expect(() =>
      observedU({ dutyW: 0, areaM2: 100, arrangement: { kind: "counterflow" }, temperatures: TEMPERATURES }),
    ).toThrow("duty must be positive, got 0 W");
    try {
      observedU({ dutyW: 1e6, areaM2: -5, arrangement: { kind: "counterflow" }, temperatures: TEMPERATURES });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(ThermalInputError);
      expect((error as ThermalInputError).reason).toBe("non-positive");
      expect((error as Error).message).toBe("heat-transfer area must be positive, got -5 m²");
    }
  });

  it("rejects a temperature cross in parallel flow", () => {
    expect(() =>
      observedU({ dutyW: 1e6, areaM2: 100, arrangement: { kind: "parallel" }, temperatures: { ...TEMPERATURES, coldOutK: 360 } }),
    ).toThrow(/^parallel flow needs the hot outlet above the cold outlet/);
  });
});

describe("foulingResistance", () => {
  it("is 1/U_observed − 1/U_clean", () => {
    // Kern (1950) dirt factor R_d = (U_C − U_D)/(U_C·U_D) [FIELD-NOTES §4, M]: 1/400 − 1/500 = 5e-4 m²·K/W (computed)
    expect(relativeError(foulingResistance(400, 500), 5e-4)).toBeLessThan(1e-12);
  });

  it("returns the TEMA cooling-tower value when U drops accordingly", () => {
    // TEMA RGP-T-2.4 treated cooling-tower water 0.001 h·ft²·°F/Btu = 1.761102e-4 m²·K/W [FIELD-NOTES §3]
    // (table value M, conversion C); U_clean = 1000 → U_observed = 1/(1e-3 + 1.761102e-4)
    const resistance = 1.761102e-4;
    const observed = 1 / (1 / 1000 + resistance);
    expect(relativeError(foulingResistance(observed, 1000), resistance)).toBeLessThan(1e-11);
  });

  it("is negative when the observed U beats the clean U (noise is passed through)", () => {
    // documented choice: no clamping
    expect(foulingResistance(510, 500)).toBeLessThan(0);
  });

  it("rejects a zero or non-finite coefficient", () => {
    expect(() => foulingResistance(0, 500)).toThrow("observed U must be positive, got 0 W/(m²·K)");
    expect(() => foulingResistance(400, Number.NaN)).toThrow("clean U must be a finite number, got NaN W/(m²·K)");
  });
});
