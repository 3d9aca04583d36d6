import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  counterflowLMTD,
  logMeanTemperatureDifference,
  parallelFlowLMTD,
  ThermalInputError,
} from "../../../lib/core/thermal";
import { relativeError } from "./relative-error";

describe("logMeanTemperatureDifference", () => {
  it("matches the closed form for differences 40 K and 20 K", () => {
    // closed form 20/ln 2 = 28.853900817779268147, computed with mpmath 1.3.0 at 50 digits
    expect(relativeError(logMeanTemperatureDifference(40, 20), 28.853900817779268)).toBeLessThan(1e-15);
  });

  it("tends to the common value when the two differences are nearly equal", () => {
    // mpmath 1.3.0, 50 digits: LMTD(10 + 1e-9, 10) = 10.000000000499999999991667 (so it sits 5e-11 relative
    // above 10, the midpoint of the two differences; it is checked against the exact value to 1e-15)
    expect(relativeError(logMeanTemperatureDifference(10, 10 + 1e-9), 10.0000000005)).toBeLessThan(1e-15);
    // limit ΔA → ΔB of (ΔA − ΔB)/ln(ΔA/ΔB) is ΔB (definition); within the spread 1e-10 of 10
    expect(relativeError(logMeanTemperatureDifference(10 + 1e-9, 10), 10)).toBeLessThan(1e-10);
  });

  it("equals the arithmetic mean to second order when the differences are nearly equal", () => {
    // LMTD = AM·(1 − z²/12 + …) for z = (ΔA − ΔB)/ΔB (Gregory series); z = 1e-7 gives 1e-15 relative
    const a = 50 * (1 + 1e-7);
    expect(relativeError(logMeanTemperatureDifference(a, 50), (a + 50) / 2)).toBeLessThan(2e-15);
  });

  it("is equal to either difference when both are equal", () => {
    // limit of the definition, exact
    expect(logMeanTemperatureDifference(7.5, 7.5)).toBe(7.5);
  });

  it("is continuous across the switch between series and logarithm near a relative spread of 1e-3", () => {
    // mpmath 1.3.0, 50 digits: (1.000999 − 1)/ln(1.000999) = 1.000499416874765526775704
    expect(relativeError(logMeanTemperatureDifference(1.000999, 1), 1.0004994168747655)).toBeLessThan(1e-15);
    // just above the switch: the defining formula evaluated directly with Math.log1p (computed)
    const above = 1.001001;
    const direct = (above - 1) / Math.log1p(above - 1);
    expect(relativeError(logMeanTemperatureDifference(above, 1), direct)).toBeLessThan(1e-15);
  });

  it("is symmetric in its two arguments", () => {
    // property of the definition (common practice)
    fc.assert(
      fc.property(
        fc.double({ min: 1e-6, max: 1e4, noNaN: true }),
        fc.double({ min: 1e-6, max: 1e4, noNaN: true }),
        (a, b) => logMeanTemperatureDifference(a, b) === logMeanTemperatureDifference(b, a),
      ),
    );
  });

  it("lies between the geometric and the arithmetic mean", () => {
    // classical inequality GM ≤ LM ≤ AM (e.g. Carlson 1972, Amer. Math. Monthly 79:615; from memory)
    fc.assert(
      fc.property(
        fc.double({ min: 1e-3, max: 1e3, noNaN: true }),
        fc.double({ min: 1e-3, max: 1e3, noNaN: true }),
        (a, b) => {
          const lmtd = logMeanTemperatureDifference(a, b);
          const slack = 1e-12 * Math.max(a, b);
          return Math.sqrt(a * b) - slack <= lmtd && lmtd <= (a + b) / 2 + slack;
        },
      ),
    );
  });

  it("rejects a zero or negative difference with the quantity named", () => {
    expect(() => logMeanTemperatureDifference(0, 10)).toThrow(
      "terminal temperature difference A must be positive, got 0 K",
    );
    expect(() => logMeanTemperatureDifference(10, -3)).toThrow(
      "terminal temperature difference B must be positive, got -3 K",
    );
    try {
      logMeanTemperatureDifference(10, -3);
    } catch (error) {
      expect(error).toBeInstanceOf(ThermalInputError);
      expect((error as ThermalInputError).reason).toBe("non-positive");
      expect((error as ThermalInputError).value).toBe(-3);
    }
  });

  it("rejects a non-finite difference", () => {
    expect(() => logMeanTemperatureDifference(Number.NaN, 10)).toThrow(
      "terminal temperature difference A must be a finite number, got NaN K",
    );
  });
});

