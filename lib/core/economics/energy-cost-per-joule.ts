import { checkEnergyPrices } from "./check-energy-prices";
import { JOULES_PER_GIGAJOULE, KILOGRAMS_PER_TONNE } from "./constants";
import type { EnergyPrices } from "./types";

/**
 * energyCostPerJoule: money per joule of exchanger duty lost, when the lost preheat is made up at a fired heater.
 *
 * Formula: cost/J = (p_fuel + f_CO2·p_CO2/1000) / (η·1e9), p_fuel per GJ fuel, f_CO2 kg/GJ fuel, p_CO2 per tonne.
 * Validity: the furnace has spare firing capacity and its efficiency η does not change with the extra firing;
 * fuel price, emission factor and efficiency on one heating-value basis.
 * Source: fuel = lost duty / efficiency is the energy balance over the furnace (FIELD-NOTES §7, efficiency
 * 75–92 % LHV [M]); fuel CO2 = fuel energy × emission factor as in IPCC (2006) Guidelines for National Greenhouse
 * Gas Inventories, Vol. 2, Ch. 2, Eq. 2.1 (Tier 1: emissions = fuel consumed × emission factor; from memory).
 *
 * @param prices fuel and CO2 prices, emission factor, heater efficiency
 * @returns site currency per J of lost duty
 * @throws EconomicsInputError on negative or non-finite prices or an efficiency outside (0, 1]
 * @example energyCostPerJoule({ fuelPricePerGJ: 8, heaterEfficiency: 0.8, co2KgPerGJFuel: 56.1, co2PricePerTonne: 80 })
 *   // (8 + 4.488) / 0.8e9 = 1.561e-8 per J
 */
export function energyCostPerJoule(prices: EnergyPrices): number {
  checkEnergyPrices(prices);
  const pricePerGJFuel = prices.fuelPricePerGJ + (prices.co2KgPerGJFuel / KILOGRAMS_PER_TONNE) * prices.co2PricePerTonne;
  return pricePerGJFuel / (prices.heaterEfficiency * JOULES_PER_GIGAJOULE);
}
