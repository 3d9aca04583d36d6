import type { Highs } from "highs";
import { comparePlans, type PlanComparison } from "./compare-plans";
import { PlanInputError } from "./errors";
import { planCleanings } from "./plan-cleanings";
import type { CleaningPlan, PlanInput, PlanOptions } from "./types";

/** Changes of a what-if scenario; omitted ones keep the baseline. */
export interface WhatIfScenario {
  /** Multiplies every asset's fuel price (e.g. 1.3 for +30 %). */
  fuelPriceFactor?: number;
  /** Multiplies every asset's CO2 price. */
  co2PriceFactor?: number;
  /** Multiplies the crew capacity of every week (rounded down to whole crews). */
  crewCapacityFactor?: number;
  /** Adds crews to every week (after the factor; never below 0). */
  crewCapacityDelta?: number;
}

/** Result of {@link whatIfPlan}. */
export interface WhatIfResult {
  baseline: CleaningPlan;
  scenario: CleaningPlan;
  comparison: PlanComparison;
}

/**
 * whatIfPlan: plans the baseline and a scenario with scaled fuel or CO2 prices or changed crew capacity, and compares
 * them (comparePlans; each plan's costs are in its own prices).
 *
 * @throws PlanInputError for negative or non-finite factors
 */
export function whatIfPlan(highs: Highs, input: PlanInput, scenario: WhatIfScenario, options: PlanOptions = {}): WhatIfResult {
  const factor = (value: number | undefined, name: string): number => {
    const resolved = value ?? 1;
    if (!Number.isFinite(resolved) || resolved < 0) throw new PlanInputError(name, `${name} must be a finite number >= 0, got ${resolved}`);
    return resolved;
  };
  const fuel = factor(scenario.fuelPriceFactor, "fuelPriceFactor");
  const co2 = factor(scenario.co2PriceFactor, "co2PriceFactor");
  const crews = factor(scenario.crewCapacityFactor, "crewCapacityFactor");
  const delta = scenario.crewCapacityDelta ?? 0;
  if (!Number.isInteger(delta)) throw new PlanInputError("crewCapacityDelta", `crewCapacityDelta must be a whole number, got ${delta}`);
  const scale = (capacity: number): number => Math.max(0, Math.floor(capacity * crews + 1e-9) + delta);
  const capacity = input.site.crewCapacity;
  const changed: PlanInput = {
    ...input,
    site: { ...input.site, crewCapacity: typeof capacity === "number" ? scale(capacity) : capacity.map(scale) },
    assets: input.assets.map((asset) => ({
      ...asset,
      economics: {
        ...asset.economics,
        energy: {
          ...asset.economics.energy,
          fuelPricePerGJ: asset.economics.energy.fuelPricePerGJ * fuel,
          co2PricePerTonne: asset.economics.energy.co2PricePerTonne * co2,
        },
      },
    })),
  };
  const baseline = planCleanings(highs, input, options);
  const scenarioPlan = planCleanings(highs, changed, options);
  return { baseline, scenario: scenarioPlan, comparison: comparePlans(baseline, scenarioPlan) };
}
