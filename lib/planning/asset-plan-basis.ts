// Everything the economics and the planner take from one asset's register row and stored assessment.
import type { Asset, AssetAssessment, Site } from "../../generated/prisma/client";
import type { Assessment } from "../core/assessment";
import type { AssetEconomics } from "../core/economics";
import { EconomicsInputError } from "../core/economics";
import type { ThresholdCrossing } from "../core/plan";
import { assetReferenceRating } from "../data/exchanger-model";
import { assetEconomics } from "./asset-economics";
import { cycleForecasts, type CycleForecasts } from "./cycle-forecasts";

export type AssetPlanBasis =
  | {
      ok: true;
      assessment: Assessment;
      economics: AssetEconomics;
      forecasts: Extract<CycleForecasts, { ok: true }>;
      thresholdCrossing: ThresholdCrossing | null;
    }
  | { ok: false; reason: string };

/**
 * assetPlanBasis: the asset's economics (register values over site defaults), its duty-loss forecasts (cycleForecasts)
 * and the dates its reference duty crosses the threshold (P10/P50/P90 of the assessment's duty forecast; a threshold
 * already crossed counts as crossed at that date for every quantile), or the reason the asset cannot be costed.
 */
export function assetPlanBasis(asset: Asset, site: Site, stored: Pick<AssetAssessment, "result"> | null): AssetPlanBasis {
  if (!stored) return { ok: false, reason: "not assessed yet (no usable operating data)" };
  const assessment = stored.result as unknown as Assessment;
  const forecasts = cycleForecasts(assessment, assetReferenceRating(asset));
  if (!forecasts.ok) return forecasts;
  let economics: AssetEconomics;
  try {
    economics = assetEconomics(asset, site, forecasts.cleanDutyW);
  } catch (error) {
    if (error instanceof EconomicsInputError) return { ok: false, reason: `economic inputs: ${error.message}` };
    throw error;
  }
  const duty = assessment.forecasts.duty;
  let thresholdCrossing: ThresholdCrossing | null = null;
  if (duty.status === "already-crossed" || duty.status === "broken-when-clean") {
    const crossed = duty.crossedAtMs ?? assessment.asOfMs;
    thresholdCrossing = { p10Ms: crossed, p50Ms: crossed, p90Ms: crossed };
  } else if (duty.p10Ms !== null || duty.p50Ms !== null || duty.p90Ms !== null) {
    thresholdCrossing = { p10Ms: duty.p10Ms, p50Ms: duty.p50Ms, p90Ms: duty.p90Ms };
  }
  return { ok: true, assessment, economics, forecasts, thresholdCrossing };
}
