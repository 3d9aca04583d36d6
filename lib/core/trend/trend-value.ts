import { TREND_MODELS } from "./trend-models";
import type { TrendFit } from "./types";

/**
 * trendValue: the fitted fouling resistance of a trend fit at a time in its cycle.
 *
 * Formula: the model's curve (see linear-trend, asymptotic-trend, falling-rate-trend) at the fitted parameters.
 *
 * @param fit from fitTrendModel
 * @param timeDays days since the cycle origin
 * @returns Rf, m²·K/W
 */
export function trendValue(fit: TrendFit, timeDays: number): number {
  return TREND_MODELS[fit.kind].value(fit.internalParameters, timeDays, fit.referenceDays);
}
