import { describe, expect, it } from "vitest";
import { EconomicsInputError, energyCostPerJoule, foulingCostRate } from "../../../lib/core/economics";
import { relativeError, UNIT_PRICES } from "./support";

const GAS_PRICES = { fuelPricePerGJ: 8, heaterEfficiency: 0.8, co2KgPerGJFuel: 56.1, co2PricePerTonne: 80 };

describe("energyCostPerJoule", () => {
  it("charges fuel and CO2 for the duty made up at the furnace", () => {
    // hand calculation from the formula: (8 + 56.1·80/1000)/(0.8·1e9) = 12.488/0.8e9 = 1.561e-8 per J
    // (56.1 kg/GJ: IPCC 2006 natural-gas default as quoted in FIELD-NOTES §7 [M], used here only as an input)
    expect(relativeError(energyCostPerJoule(GAS_PRICES), 1.561e-8)).toBeLessThan(1e-12);
  });

  it("is inversely proportional to the heater efficiency", () => {
    // formula: cost ∝ 1/η
    const full = energyCostPerJoule({ ...GAS_PRICES, heaterEfficiency: 1 });
    expect(relativeError(energyCostPerJoule({ ...GAS_PRICES, heaterEfficiency: 0.5 }), 2 * full)).toBeLessThan(1e-15);
  });

  it("rejects an efficiency above one with a message naming it", () => {
    expect(() => energyCostPerJoule({ ...UNIT_PRICES, heaterEfficiency: 1.2 })).toThrow(
      new EconomicsInputError("heater efficiency", "heater efficiency must be in (0, 1], got 1.2"),
    );
    expect(() => energyCostPerJoule({ ...UNIT_PRICES, fuelPricePerGJ: -1 })).toThrow(
      "fuel price must be a finite number >= 0, got -1 per GJ",
    );
  });
});

describe("foulingCostRate", () => {
  const economics = {
    energy: GAS_PRICES,
    method: { name: "chemical", cost: 20_000, outageDays: 3 },
    outageLostProductionPerDay: 5_000,
    throughputLimit: { dutyLossW: 2e6, lostProductionPerDay: 40_000 },
  };

  it("turns one megawatt of lost duty into money per day", () => {
    // hand calculation: 1e6 W · 86400 s · 1.561e-8 per J = 1348.704 per day
    const rate = foulingCostRate(economics, 1e6);
    expect(relativeError(rate.energyPerDay, 1348.704)).toBeLessThan(1e-12);
    expect(rate.lostProductionPerDay).toBe(0);
    expect(rate.totalPerDay).toBe(rate.energyPerDay);
  });

  it("adds lost production only while the loss is above the throughput limit", () => {
    // common practice: a hard limit is either binding or not (step penalty)
    expect(foulingCostRate(economics, 2e6).lostProductionPerDay).toBe(0);
    const limited = foulingCostRate(economics, 2.5e6);
    expect(limited.lostProductionPerDay).toBe(40_000);
    expect(limited.totalPerDay).toBeCloseTo(limited.energyPerDay + 40_000, 9);
  });
});
