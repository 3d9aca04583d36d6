/**
 * Forecast core: rating at reference conditions, critical fouling resistances of the duty, fouling-allowance and
 * outlet-temperature limits, P10/P50/P90 crossing dates from a trend and its band, and the energy lost in a cycle.
 */
export type { CriticalFouling, CrossingCriterion, CrossingForecast, ReferenceConditions } from "./types";
export { referenceRating } from "./reference-rating";
export { criticalFoulingResistance, MAXIMUM_SEARCH_FOULING } from "./critical-fouling-resistance";
export { firstCrossingTime } from "./first-crossing-time";
export { forecastCrossings, type ForecastCrossingsInput, type CrossingTarget } from "./forecast-crossings";
export { cycleLostEnergy } from "./cycle-lost-energy";
