import { EconomicsInputError } from "./errors";
import { checkEnergyPrices } from "./check-energy-prices";
import { requireNonNegative } from "./require-non-negative";
import type { AssetEconomics } from "./types";

/**
 * checkAssetEconomics: throws EconomicsInputError unless every price, cost and duty is finite and non-negative,
 * the outage lasts more than zero days and the heater efficiency lies in (0, 1].
 */
export function checkAssetEconomics(economics: AssetEconomics): void {
  checkEnergyPrices(economics.energy);
  requireNonNegative(economics.method.cost, "cleaning cost", "");
  const outageDays = economics.method.outageDays;
  if (!Number.isFinite(outageDays) || outageDays <= 0) {
    throw new EconomicsInputError("outage duration", `outage duration must be a finite number > 0, got ${outageDays} days`);
  }
  requireNonNegative(economics.outageLostProductionPerDay, "outage lost production", " per day");
  requireNonNegative(economics.bypassDutyLossW ?? 0, "bypass duty loss", " W");
  const limit = economics.throughputLimit;
  if (limit) {
    requireNonNegative(limit.dutyLossW, "throughput-limit duty loss", " W");
    requireNonNegative(limit.lostProductionPerDay, "throughput-limit lost production", " per day");
  }
}
