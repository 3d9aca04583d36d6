import type { AssetEconomics } from "../../../lib/core/economics";
import type { PlanAsset } from "../../../lib/core/plan";

/** 2025-01-06, a Monday, 00:00 UTC. */
export const START_MS = Date.UTC(2025, 0, 6);
export const DAY = 86_400_000;

/**
 * Economics in which one watt of lost duty costs 86400e-9 per day (fuel 1 per GJ, efficiency 1, no CO2), a cleaning
 * costs C and takes `outageDays`, with optional outage lost production.
 */
export function unitEconomics(cleaningCost: number, outageDays = 1, outageLostProductionPerDay = 0): AssetEconomics {
  return {
    energy: { fuelPricePerGJ: 1, heaterEfficiency: 1, co2KgPerGJFuel: 0, co2PricePerTonne: 0 },
    method: { name: "hydro-blast", cost: cleaningCost, outageDays },
    outageLostProductionPerDay,
  };
}

/**
 * An asset cleaned at the horizon start whose fouling cost rate grows linearly, c = a·t per day (a = 50 per day²),
 * with cleaning cost C = 122 500 and a 1-day outage: the steady optimum is τ* = −1 + sqrt(1 + 2C/a) = 69.007 d
 * (FIELD-NOTES §5 closed form with downtime).
 */
export function linearAsset(id: string, overrides: Partial<PlanAsset> = {}): PlanAsset {
  const forecast = { dutyLossW: (days: number) => (50 * days) / 86_400e-9 };
  return {
    id,
    tag: `E-${id}`,
    economics: unitEconomics(122_500),
    currentCycle: forecast,
    cleanCycle: forecast,
    lastReturnToServiceMs: START_MS,
    ...overrides,
  };
}
