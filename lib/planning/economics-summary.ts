// What fouling costs one exchanger now and over its cycle, and its optimal cleaning interval.
import type { Asset, AssetAssessment, Site } from "../../generated/prisma/client";
import { cleaningEventCost, foulingCostSummary, optimalCleaningInterval, type OptimalCleaningInterval } from "../core/economics";
import { assetPlanBasis } from "./asset-plan-basis";
import { DAY_MS } from "../core/plan";


/** The economics of one asset as the asset page, the fleet table and the API show them (site currency, SI). */
export interface EconomicsSummary {
  currency: string;
  /** Days in service in the running cycle at the assessment date. */
  cycleAgeDays: number;
  dutyLossW: number;
  costPerDay: number;
  energyCostPerDay: number;
  lostProductionPerDay: number;
  fuelGJPerDay: number;
  co2TonnesPerDay: number;
  cycleCostToDate: number;
  /** Cost rate and cost from the assessment date 30, 90 and 365 days ahead. */
  projection: { daysFromNow: number; costPerDay: number; costFromNow: number }[];
  cleaningEventCost: number;
  optimalInterval: OptimalCleaningInterval;
  inputs: { fuelPricePerGJ: number; heaterEfficiency: number; co2KgPerGJFuel: number; co2PricePerTonne: number; cleaningCost: number; outageDays: number; lostProductionPerDay: number };
}

/**
 * economicsSummary: the fouling cost of an asset at its assessment date (foulingCostSummary on the P50 duty-loss
 * forecast) and the cleaning interval that minimises the average cost rate over a cycle (optimalCleaningInterval,
 * Epstein's and Ma & Epstein's cost-rate criterion), or the reason it cannot be costed.
 */
export function economicsSummary(asset: Asset, site: Site, stored: Pick<AssetAssessment, "result"> | null): { ok: true; summary: EconomicsSummary } | { ok: false; reason: string } {
  const basis = assetPlanBasis(asset, site, stored);
  if (!basis.ok) return basis;
  const cycleAgeDays = Math.max(0, (basis.assessment.asOfMs - basis.forecasts.cycleOriginMs) / DAY_MS);
  const now = foulingCostSummary(basis.economics, basis.forecasts.currentCycle, { elapsedDays: cycleAgeDays, projectionDays: [30, 90, 365] });
  const { energy, method } = basis.economics;
  return {
    ok: true,
    summary: {
      currency: site.currency,
      cycleAgeDays,
      dutyLossW: now.dutyLossW,
      costPerDay: now.costPerDay,
      energyCostPerDay: now.energyCostPerDay,
      lostProductionPerDay: now.lostProductionPerDay,
      fuelGJPerDay: now.fuelGJPerDay,
      co2TonnesPerDay: now.co2TonnesPerDay,
      cycleCostToDate: now.cycleCostToDate,
      projection: now.projection.map((point) => ({ daysFromNow: point.daysFromNow, costPerDay: point.costPerDay, costFromNow: point.costFromNow })),
      cleaningEventCost: cleaningEventCost(basis.economics),
      optimalInterval: optimalCleaningInterval(basis.economics, basis.forecasts.cleanCycle),
      inputs: {
        fuelPricePerGJ: energy.fuelPricePerGJ,
        heaterEfficiency: energy.heaterEfficiency,
        co2KgPerGJFuel: energy.co2KgPerGJFuel,
        co2PricePerTonne: energy.co2PricePerTonne,
        cleaningCost: method.cost,
        outageDays: method.outageDays,
        lostProductionPerDay: basis.economics.outageLostProductionPerDay,
      },
    },
  };
}
