import type { AssetEconomics, DutyLossForecast, EnergyPrices } from "../../../lib/core/economics";

/**
 * Prices that make one watt of lost duty cost exactly 86400e-9 per day (fuel 1 per GJ, efficiency 1, no CO2), so a
 * cost rate c(t) per day corresponds to a duty loss c(t)/8.64e-5 W.
 */
export const UNIT_PRICES: EnergyPrices = { fuelPricePerGJ: 1, heaterEfficiency: 1, co2KgPerGJFuel: 0, co2PricePerTonne: 0 };
export const COST_PER_DAY_PER_WATT = 86_400e-9;

/** A duty-loss forecast whose cost rate under UNIT_PRICES is `costRatePerDay(t)`. */
export function forecastFromCostRate(costRatePerDay: (elapsedDays: number) => number): DutyLossForecast {
  return { dutyLossW: (days) => costRatePerDay(days) / COST_PER_DAY_PER_WATT };
}

/** Economics with UNIT_PRICES, a cleaning cost C, an outage, and no outage or throughput losses. */
export function unitEconomics(cleaningCost: number, outageDays = 1): AssetEconomics {
  return {
    energy: UNIT_PRICES,
    method: { name: "hydro-blast", cost: cleaningCost, outageDays },
    outageLostProductionPerDay: 0,
  };
}

export function relativeError(actual: number, expected: number): number {
  return Math.abs(actual - expected) / Math.abs(expected);
}

/** Recursively freezes an object so any write throws in strict mode (ES modules are strict). */
export function deepFreeze<T>(value: T): T {
  if (typeof value === "object" && value !== null) {
    for (const inner of Object.values(value)) deepFreeze(inner);
    Object.freeze(value);
  }
  return value;
}
