import { checkAssetEconomics } from "./check-asset-economics";
import { EconomicsInputError } from "./errors";
import { JOULES_PER_GIGAJOULE, KILOGRAMS_PER_TONNE, SECONDS_PER_DAY } from "./constants";
import { foulingCostBetween } from "./fouling-cost-between";
import { foulingCostRate } from "./fouling-cost-rate";
import type { AssetEconomics, DutyLossForecast, FoulingCostSummary } from "./types";

/** Options of {@link foulingCostSummary}. */
export interface FoulingCostSummaryOptions {
  /** Days since return to service now, >= 0. */
  elapsedDays: number;
  /** Days after now at which to project the cost (e.g. [7, 30, 90]); default none. */
  projectionDays?: readonly number[];
}

/**
 * foulingCostSummary: what fouling costs one exchanger now, what it will cost, and what the current cycle has cost.
 *
 * Formula: c(now) = foulingCostRate(ΔQ(now)); fuel = ΔQ·86400/(η·1e9) GJ/day; CO2 = fuel·f_CO2/1000 t/day;
 * cycle cost to date = ∫₀^now c dt; projected cost from now = ∫_now^(now+d) c dt.
 * Validity: as foulingCostRate and foulingCostBetween (the throughput penalty assumes a non-decreasing loss).
 * Source: furnace energy balance and IPCC (2006) Vol. 2 Ch. 2 Eq. 2.1 (see energyCostPerJoule).
 *
 * @param economics asset economics
 * @param forecast duty loss over the current cycle
 * @param options age now and projection offsets
 * @returns rates now (money, fuel, CO2), cycle cost to date and the projection
 * @throws EconomicsInputError on invalid economics or a negative age
 */
export function foulingCostSummary(
  economics: AssetEconomics,
  forecast: DutyLossForecast,
  options: FoulingCostSummaryOptions,
): FoulingCostSummary {
  checkAssetEconomics(economics);
  const elapsedDays = options.elapsedDays;
  if (!Number.isFinite(elapsedDays) || elapsedDays < 0) {
    throw new EconomicsInputError("elapsed days", `elapsed days must be a finite number >= 0, got ${elapsedDays}`);
  }
  const dutyLossW = forecast.dutyLossW(elapsedDays);
  const rate = foulingCostRate(economics, dutyLossW);
  const fuelGJPerDay = (dutyLossW * SECONDS_PER_DAY) / (economics.energy.heaterEfficiency * JOULES_PER_GIGAJOULE);
  const cycleCostToDate = foulingCostBetween(economics, forecast, 0, elapsedDays);
  const projection = (options.projectionDays ?? []).map((daysFromNow) => {
    if (!Number.isFinite(daysFromNow) || daysFromNow < 0) {
      throw new EconomicsInputError("projection days", `projection days must be finite and >= 0, got ${daysFromNow}`);
    }
    const costFromNow = foulingCostBetween(economics, forecast, elapsedDays, elapsedDays + daysFromNow);
    return {
      daysFromNow,
      elapsedDays: elapsedDays + daysFromNow,
      costPerDay: foulingCostRate(economics, forecast.dutyLossW(elapsedDays + daysFromNow)).totalPerDay,
      costFromNow,
      cycleCostToDate: cycleCostToDate + costFromNow,
    };
  });
  return {
    elapsedDays,
    dutyLossW,
    costPerDay: rate.totalPerDay,
    energyCostPerDay: rate.energyPerDay,
    lostProductionPerDay: rate.lostProductionPerDay,
    fuelGJPerDay,
    co2TonnesPerDay: (fuelGJPerDay * economics.energy.co2KgPerGJFuel) / KILOGRAMS_PER_TONNE,
    cycleCostToDate,
    projection,
  };
}
