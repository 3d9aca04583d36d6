import { SECONDS_PER_DAY } from "./constants";
import { energyCostPerJoule } from "./energy-cost-per-joule";
import type { AssetEconomics } from "./types";

/**
 * cleaningEventCost: cost of one cleaning, C = direct cost + outage cost.
 *
 * Formula: C = C_method + d_charged·(L_outage + ΔQ_bypass·86400·cost per J), where d_charged is the number of
 * outage days that fall outside a turnaround window (during a turnaround the plant is down anyway).
 * Validity: 0 ≤ d_charged ≤ outage days; outage cost proportional to its duration.
 * Source: common practice (cleaning cost plus production and energy lost while the unit is bypassed).
 *
 * @param economics asset economics (method cost and outage, lost production and bypass duty)
 * @param chargedOutageDays outage days outside any turnaround; default the whole outage
 * @returns site currency
 */
export function cleaningEventCost(economics: AssetEconomics, chargedOutageDays: number = economics.method.outageDays): number {
  const bypassPerDay = (economics.bypassDutyLossW ?? 0) * SECONDS_PER_DAY * energyCostPerJoule(economics.energy);
  return economics.method.cost + chargedOutageDays * (economics.outageLostProductionPerDay + bypassPerDay);
}
