import { EconomicsInputError } from "./errors";
import { requireNonNegative } from "./require-non-negative";
import type { EnergyPrices } from "./types";

/**
 * checkEnergyPrices: throws EconomicsInputError unless prices and factors are finite and non-negative and the
 * heater efficiency lies in (0, 1].
 */
export function checkEnergyPrices(prices: EnergyPrices): void {
  requireNonNegative(prices.fuelPricePerGJ, "fuel price", " per GJ");
  requireNonNegative(prices.co2KgPerGJFuel, "CO2 emission factor", " kg/GJ");
  requireNonNegative(prices.co2PricePerTonne, "CO2 price", " per tonne");
  const efficiency = prices.heaterEfficiency;
  if (!Number.isFinite(efficiency) || efficiency <= 0 || efficiency > 1) {
    throw new EconomicsInputError("heater efficiency", `heater efficiency must be in (0, 1], got ${efficiency}`);
  }
}
