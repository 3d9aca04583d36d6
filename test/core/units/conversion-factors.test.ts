import { describe, expect, it } from "vitest";
import {
  JOULES_PER_BTU_IT,
  KILOGRAMS_PER_POUND,
  METRES_PER_FOOT,
  toSI,
  type Quantity,
  type UnitOf,
} from "../../../lib/core/units";

/**
 * NIST SP 811 prints factors to 7 significant digits (mantissa × 10^exponent); a factor matches when it is
 * within half a unit of the last printed digit.
 */
function expectMatchesPrinted(actual: number, mantissa: number, exponent: number, printedDecimals = 6): void {
  const halfUnit = 0.5 * Math.pow(10, exponent - printedDecimals);
  expect(Math.abs(actual - mantissa * Math.pow(10, exponent))).toBeLessThanOrEqual(halfUnit);
}

function factor<Q extends Quantity>(quantity: Q, unit: UnitOf<Q>): number {
  return toSI(quantity, 1, unit);
}

describe("conversion factors", () => {
  it("use the exact defining constants for pound, foot and International Table Btu", () => {
    // 1959 international yard and pound agreement, exact: 1 lb = 0.453 592 37 kg, 1 ft = 0.3048 m (NIST SP 811 B.8)
    expect(KILOGRAMS_PER_POUND).toBe(0.45359237);
    // same source
    expect(METRES_PER_FOOT).toBe(0.3048);
    // Btu_IT = 1055.055 852 62 J exactly (NIST SP 811 B.8 prints 1.055 056 E+03)
    expect(JOULES_PER_BTU_IT).toBe(1055.05585262);
    expectMatchesPrinted(JOULES_PER_BTU_IT, 1.055056, 3);
  });

  it("convert Btu_IT/h to watts as NIST SP 811 prints it", () => {
    // NIST SP 811 (2008) Appendix B.8: Btu_IT/h → W 2.930 711 E−01
    expectMatchesPrinted(factor("power", "Btu/h"), 2.930711, -1);
  });

  it("convert Btu_IT/(h·ft²·°F) to W/(m²·K) as NIST SP 811 prints it", () => {
    // NIST SP 811 (2008) Appendix B.8: Btu_IT/(h·ft²·°F) → W/(m²·K) 5.678 263 E+00
    expectMatchesPrinted(factor("heatTransferCoefficient", "Btu/(h.ft2.degF)"), 5.678263, 0);
  });

  it("convert h·ft²·°F/Btu_IT to m²·K/W as NIST SP 811 prints it", () => {
    // NIST SP 811 (2008) Appendix B.8: h·ft²·°F/Btu_IT (thermal insulance) → m²·K/W 1.761 102 E−01
    expectMatchesPrinted(factor("foulingResistance", "h.ft2.degF/Btu"), 1.761102, -1);
  });

  it("convert lb/h and lb/s to kg/s as NIST SP 811 prints them", () => {
    // NIST SP 811 (2008) Appendix B.8: lb/h → kg/s 1.259 979 E−04
    expectMatchesPrinted(factor("massFlow", "lb/h"), 1.259979, -4);
    // NIST SP 811 (2008) Appendix B.8: lb/s → kg/s 4.535 924 E−01 (from memory; equals the exact pound)
    expectMatchesPrinted(factor("massFlow", "lb/s"), 4.535924, -1);
  });

  it("convert Btu_IT/(lb·°F) to exactly 4186.8 J/(kg·K)", () => {
    // NIST SP 811 (2008) Appendix B.8: Btu_IT/(lb·°F) → J/(kg·K) 4.1868 E+03, exact by definition of Btu_IT;
    // derived from three constants, so allow two rounding errors
    expect(Math.abs(factor("specificHeat", "Btu/(lb.degF)") - 4186.8)).toBeLessThanOrEqual(2 * 4186.8 * Number.EPSILON);
  });

  it("convert psi and bar to pascals as NIST SP 811 prints them", () => {
    // NIST SP 811 (2008) Appendix B.8: pound-force per square inch → Pa 6.894 757 E+03
    expectMatchesPrinted(factor("pressure", "psi"), 6.894757, 3);
    // NIST SP 811 (2008) Appendix B.8: bar → Pa 1.0 E+05 (exact)
    expect(factor("pressure", "bar")).toBe(1e5);
  });

  it("convert ft² to exactly 0.092 903 04 m²", () => {
    // NIST SP 811 (2008) Appendix B.8: ft² → m² 9.290 304 E−02 (exact)
    expect(Math.abs(factor("area", "ft2") - 0.09290304)).toBeLessThanOrEqual(0.09290304 * Number.EPSILON);
  });

  it("convert the metric multiples exactly", () => {
    // definitions: 1 h = 3600 s, 1 t = 1000 kg, SI prefixes k = 1e3, M = 1e6
    expect(factor("massFlow", "kg/h")).toBe(1 / 3600);
    expect(factor("massFlow", "t/h")).toBe(1000 / 3600);
    expect(factor("power", "kW")).toBe(1e3);
    expect(factor("power", "MW")).toBe(1e6);
    expect(factor("specificHeat", "kJ/(kg.K)")).toBe(1e3);
  });

  it("keep fouling resistance the reciprocal of the heat-transfer coefficient factor", () => {
    // R = 1/U in any consistent units (definition)
    const product = factor("foulingResistance", "h.ft2.degF/Btu") * factor("heatTransferCoefficient", "Btu/(h.ft2.degF)");
    expect(Math.abs(product - 1)).toBeLessThanOrEqual(2 * Number.EPSILON);
  });
});
