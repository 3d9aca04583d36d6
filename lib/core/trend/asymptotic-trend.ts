import { covarianceStandardError } from "./covariance-standard-error";
import type { TrendModel } from "./trend-model";

/** Time-constant bounds, days: 0.5 day to 100 years (outside them the curve is a step or a straight line). */
const MINIMUM_TIME_CONSTANT_DAYS = 0.5;
const MAXIMUM_TIME_CONSTANT_DAYS = 36_525;

/** θ·(1 − e^(−t/θ)), the growth of a unit initial rate after t days. */
function growth(timeDays: number, timeConstant: number): number {
  return -timeConstant * Math.expm1(-timeDays / timeConstant);
}

/**
 * Asymptotic fouling (Kern & Seaton): Rf(t) = r0 + R∞·(1 − e^(−t/θ)), t in days since the cycle origin, fitted in the
 * form Rf = r0 + k0·θ·(1 − e^(−t/θ)) with k0 = R∞/θ the initial fouling rate.
 * Internal parameters [r0 (m²·K/W), k0 (m²·K/W per day, ≥ 0), ln θ (θ in days, 0.5 d ≤ θ ≤ 100 a)]; the prior's shape
 * parameter is ln θ. With k0 in place of R∞ the model tends smoothly to the straight line r0 + k0·t as θ grows, so a
 * cycle with little curvature does not send R∞ and θ off to infinity together (a long, curved valley for the fit).
 * 1 − e^(−x) is computed as −expm1(−x). Reported: r0, R∞ = k0·θ (delta-method SE), θ, k0.
 * The family is closed under a shift of the time origin (only r0 and R∞ change), so a cycle that started before the
 * data is fitted as well as one observed from its start.
 * Valid: deposition minus removal proportional to the deposit (dRf/dt = φ_d − Rf/θ), any t ≥ 0.
 * Source: Kern & Seaton (1959), Brit. Chem. Eng. 4(5):258–262; FIELD-NOTES §4 (checks Rf(θ) = 0.63212·R∞,
 * Rf(3θ) = 0.95021·R∞).
 */
export const ASYMPTOTIC_TREND: TrendModel = {
  kind: "asymptotic",
  parameterNames: ["initial", "initialRate", "logTimeConstant"],
  shapeIndex: 2,
  value: (parameters, timeDays) => (parameters[0] as number) + (parameters[1] as number) * growth(timeDays, Math.exp(parameters[2] as number)),
  gradient: (parameters, timeDays, _referenceDays, out) => {
    const timeConstant = Math.exp(parameters[2] as number);
    const ratio = timeDays / timeConstant;
    out[0] = 1;
    out[1] = growth(timeDays, timeConstant);
    out[2] = (parameters[1] as number) * timeConstant * (-Math.expm1(-ratio) - ratio * Math.exp(-ratio));
  },
  bounds: () => ({
    lower: [Number.NEGATIVE_INFINITY, 0, Math.log(MINIMUM_TIME_CONSTANT_DAYS)],
    upper: [Number.POSITIVE_INFINITY, Number.POSITIVE_INFINITY, Math.log(MAXIMUM_TIME_CONSTANT_DAYS)],
  }),
  shapeGrid: (spanDays) => {
    const low = Math.log(Math.max(MINIMUM_TIME_CONSTANT_DAYS, spanDays / 30));
    const high = Math.log(Math.min(MAXIMUM_TIME_CONSTANT_DAYS, Math.max(spanDays, 1) * 30));
    return Array.from({ length: 15 }, (_, index) => low + ((high - low) * index) / 14);
  },
  linearBasis: (shape, timeDays) => growth(timeDays, Math.exp(shape)),
  assemble: (linear, shape) => [linear[0], Math.max(0, linear[1]), shape],
  report: (parameters, covariance) => {
    const rate = parameters[1] as number;
    const timeConstant = Math.exp(parameters[2] as number);
    const logError = covarianceStandardError(covariance, 2);
    const rateVariance = covariance?.[1]?.[1];
    const logVariance = covariance?.[2]?.[2];
    const cross = covariance?.[1]?.[2];
    let asymptoteError: number | null = null;
    if (typeof rateVariance === "number" && typeof logVariance === "number" && typeof cross === "number") {
      // R∞ = k0·θ: ∂/∂k0 = θ, ∂/∂ln θ = k0·θ
      const variance = timeConstant * timeConstant * (rateVariance + rate * rate * logVariance + 2 * rate * cross);
      asymptoteError = variance >= 0 ? Math.sqrt(variance) : null;
    }
    return [
      { name: "initial", value: parameters[0] as number, standardError: covarianceStandardError(covariance, 0), unit: "m²·K/W" },
      { name: "asymptote", value: rate * timeConstant, standardError: asymptoteError, unit: "m²·K/W" },
      { name: "timeConstant", value: timeConstant, standardError: logError === null ? null : timeConstant * logError, unit: "day" },
      { name: "initialRate", value: rate, standardError: covarianceStandardError(covariance, 1), unit: "m²·K/W per day" },
    ];
  },
};
