import { SECONDS_PER_DAY } from "./constants";
import { energyCostPerJoule } from "./energy-cost-per-joule";
import type { AssetEconomics } from "./types";

/** The two parts of a fouling cost rate, money per day. */
export interface FoulingCostRate {
  /** Fuel and CO2 to make up the lost duty, per day. */
  energyPerDay: number;
  /** Lost production while the duty loss exceeds the throughput limit, per day. */
  lostProductionPerDay: number;
  /** Sum of the two, per day. */
  totalPerDay: number;
}

/**
 * foulingCostRate: cost per day of running with a given duty loss.
 *
 * Formula: c = ΔQ·86400·(p_fuel + f_CO2·p_CO2/1000)/(η·1e9) + (ΔQ > ΔQ_limit ? L_limit : 0).
 * Validity: as energyCostPerJoule; the throughput penalty is a step (the plant is either limited or not).
 * Source: energy part FIELD-NOTES §5 model c(t) = b·Rf(t) generalised to any duty loss; step penalty is common
 * practice for hydraulic or firing limits.
 *
 * @param economics asset economics (energy prices, optional throughput limit)
 * @param dutyLossW duty lost to fouling, W (>= 0)
 * @returns energy, lost production and total, per day
 */
export function foulingCostRate(economics: AssetEconomics, dutyLossW: number): FoulingCostRate {
  const energyPerDay = dutyLossW * SECONDS_PER_DAY * energyCostPerJoule(economics.energy);
  const limit = economics.throughputLimit;
  const lostProductionPerDay = limit && dutyLossW > limit.dutyLossW ? limit.lostProductionPerDay : 0;
  return { energyPerDay, lostProductionPerDay, totalPerDay: energyPerDay + lostProductionPerDay };
}
