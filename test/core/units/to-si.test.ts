import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  convertUnit,
  fromSI,
  toSI,
  UNIT_TABLE,
  UnitError,
  type Quantity,
  type TemperatureUnit,
} from "../../../lib/core/units";

const QUANTITIES = Object.keys(UNIT_TABLE) as Quantity[];

describe("toSI", () => {
  it("puts 0 °C at 273.15 K and 32 °F at 273.15 K", () => {
    // NIST SP 811 (2008) B.9: T/K = t/°C + 273.15; T/K = (t/°F + 459.67)/1.8 (exact relations)
    expect(toSI("temperature", 0, "degC")).toBe(273.15);
    expect(Math.abs(toSI("temperature", 32, "degF") - 273.15)).toBeLessThan(1e-12);
  });

  it("puts 0 °R at absolute zero and 491.67 °R at the ice point", () => {
    // NIST SP 811 (2008) B.9: T/K = (T/°R)/1.8 (exact)
    expect(toSI("temperature", 0, "degR")).toBe(0);
    expect(Math.abs(toSI("temperature", 491.67, "degR") - 273.15)).toBeLessThan(1e-12);
  });

  it("converts temperature differences without the offset", () => {
    // NIST SP 811 (2008) B.9: a difference of 1 °F = 1 °R = (1/1.8) K; 1 °C = 1 K (exact)
    expect(toSI("temperatureDifference", 1, "degC")).toBe(1);
    expect(Math.abs(toSI("temperatureDifference", 9, "degF") - 5)).toBeLessThan(1e-14);
    expect(Math.abs(toSI("temperatureDifference", 180, "degR") - 100)).toBeLessThan(1e-13);
  });

  it("leaves SI values unchanged", () => {
    // definition of the SI entry of each quantity (scale 1, offset 0)
    for (const quantity of QUANTITIES) {
      const si = UNIT_TABLE[quantity][0];
      expect(si?.scale).toBe(1);
      expect(si?.offset).toBe(0);
    }
    expect(toSI("power", 123.456, "W")).toBe(123.456);
  });

  it("passes non-finite values through instead of validating them", () => {
    // documented: range checks belong to the validation layer
    expect(toSI("power", Number.NaN, "kW")).toBeNaN();
  });

  it("rejects an unknown unit id from an untyped caller, listing the ids", () => {
    const untyped = toSI as (quantity: Quantity, value: number, unit: string) => number;
    try {
      untyped("power", 1, "hp");
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(UnitError);
      expect((error as UnitError).allowed).toEqual(["W", "kW", "MW", "Btu/h"]);
      expect((error as Error).message).toBe('unknown power unit id "hp"; allowed: W, kW, MW, Btu/h');
    }
  });
});

describe("fromSI", () => {
  it("inverts toSI for every unit of every quantity", () => {
    // round trip (property test): v → SI → v to 1e-12 relative, plus 1e-9 absolute for offset scales
    for (const quantity of QUANTITIES) {
      for (const unit of UNIT_TABLE[quantity]) {
        fc.assert(
          fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (value) => {
            const back = fromSI(quantity, toSI(quantity, value, unit.id as never), unit.id as never);
            return Math.abs(back - value) <= 1e-12 * Math.abs(value) + 1e-9;
          }),
          { numRuns: 50 },
        );
      }
    }
  });

  it("gives 212 °F and 0 °C from the steam and ice points in kelvin", () => {
    // NIST SP 811 (2008) B.9 relations (exact); 1e-12 K for rounding of 1/1.8
    expect(Math.abs(fromSI("temperature", 373.15, "degF") - 212)).toBeLessThan(1e-12);
    expect(Math.abs(fromSI("temperature", 273.15, "degC"))).toBeLessThan(1e-12);
  });
});

describe("convertUnit", () => {
  it("makes −40 °C equal −40 °F", () => {
    // the two scales cross at −40 (NIST SP 811 B.9 relations, exact)
    expect(Math.abs(convertUnit("temperature", -40, "degC", "degF") + 40)).toBeLessThan(1e-12);
    expect(Math.abs(convertUnit("temperature", -40, "degF", "degC") + 40)).toBeLessThan(1e-12);
  });

  it("makes 100 °C equal 212 °F", () => {
    // NIST SP 811 B.9 relations (exact)
    expect(Math.abs(convertUnit("temperature", 100, "degC", "degF") - 212)).toBeLessThan(1e-12);
  });

  it("round-trips between any two temperature units", () => {
    // property test; absolute tolerance 1e-9 K covers offsets of order 500 with doubles
    const units: TemperatureUnit[] = ["degC", "degF", "K", "degR"];
    fc.assert(
      fc.property(
        fc.double({ min: -273, max: 3000, noNaN: true }),
        fc.constantFrom(...units),
        fc.constantFrom(...units),
        (value, from, to) => {
          const there = convertUnit("temperature", value, from, to);
          return Math.abs(convertUnit("temperature", there, to, from) - value) < 1e-9;
        },
      ),
    );
  });

  it("converts a duty of 1 MMBtu/h to 293.07 kW", () => {
    // 1e6 × 0.293 071 07 W (NIST SP 811 B.8 factor 2.930 711 E−01), computed; 1e-9 relative
    const kilowatts = convertUnit("power", 1e6, "Btu/h", "kW");
    expect(Math.abs(kilowatts / 293.07107017222 - 1)).toBeLessThan(1e-9);
  });

  it("returns the value itself when the units are the same", () => {
    expect(convertUnit("massFlow", 12.5, "t/h", "t/h")).toBe(12.5);
  });
});
