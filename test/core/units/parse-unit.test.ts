import { describe, expect, it } from "vitest";
import { normalizeUnitText, parseUnit, UNIT_TABLE, UnitError, type Quantity } from "../../../lib/core/units";

const QUANTITIES = Object.keys(UNIT_TABLE) as Quantity[];

describe("parseUnit", () => {
  it.each([
    // spellings from the brief and common practice in plant data sheets
    { quantity: "temperature" as const, text: "C", id: "degC" },
    { quantity: "temperature" as const, text: "°C", id: "degC" },
    { quantity: "temperature" as const, text: "degC", id: "degC" },
    { quantity: "temperature" as const, text: "deg F", id: "degF" },
    { quantity: "temperature" as const, text: "Kelvin", id: "K" },
    { quantity: "temperature" as const, text: "°R", id: "degR" },
    { quantity: "temperatureDifference" as const, text: "delta °F", id: "degF" },
    { quantity: "massFlow" as const, text: "t/h", id: "t/h" },
    { quantity: "massFlow" as const, text: "kg/s", id: "kg/s" },
    { quantity: "massFlow" as const, text: "lb/hr", id: "lb/h" },
    { quantity: "massFlow" as const, text: "lbs/hr", id: "lb/h" },
    { quantity: "massFlow" as const, text: "kg/hr", id: "kg/h" },
    { quantity: "power" as const, text: "Btu/hr", id: "Btu/h" },
    { quantity: "power" as const, text: "BTU/h", id: "Btu/h" },
    { quantity: "power" as const, text: "kW", id: "kW" },
    { quantity: "power" as const, text: "MW", id: "MW" },
    { quantity: "heatTransferCoefficient" as const, text: "W/m2K", id: "W/(m2.K)" },
    { quantity: "heatTransferCoefficient" as const, text: "W/m²K", id: "W/(m2.K)" },
    { quantity: "heatTransferCoefficient" as const, text: "W/(m²·K)", id: "W/(m2.K)" },
    { quantity: "heatTransferCoefficient" as const, text: "Btu/h-ft2-F", id: "Btu/(h.ft2.degF)" },
    { quantity: "heatTransferCoefficient" as const, text: "BTU/hr·ft²·°F", id: "Btu/(h.ft2.degF)" },
    { quantity: "foulingResistance" as const, text: "hr-ft2-F/Btu", id: "h.ft2.degF/Btu" },
    { quantity: "foulingResistance" as const, text: "m²K/W", id: "m2.K/W" },
    { quantity: "area" as const, text: "ft²", id: "ft2" },
    { quantity: "area" as const, text: "sq ft", id: "ft2" },
    { quantity: "specificHeat" as const, text: "kJ/kg-K", id: "kJ/(kg.K)" },
    { quantity: "specificHeat" as const, text: "Btu/lb-F", id: "Btu/(lb.degF)" },
  ])('reads "$text" as $id', ({ quantity, text, id }) => {
    expect(parseUnit(quantity, text)).toBe(id);
  });

  it("reads every id and label of the table as itself", () => {
    // the table's own spellings must round-trip (self-consistency)
    for (const quantity of QUANTITIES) {
      for (const unit of UNIT_TABLE[quantity]) {
        expect(parseUnit(quantity, unit.id)).toBe(unit.id);
        expect(parseUnit(quantity, unit.label)).toBe(unit.id);
      }
    }
  });

  it("has no spelling that two units of one quantity share", () => {
    // ambiguity guard: each normalised spelling belongs to one unit per quantity
    for (const quantity of QUANTITIES) {
      const owner = new Map<string, string>();
      for (const unit of UNIT_TABLE[quantity]) {
        for (const spelling of [unit.id, unit.label, ...unit.spellings]) {
          const key = normalizeUnitText(spelling);
          const previous = owner.get(key);
          expect(previous === undefined || previous === unit.id, `${quantity}: "${spelling}"`).toBe(true);
          owner.set(key, unit.id);
        }
      }
    }
  });

  it('does not read milliwatt "mW" as megawatt', () => {
    // case matters for the M/m prefix (SI brochure, 9th ed., Sect. 3; common practice)
    expect(() => parseUnit("power", "mW")).toThrow('unknown power unit "mW"; allowed: W, kW, MW, Btu/h');
  });

  it("throws a UnitError that lists the allowed units", () => {
    try {
      parseUnit("massFlow", "lb/min");
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(UnitError);
      const typed = error as UnitError;
      expect(typed.quantity).toBe("massFlow");
      expect(typed.text).toBe("lb/min");
      expect(typed.allowed).toEqual(["kg/s", "kg/h", "t/h", "lb/h", "lb/s"]);
      expect(typed.message).toBe('unknown mass flow unit "lb/min"; allowed: kg/s, kg/h, t/h, lb/h, lb/s');
    }
  });

  it("does not accept a unit of another quantity", () => {
    expect(() => parseUnit("temperature", "kW")).toThrow('unknown temperature unit "kW"; allowed: K, °C, °F, °R');
  });
});
