import { trendBandQuantiles, type BandQuantiles } from "./trend-band-quantiles";
import { TREND_MODELS } from "./trend-models";
import type { BandPoint, TrendFit } from "./types";

/**
 * trendBand: central forecast and 80 % / 95 % prediction bands of a trend fit at given times (delta method).
 *
 * Formula: ŷ(t) = f(t; p̂); Var_mean = gᵀ·Cov·g with g = ∂f/∂p at p̂ (parameters held at a bound contribute
 * nothing); Var_pred = Var_mean + s²; band = ŷ ± t_(1−α/2)(ν)·sqrt(Var_pred), ν = the fit's degrees of freedom
 * (after the AR(1) effective-sample-size correction). For the linear model this is exactly the OLS prediction
 * interval ŷ ± t·s·sqrt(1 + x₀ᵀ(XᵀX)⁻¹x₀).
 * Valid: the delta method is first order in the parameter uncertainty; the bands describe a single future
 * observation of average weight under the fitted model (model error beyond that is not included).
 * Source: Seber & Wild (1989), Nonlinear Regression, Sect. 5.1 (delta-method prediction intervals, from memory);
 * FIELD-NOTES §8 (OLS prediction interval and its check values).
 *
 * @param fit from fitTrendModel
 * @param timesDays days since the cycle origin (not modified)
 * @param quantiles t_0.9(ν) and t_0.975(ν) when the caller has them already (trendBandQuantiles), to save work
 * @returns one BandPoint per time, in the same order
 */
export function trendBand(fit: TrendFit, timesDays: readonly number[], quantiles: BandQuantiles = trendBandQuantiles(fit)): BandPoint[] {
  const model = TREND_MODELS[fit.kind];
  const parameters = fit.internalParameters;
  const count = parameters.length;
  const gradient = new Float64Array(count);
  const { quantile80, quantile95 } = quantiles;
  const observationVariance = fit.residualStandardDeviation === null ? 0 : fit.residualStandardDeviation * fit.residualStandardDeviation;
  const covariance = fit.covariance;
  return timesDays.map((timeDays) => {
    const center = model.value(parameters, timeDays, fit.referenceDays);
    model.gradient(parameters, timeDays, fit.referenceDays, gradient);
    let meanVariance = 0;
    if (covariance !== null) {
      for (let a = 0; a < count; a += 1) {
        const row = covariance[a] as (number | null)[];
        for (let b = 0; b < count; b += 1) {
          const entry = row[b];
          if (entry !== null && entry !== undefined) meanVariance += (gradient[a] as number) * entry * (gradient[b] as number);
        }
      }
    }
    meanVariance = Math.max(0, meanVariance);
    const standardErrorPrediction = Math.sqrt(meanVariance + observationVariance);
    return {
      timeDays,
      center,
      standardErrorMean: Math.sqrt(meanVariance),
      standardErrorPrediction,
      lower80: center - quantile80 * standardErrorPrediction,
      upper80: center + quantile80 * standardErrorPrediction,
      lower95: center - quantile95 * standardErrorPrediction,
      upper95: center + quantile95 * standardErrorPrediction,
    };
  });
}
