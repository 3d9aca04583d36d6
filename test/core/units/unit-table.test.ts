import { describe, expect, it } from "vitest";
import { QUANTITY_NAME, SI_UNIT, UNIT_TABLE, unitsOf, type Quantity } from "../../../lib/core/units";

const QUANTITIES = Object.keys(UNIT_TABLE) as Quantity[];

describe("UNIT_TABLE", () => {
  it("lists the SI unit of each quantity first", () => {
    // SI inside (STYLE.md): the first entry is the storage unit
    for (const quantity of QUANTITIES) {
      expect(UNIT_TABLE[quantity][0]?.id).toBe(SI_UNIT[quantity]);
    }
  });

  it("covers the units the brief asks for", () => {
    // brief: temperature °C °F K °R; mass flow kg/s kg/h t/h lb/h lb/s; power W kW MW Btu/h; U W/(m²·K),
    // Btu/(h·ft²·°F); fouling m²·K/W, h·ft²·°F/Btu; area m², ft²; specific heat J/(kg·K), kJ/(kg·K), Btu/(lb·°F)
    const ids = (quantity: Quantity): string[] => unitsOf(quantity).map((unit) => unit.id);
    expect(ids("temperature")).toEqual(["K", "degC", "degF", "degR"]);
    expect(ids("temperatureDifference")).toEqual(["K", "degC", "degF", "degR"]);
    expect(ids("massFlow")).toEqual(["kg/s", "kg/h", "t/h", "lb/h", "lb/s"]);
    expect(ids("power")).toEqual(["W", "kW", "MW", "Btu/h"]);
    expect(ids("heatTransferCoefficient")).toEqual(["W/(m2.K)", "Btu/(h.ft2.degF)"]);
    expect(ids("foulingResistance")).toEqual(["m2.K/W", "h.ft2.degF/Btu"]);
    expect(ids("area")).toEqual(["m2", "ft2"]);
    expect(ids("specificHeat")).toEqual(["J/(kg.K)", "kJ/(kg.K)", "Btu/(lb.degF)"]);
    // pressure (added for water streams and pressure-drop readings): Pa, kPa, MPa, bar, psi
    expect(ids("pressure")).toEqual(["Pa", "kPa", "MPa", "bar", "psi"]);
  });

  it("gives every unit a label and a name, and unique labels per quantity", () => {
    for (const quantity of QUANTITIES) {
      const labels = unitsOf(quantity).map((unit) => unit.label);
      expect(new Set(labels).size).toBe(labels.length);
      for (const unit of unitsOf(quantity)) {
        expect(unit.label.length).toBeGreaterThan(0);
        expect(unit.name.length).toBeGreaterThan(0);
      }
      expect(QUANTITY_NAME[quantity].length).toBeGreaterThan(0);
    }
  });

  it("uses display labels with proper symbols", () => {
    // SI brochure 9th ed. symbols: °C, m², W/(m²·K) (common practice for display)
    expect(unitsOf("temperature").map((unit) => unit.label)).toEqual(["K", "°C", "°F", "°R"]);
    expect(unitsOf("heatTransferCoefficient")[0]?.label).toBe("W/(m²·K)");
  });
});
