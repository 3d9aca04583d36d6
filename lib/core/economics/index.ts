/**
 * Fouling economics: pure functions. Power W, energy J, durations in days, money as plain numbers in the site
 * currency (see types.ts).
 */
export type {
  AssetEconomics,
  CleaningMethod,
  DutyLossForecast,
  EnergyPrices,
  FoulingCostPoint,
  FoulingCostSummary,
  OptimalCleaningInterval,
  ThroughputLimit,
} from "./types";
export { SECONDS_PER_DAY, JOULES_PER_GIGAJOULE, KILOGRAMS_PER_TONNE } from "./constants";
export { EconomicsInputError } from "./errors";
export { checkAssetEconomics } from "./check-asset-economics";
export { checkEnergyPrices } from "./check-energy-prices";
export { energyCostPerJoule } from "./energy-cost-per-joule";
export { foulingCostRate, type FoulingCostRate } from "./fouling-cost-rate";
export { integrateAdaptiveSimpson, type AdaptiveSimpsonOptions } from "./integrate-adaptive-simpson";
export { foulingCostBetween } from "./fouling-cost-between";
export { cleaningEventCost } from "./cleaning-event-cost";
export { averageCostRate, type AverageCostRateOptions } from "./average-cost-rate";
export { optimalCleaningInterval, type CleaningIntervalOptions } from "./optimal-cleaning-interval";
export { optimalCleaningMethod, type CleaningMethodChoice } from "./optimal-cleaning-method";
export { relativeCycleValue, type RelativeCycleValueOptions } from "./relative-cycle-value";
export { foulingCostSummary, type FoulingCostSummaryOptions } from "./fouling-cost-summary";
export { dutyLossFromResistance } from "./duty-loss-from-resistance";
export { sampledDutyLoss, type DutyLossSeries } from "./sampled-duty-loss";
export { foulingRatingCurve } from "./fouling-rating-curve";