describe("counterflowLMTD", () => {
  it("uses hot inlet − cold outlet and hot outlet − cold inlet", () => {
    // definition (Incropera 6e Sect. 11.3, from memory): LMTD(400 − 340, 350 − 300) = LMTD(60, 50) = 10/ln 1.2
    const lmtd = counterflowLMTD({ hotInK: 400, hotOutK: 350, coldInK: 300, coldOutK: 340 });
    expect(relativeError(lmtd, 10 / Math.log(1.2))).toBeLessThan(1e-14);
  });

  it("allows a temperature cross (cold outlet above hot outlet)", () => {
    // counterflow can heat the cold stream above the hot outlet (common practice); LMTD(10, 20) = 10/ln 2
    const lmtd = counterflowLMTD({ hotInK: 400, hotOutK: 320, coldInK: 300, coldOutK: 390 });
    expect(relativeError(lmtd, 10 / Math.LN2)).toBeLessThan(1e-14);
  });

  it("rejects a hot inlet at or below the cold outlet as a non-positive terminal difference", () => {
    expect(() => counterflowLMTD({ hotInK: 400, hotOutK: 350, coldInK: 300, coldOutK: 400 })).toThrow(
      "hot inlet minus cold outlet temperature difference must be positive, got 0 K",
    );
  });

  it("rejects a hot stream that heats up", () => {
    try {
      counterflowLMTD({ hotInK: 400, hotOutK: 410, coldInK: 300, coldOutK: 340 });
      expect.unreachable();
    } catch (error) {
      expect((error as ThermalInputError).reason).toBe("wrong-direction");
      expect((error as Error).message).toBe(
        "hot outlet temperature must not exceed the hot inlet 400 K (the hot stream must cool), got 410 K",
      );
    }
  });

  it("rejects a cold stream that cools down", () => {
    expect(() => counterflowLMTD({ hotInK: 400, hotOutK: 350, coldInK: 300, coldOutK: 290 })).toThrow(
      "cold outlet temperature must not be below the cold inlet 300 K (the cold stream must heat), got 290 K",
    );
  });

  it("rejects a temperature at or below absolute zero", () => {
    expect(() => counterflowLMTD({ hotInK: 400, hotOutK: 350, coldInK: -5, coldOutK: 340 })).toThrow(
      "cold inlet temperature must be positive, got -5 K",
    );
  });
});

describe("parallelFlowLMTD", () => {
  it("uses the inlet difference and the outlet difference", () => {
    // definition (Incropera 6e Sect. 11.3, from memory): LMTD(400 − 300, 350 − 340) = 90/ln 10
    const lmtd = parallelFlowLMTD({ hotInK: 400, hotOutK: 350, coldInK: 300, coldOutK: 340 });
    expect(relativeError(lmtd, 90 / Math.LN10)).toBeLessThan(1e-14);
  });

  it("rejects a cold outlet above the hot outlet as a temperature cross", () => {
    try {
      parallelFlowLMTD({ hotInK: 400, hotOutK: 330, coldInK: 300, coldOutK: 340 });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(ThermalInputError);
      expect((error as ThermalInputError).reason).toBe("temperature-cross");
      expect((error as Error).message).toBe(
        "parallel flow needs the hot outlet above the cold outlet; hot outlet minus cold outlet temperature difference must be positive, got -10 K",
      );
    }
  });
});
