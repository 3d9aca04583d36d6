import { covarianceStandardError } from "./covariance-standard-error";
import type { TrendModel } from "./trend-model";

/** Exponent bounds: n = 1 is the straight line; below 0.05 the curve is a step at t = 0. */
const MINIMUM_EXPONENT = 0.05;
const MAXIMUM_EXPONENT = 1;

/**
 * Falling-rate power law: Rf(t) = r0 + c·t^n, 0 < n ≤ 1, t in days since the cycle origin, written as
 * Rf = r0 + A·(t/T)^n with T = referenceDays (the data span), so that A (the growth at t = T) and n are far less
 * correlated than c and n. Internal parameters [r0 (m²·K/W), A (m²·K/W, ≥ 0), n]; the prior's shape parameter is n.
 * Reported: r0, A, n and c = A·T^(−n) (m²·K/W per day^n, standard error by the delta method).
 * Valid: t ≥ 0 from the true start of the cycle (the curve is not closed under a shift of the time origin).
 * Source: falling-rate fouling in Epstein's classification (Epstein 1983, Heat Transfer Eng. 4(1):43–56, from memory);
 * FIELD-NOTES §4 (Rf = k·t^n, n < 1).
 */
export const FALLING_RATE_TREND: TrendModel = {
  kind: "falling-rate",
  parameterNames: ["initial", "amplitude", "exponent"],
  shapeIndex: 2,
  value: (parameters, timeDays, referenceDays) =>
    timeDays <= 0 ? (parameters[0] as number) : (parameters[0] as number) + (parameters[1] as number) * Math.pow(timeDays / referenceDays, parameters[2] as number),
  gradient: (parameters, timeDays, referenceDays, out) => {
    out[0] = 1;
    if (timeDays <= 0) {
      out[1] = 0;
      out[2] = 0;
      return;
    }
    const ratio = timeDays / referenceDays;
    const power = Math.pow(ratio, parameters[2] as number);
    out[1] = power;
    out[2] = (parameters[1] as number) * power * Math.log(ratio);
  },
  bounds: () => ({
    lower: [Number.NEGATIVE_INFINITY, 0, MINIMUM_EXPONENT],
    upper: [Number.POSITIVE_INFINITY, Number.POSITIVE_INFINITY, MAXIMUM_EXPONENT],
  }),
  shapeGrid: () => Array.from({ length: 11 }, (_, index) => MINIMUM_EXPONENT + ((MAXIMUM_EXPONENT - MINIMUM_EXPONENT) * index) / 10),
  linearBasis: (shape, timeDays, referenceDays) => (timeDays <= 0 ? 0 : Math.pow(timeDays / referenceDays, shape)),
  assemble: (linear, shape) => [linear[0], Math.max(0, linear[1]), shape],
  report: (parameters, covariance, referenceDays) => {
    const amplitude = parameters[1] as number;
    const exponent = parameters[2] as number;
    const coefficient = amplitude * Math.pow(referenceDays, -exponent);
    const varianceA = covariance?.[1]?.[1];
    const varianceN = covariance?.[2]?.[2];
    const covarianceAN = covariance?.[1]?.[2];
    let coefficientError: number | null = null;
    if (typeof varianceA === "number" && typeof varianceN === "number" && typeof covarianceAN === "number") {
      const dA = Math.pow(referenceDays, -exponent);
      const dN = -coefficient * Math.log(referenceDays);
      const variance = dA * dA * varianceA + 2 * dA * dN * covarianceAN + dN * dN * varianceN;
      coefficientError = variance >= 0 ? Math.sqrt(variance) : null;
    }
    return [
      { name: "initial", value: parameters[0] as number, standardError: covarianceStandardError(covariance, 0), unit: "m²·K/W" },
      { name: "amplitude", value: amplitude, standardError: covarianceStandardError(covariance, 1), unit: "m²·K/W at the reference time" },
      { name: "exponent", value: exponent, standardError: covarianceStandardError(covariance, 2), unit: "1" },
      { name: "coefficient", value: coefficient, standardError: coefficientError, unit: "m²·K/W per day^n" },
    ];
  },
};
