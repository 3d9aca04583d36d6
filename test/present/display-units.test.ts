import { describe, expect, it } from "vitest";
import { DISPLAY_UNITS, displayUnit, formatDisplayNumber, formatQuantity, isUnitSystem, toDisplay } from "../../lib/present/display-units";

// NIST SP 811 (2008 edition), Thompson & Taylor, Appendix B.8 "Factors for units listed alphabetically" prints
// 7 significant digits; relative tolerance 1e-6 covers that rounding.
const NIST_RELATIVE_TOLERANCE = 1e-6;
function expectRelative(actual: number | null, expected: number) {
  expect(actual).not.toBeNull();
  expect(Math.abs((actual as number) - expected) / Math.abs(expected)).toBeLessThan(NIST_RELATIVE_TOLERANCE);
}

describe("toDisplay, US customary, against NIST SP 811", () => {
  it("shows one NIST-sized SI value as one US unit", () => {
    // NIST SP 811 B.8: British thermal unit_IT per hour (Btu_IT/h) = 2.930 711 E−01 W, so 10⁶ Btu/h = 2.930 711 E+05 W
    expectRelative(toDisplay("us", "duty", 2.930711e5), 1);
    // NIST SP 811 B.8: Btu_IT/(h·ft²·°F) = 5.678 263 E+00 W/(m²·K)
    expectRelative(toDisplay("us", "u", 5.678263), 1);
    // NIST SP 811 B.8: h·ft²·°F/Btu_IT (thermal insulance) = 1.761 102 E−01 m²·K/W
    expectRelative(toDisplay("us", "foulingResistance", 1.761102e-1), 1);
    // NIST SP 811 B.8: square foot (ft²) = 9.290 304 E−02 m²
    expectRelative(toDisplay("us", "area", 9.290304e-2), 1);
    // NIST SP 811 B.8: pound per hour (lb/h) = 1.259 979 E−04 kg/s
    expectRelative(toDisplay("us", "massFlow", 1.259979e-4), 1);
    // NIST SP 811 B.8: British thermal unit_IT (Btu_IT) = 1.055 056 E+03 J, so 1 MMBtu = 1.055 056 E+09 J
    expectRelative(toDisplay("us", "energy", 1.055056e9), 1);
  });

  it("converts temperatures with the offsets of NIST SP 811 B.9", () => {
    // NIST SP 811 B.9: t/°F = 1.8·(T/K) − 459.67: 273.15 K is 32 °F, 373.15 K is 212 °F
    expect(toDisplay("us", "temperature", 273.15)).toBeCloseTo(32, 10);
    expect(toDisplay("us", "temperature", 373.15)).toBeCloseTo(212, 10);
    // NIST SP 811 B.9: a difference of 1 K is 1.8 °F (no offset)
    expect(toDisplay("us", "temperatureDifference", 1)).toBeCloseTo(1.8, 12);
    // NIST SP 811 B.9: t/°C = T/K − 273.15
    expect(toDisplay("si", "temperature", 300)).toBeCloseTo(26.85, 10);
  });
});

describe("toDisplay, SI", () => {
  it("shows duty in kW and energy in GJ (SI prefixes, exact)", () => {
    expect(toDisplay("si", "duty", 1.5e6)).toBe(1500);
    expect(toDisplay("si", "energy", 2e9)).toBe(2);
  });
  it("leaves W/(m²·K), m²·K/W, m² and kg/s as they are", () => {
    expect(toDisplay("si", "u", 345.6)).toBe(345.6);
    expect(toDisplay("si", "foulingResistance", 3.2e-4)).toBe(3.2e-4);
    expect(toDisplay("si", "area", 120)).toBe(120);
    expect(toDisplay("si", "massFlow", 42)).toBe(42);
  });
  it("passes null and non-finite values through as null", () => {
    expect(toDisplay("si", "duty", null)).toBeNull();
    expect(toDisplay("us", "u", Number.NaN)).toBeNull();
    expect(toDisplay("us", "u", Number.POSITIVE_INFINITY)).toBeNull();
  });
});

describe("formatQuantity", () => {
  it("gives significant figures and the unit label", () => {
    // 1 MW = 1e6/293.0711 Btu/h = 3.412 142 MMBtu/h (NIST SP 811 B.8 factor above), 3 significant figures
    expect(formatQuantity("us", "duty", 1e6, 3)).toBe("3.41 MMBtu/h");
    expect(formatQuantity("si", "duty", 1e6, 3)).toBe("1,000 kW");
    expect(formatQuantity("si", "u", null)).toBe("—");
    expect(formatDisplayNumber("us", "foulingResistance", 1.761102e-4, 3)).toBe("0.00100");
  });
  it("has a plain-ASCII label for every unit (CSV headers)", () => {
    for (const system of ["si", "us"] as const) {
      for (const unit of Object.values(DISPLAY_UNITS[system])) expect(unit.ascii).toMatch(/^[\x20-\x7e]+$/);
    }
    expect(displayUnit("us", "u").label).toBe("Btu/(h·ft²·°F)");
  });
  it("recognises the two unit systems only", () => {
    expect(isUnitSystem("si")).toBe(true);
    expect(isUnitSystem("us")).toBe(true);
    expect(isUnitSystem("imperial")).toBe(false);
    expect(isUnitSystem(undefined)).toBe(false);
  });
});
