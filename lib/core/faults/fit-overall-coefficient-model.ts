import { invertPositiveDefinite } from "../reconcile/invert-positive-definite";
import { MAD_SCALE_FACTOR } from "../screening/mad-scale-factor";
import { medianValue } from "../screening/median-value";
import { predictOverallCoefficient } from "./predict-overall-coefficient";
import type { OverallCoefficientModel } from "./types";

/** Dittus–Boelter flow exponent of a film coefficient (FIELD-NOTES §4: Nu ∝ Re^0.8). */
export const FILM_FLOW_EXPONENT = 0.8;
const DAY_MS = 86_400_000;

/** Points of {@link fitOverallCoefficientModel}: equal-length columns. */
export interface CoefficientPoints {
  timeMs: ArrayLike<number>;
  hotFlowKgPerS: ArrayLike<number>;
  coldFlowKgPerS: ArrayLike<number>;
  uWPerM2K: ArrayLike<number>;
}

/**
 * fitOverallCoefficientModel: a robust least-squares fit of 1/U against the two flows and time over a short window.
 *
 * Formula: 1/U_t = c₀ + c_h·m_h^(−0.8) + c_c·m_c^(−0.8) + c_t·(t − t_ref)/day + e_t, by least squares on centred
 * regressors with a small ridge (1e-6 of each regressor's variance, so that flows moving together do not make the
 * system singular), with c_h, c_c, c_t ≥ 0 (film resistances and the fouling rate cannot be negative; a small active
 * set: the most negative coefficient is fixed at zero and the rest refitted), then up to two passes that drop points
 * whose relative residual is beyond 3.5 robust σ (1.4826·MAD) and refit. The constraints matter because throughput
 * moves both flows together, so an unconstrained fit can trade a large positive c_h against a negative c_c and then
 * extrapolate badly when the flow mix changes.
 * t_ref is the last point's time, so the model predicts forward from the end of the window.
 * Valid: a window of days to a few weeks without a cleaning (fouling close to linear and not falling); flows within
 * the fitted range.
 * Source: Wilson-plot form (Wilson 1915, Trans. ASME 37:47–82; FIELD-NOTES §4); trimming is a simple robust
 * regression (cf. Rousseeuw & Leroy 1987, Robust Regression and Outlier Detection; from memory).
 *
 * @param points times, flows and observed U (non-finite or non-positive entries skipped); not modified.
 * @returns the model, or null with fewer than 8 usable points.
 */
export function fitOverallCoefficientModel(points: CoefficientPoints): OverallCoefficientModel | null {
  let referenceTimeMs = Number.NEGATIVE_INFINITY;
  const rows: { features: [number, number, number]; r: number; u: number; mh: number; mc: number; t: number }[] = [];
  for (let index = 0; index < points.uWPerM2K.length; index += 1) {
    const mh = points.hotFlowKgPerS[index] as number;
    const mc = points.coldFlowKgPerS[index] as number;
    const u = points.uWPerM2K[index] as number;
    const t = points.timeMs[index] as number;
    if (mh > 0 && mc > 0 && u > 0 && Number.isFinite(mh) && Number.isFinite(mc) && Number.isFinite(u) && Number.isFinite(t)) {
      referenceTimeMs = Math.max(referenceTimeMs, t);
      rows.push({ features: [Math.pow(mh, -FILM_FLOW_EXPONENT), Math.pow(mc, -FILM_FLOW_EXPONENT), t], r: 1 / u, u, mh, mc, t });
    }
  }
  for (const row of rows) row.features[2] = (row.t - referenceTimeMs) / DAY_MS;
  let kept = rows;
  let model: OverallCoefficientModel | null = null;
  for (let pass = 0; pass < 3; pass += 1) {
    if (kept.length < 8) return model;
    const n = kept.length;
    const means = [0, 0, 0];
    let meanR = 0;
    for (const row of kept) {
      for (let j = 0; j < 3; j += 1) means[j] = (means[j] as number) + (row.features[j] as number) / n;
      meanR += row.r / n;
    }
    const normal = [
      [0, 0, 0],
      [0, 0, 0],
      [0, 0, 0],
    ];
    const right = [0, 0, 0];
    for (const row of kept) {
      const centred = row.features.map((value, j) => value - (means[j] as number));
      for (let j = 0; j < 3; j += 1) {
        right[j] = (right[j] as number) + (centred[j] as number) * (row.r - meanR);
        for (let k = 0; k < 3; k += 1) (normal[j] as number[])[k] = ((normal[j] as number[])[k] as number) + (centred[j] as number) * (centred[k] as number);
      }
    }
    for (let j = 0; j < 3; j += 1) {
      const diagonal = (normal[j] as number[])[j] as number;
      (normal[j] as number[])[j] = diagonal * (1 + 1e-6) + 1e-300;
    }
    // Non-negative least squares by a small active set: film resistances and the fouling rate cannot be negative.
    const free = [true, true, true];
    let coefficients = [0, 0, 0];
    for (let attempt = 0; attempt < 3; attempt += 1) {
      const active = [0, 1, 2].filter((j) => free[j]);
      const coefficientsHere = [0, 0, 0];
      if (active.length > 0) {
        let inverse: number[][];
        try {
          inverse = invertPositiveDefinite(active.map((j) => active.map((k) => (normal[j] as number[])[k] as number)));
        } catch {
          return model;
        }
        active.forEach((j, a) => {
          coefficientsHere[j] = (inverse[a] as number[]).reduce((sum, value, b) => sum + value * (right[active[b] as number] as number), 0);
        });
      }
      coefficients = coefficientsHere;
      let mostNegative = -1;
      for (const j of active) if ((coefficients[j] as number) < 0 && (mostNegative < 0 || (coefficients[j] as number) < (coefficients[mostNegative] as number))) mostNegative = j;
      if (mostNegative < 0) break;
      free[mostNegative] = false;
    }
    const [hotCoefficient, coldCoefficient, timeCoefficient] = coefficients as [number, number, number];
    const intercept = meanR - hotCoefficient * (means[0] as number) - coldCoefficient * (means[1] as number) - timeCoefficient * (means[2] as number);
    const candidate: OverallCoefficientModel = {
      intercept,
      hotCoefficient,
      coldCoefficient,
      exponent: FILM_FLOW_EXPONENT,
      timeCoefficient,
      referenceTimeMs,
      relativeResidualStandardDeviation: 0,
      count: n,
    };
    const relative = kept.map((row) => row.u / predictOverallCoefficient(candidate, row.mh, row.mc, row.t) - 1);
    const centre = medianValue(relative);
    const spread = MAD_SCALE_FACTOR * medianValue(relative.map((value) => Math.abs(value - centre)));
    model = { ...candidate, relativeResidualStandardDeviation: spread };
    const next = kept.filter((_, index) => Math.abs((relative[index] as number) - centre) <= 3.5 * spread);
    if (next.length === kept.length) break;
    kept = next;
  }
  return model;
}
