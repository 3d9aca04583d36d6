// The economic inputs of one exchanger: its own register values where set, the site defaults otherwise.
import type { Asset, Site } from "../../generated/prisma/client";
import { checkAssetEconomics, type AssetEconomics } from "../core/economics";

/** Name of the cleaning method when the register names none. */
export const DEFAULT_CLEANING_METHOD = "routine cleaning";

type EconomicColumns = Pick<
  Asset,
  | "fuelPriceCentsPerGJ"
  | "furnaceEfficiency"
  | "co2KgPerGJ"
  | "co2PriceCentsPerTonne"
  | "cleaningCostCents"
  | "cleaningOutageDays"
  | "lostProductionCentsPerDay"
  | "dutyThresholdW"
>;
type SiteDefaults = Pick<
  Site,
  | "fuelPriceCentsPerGJ"
  | "furnaceEfficiency"
  | "co2KgPerGJ"
  | "co2PriceCentsPerTonne"
  | "cleaningCostCents"
  | "cleaningOutageDays"
  | "lostProductionCentsPerDay"
>;

/**
 * assetEconomics: the AssetEconomics of lib/core/economics for one asset, money in whole currency units (the register
 * keeps cents).
 *
 * The lost production per day applies while the exchanger is out outside a turnaround, and, as a throughput limit,
 * while its reference duty is below the asset's duty threshold (the plant then runs cut back). While out, the
 * exchanger is bypassed and its whole clean duty is made up at the furnace.
 *
 * @param cleanDutyW duty at reference conditions when clean, W (from the assessment)
 * @throws EconomicsInputError when a resolved value is out of range (e.g. an efficiency above 1)
 */
export function assetEconomics(asset: EconomicColumns, site: SiteDefaults, cleanDutyW: number): AssetEconomics {
  const lostProductionPerDay = (asset.lostProductionCentsPerDay ?? site.lostProductionCentsPerDay) / 100;
  const thresholdLossW = cleanDutyW - asset.dutyThresholdW;
  const economics: AssetEconomics = {
    energy: {
      fuelPricePerGJ: (asset.fuelPriceCentsPerGJ ?? site.fuelPriceCentsPerGJ) / 100,
      heaterEfficiency: asset.furnaceEfficiency ?? site.furnaceEfficiency,
      co2KgPerGJFuel: asset.co2KgPerGJ ?? site.co2KgPerGJ,
      co2PricePerTonne: (asset.co2PriceCentsPerTonne ?? site.co2PriceCentsPerTonne) / 100,
    },
    method: {
      name: DEFAULT_CLEANING_METHOD,
      cost: (asset.cleaningCostCents ?? site.cleaningCostCents) / 100,
      outageDays: asset.cleaningOutageDays ?? site.cleaningOutageDays,
    },
    outageLostProductionPerDay: lostProductionPerDay,
    bypassDutyLossW: Math.max(0, cleanDutyW),
    throughputLimit: lostProductionPerDay > 0 && thresholdLossW > 0 ? { dutyLossW: thresholdLossW, lostProductionPerDay } : null,
  };
  checkAssetEconomics(economics);
  return economics;
}
