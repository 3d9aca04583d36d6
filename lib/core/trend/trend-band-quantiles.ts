import { studentTQuantile } from "../fit";
import type { TrendFit } from "./types";

/** Student-t quantiles of the two prediction bands. */
export interface BandQuantiles {
  /** t_0.9(ν): half-width factor of the 80 % band. */
  quantile80: number;
  /** t_0.975(ν): half-width factor of the 95 % band. */
  quantile95: number;
}

/**
 * trendBandQuantiles: the Student-t factors of a fit's 80 % and 95 % two-sided prediction bands.
 *
 * Formula: t_(1−α/2)(ν) for α = 0.2 and 0.05, ν = the fit's (effective) degrees of freedom.
 * Source: FIELD-NOTES §8 (t table and prediction interval).
 *
 * @param fit from fitTrendModel
 */
export function trendBandQuantiles(fit: TrendFit): BandQuantiles {
  return { quantile80: studentTQuantile(0.9, fit.degreesOfFreedom), quantile95: studentTQuantile(0.975, fit.degreesOfFreedom) };
}
