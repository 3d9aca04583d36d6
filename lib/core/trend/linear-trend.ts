import { covarianceStandardError } from "./covariance-standard-error";
import type { TrendModel } from "./trend-model";

/**
 * Linear fouling: Rf(t) = r0 + k·t, t in days since the cycle origin.
 * Internal parameters [r0 (m²·K/W), k (m²·K/W per day)]; the prior's shape parameter is the rate k.
 * Valid: constant deposition rate without removal (e.g. hard scale, coking), any t ≥ 0.
 * Source: linear fouling curve in Epstein's classification (Epstein 1983, Heat Transfer Eng. 4(1):43–56, from
 * memory); FIELD-NOTES §4.
 */
export const LINEAR_TREND: TrendModel = {
  kind: "linear",
  parameterNames: ["initial", "rate"],
  shapeIndex: 1,
  value: (parameters, timeDays) => (parameters[0] as number) + (parameters[1] as number) * timeDays,
  gradient: (_parameters, timeDays, _referenceDays, out) => {
    out[0] = 1;
    out[1] = timeDays;
  },
  bounds: () => ({ lower: [Number.NEGATIVE_INFINITY, Number.NEGATIVE_INFINITY], upper: [Number.POSITIVE_INFINITY, Number.POSITIVE_INFINITY] }),
  shapeGrid: () => [0],
  linearBasis: (_shape, timeDays) => timeDays,
  assemble: (linear) => [linear[0], linear[1]],
  report: (parameters, covariance) => [
    { name: "initial", value: parameters[0] as number, standardError: covarianceStandardError(covariance, 0), unit: "m²·K/W" },
    { name: "rate", value: parameters[1] as number, standardError: covarianceStandardError(covariance, 1), unit: "m²·K/W per day" },
  ],
};
