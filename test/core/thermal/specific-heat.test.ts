import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { meanSpecificHeat, specificHeat, ThermalInputError, type HeatCapacity } from "../../../lib/core/thermal";
import { relativeError } from "./relative-error";

const LINEAR: HeatCapacity = { kind: "linear", interceptJPerKgK: 1000, slopeJPerKgK2: 2 };

describe("specificHeat", () => {
  it("returns a constant specific heat unchanged", () => {
    // definition
    expect(specificHeat({ kind: "constant", jPerKgK: 4180 }, 300)).toBe(4180);
  });

  it("evaluates a linear fit at the absolute temperature", () => {
    // definition cp = a + b·T: 1000 + 2·400 = 1800 (computed)
    expect(specificHeat(LINEAR, 400)).toBe(1800);
  });

  it("rejects a non-positive constant, a fit that goes non-positive, and a temperature at or below 0 K", () => {
    expect(() => specificHeat({ kind: "constant", jPerKgK: 0 }, 300)).toThrow(
      "specific heat must be positive, got 0 J/(kg·K)",
    );
    expect(() => specificHeat({ kind: "linear", interceptJPerKgK: -1000, slopeJPerKgK2: 2 }, 400)).toThrow(
      "specific heat at 400 K must be positive, got -200 J/(kg·K)",
    );
    expect(() => specificHeat(LINEAR, 0)).toThrow("temperature must be positive, got 0 K");
    try {
      specificHeat({ kind: "constant", jPerKgK: -5 }, 300);
    } catch (error) {
      expect(error).toBeInstanceOf(ThermalInputError);
      expect((error as ThermalInputError).reason).toBe("non-positive");
      expect((error as ThermalInputError).quantity).toBe("specific heat");
    }
  });

  it("rejects non-finite coefficients", () => {
    expect(() => specificHeat({ kind: "linear", interceptJPerKgK: Number.NaN, slopeJPerKgK2: 2 }, 400)).toThrow(
      "specific heat intercept must be a finite number, got NaN J/(kg·K)",
    );
  });
});

describe("meanSpecificHeat", () => {
  it("is the integral mean of a linear fit, i.e. its value at the mean temperature", () => {
    // (1/(T2 − T1))∫(a + bT)dT = a + b(T1 + T2)/2 = 1000 + 2·400 = 1800 (calculus, computed)
    expect(meanSpecificHeat(LINEAR, 300, 500)).toBe(1800);
    expect(meanSpecificHeat(LINEAR, 500, 300)).toBe(1800);
  });

  it("matches the integral of the fit divided by the interval on random intervals", () => {
    // ∫(a + bT)dT = a(T2 − T1) + b(T2² − T1²)/2 (calculus); property test
    fc.assert(
      fc.property(
        fc.double({ min: 200, max: 800, noNaN: true }),
        fc.double({ min: 200, max: 800, noNaN: true }),
        (from, to) => {
          fc.pre(Math.abs(to - from) > 1e-3);
          const integral = 1000 * (to - from) + (2 * (to * to - from * from)) / 2;
          return relativeError(meanSpecificHeat(LINEAR, from, to), integral / (to - from)) < 1e-9;
        },
      ),
    );
  });

  it("is the point value when both temperatures are equal", () => {
    // limit of the integral mean (calculus)
    expect(meanSpecificHeat(LINEAR, 350, 350)).toBe(1700);
  });
});

describe("specificHeat and meanSpecificHeat for liquid water", () => {
  const WATER: HeatCapacity = { kind: "water", pressurePa: 5e5 };

  it("uses IAPWS-IF97 Region 1 at the stated pressure", () => {
    // FIELD-NOTES §7 [C]: IAPWS-95 via CoolProp, 25 °C, 101.325 kPa: 4181.31 J/(kg K); pressure effect 0.1→0.5 MPa is < 1e-3 (from memory)
    expect(Math.abs(specificHeat(WATER, 298.15) / 4181.31 - 1)).toBeLessThan(1e-3);
  });

  it("gives the integral mean, which for nearly flat cp lies between the end values and matches a fine trapezoid sum", () => {
    const from = 288.15;
    const to = 318.15;
    const mean = meanSpecificHeat(WATER, from, to);
    // composite trapezoid rule with 10,000 panels (computed here as the reference)
    let sum = 0;
    const panels = 10_000;
    for (let index = 0; index <= panels; index += 1) {
      const weight = index === 0 || index === panels ? 0.5 : 1;
      sum += weight * specificHeat(WATER, from + ((to - from) * index) / panels);
    }
    expect(relativeError(mean, sum / panels)).toBeLessThan(1e-9);
    expect(meanSpecificHeat(WATER, to, from)).toBeCloseTo(mean, 9);
  });

  it("refuses water above its saturation temperature at the stated pressure, naming the temperature", () => {
    // saturation at 0.5 MPa is about 425 K (IAPWS-IF97 Region 4)
    expect(() => specificHeat(WATER, 430)).toThrow(/water at 430 K is liquid only at or above its saturation pressure/);
    try {
      specificHeat(WATER, 430);
    } catch (error) {
      expect((error as ThermalInputError).reason).toBe("out-of-range");
      expect((error as ThermalInputError).quantity).toBe("temperature");
    }
  });
});
