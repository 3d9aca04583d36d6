import type { LevenbergMarquardtOptions } from "./types";

/** Levenberg–Marquardt options with every default filled in. */
export type ResolvedLevenbergMarquardtOptions = Required<LevenbergMarquardtOptions>;

/**
 * Defaults (tight enough to reproduce the NIST StRD certified values to ≥ 6 significant digits; MINPACK's defaults
 * are sqrt(ε) ≈ 1.5e-8 for the cost and step tests, Moré, Garbow & Hillstrom 1980, from memory):
 * - maximumIterations 500
 * - gradientTolerance 1e-12 (cosine between the residual vector and any Jacobian column)
 * - stepTolerance 1e-12 (scaled step relative to the scaled parameter vector)
 * - costTolerance 1e-14 (relative reduction of ½‖r‖², actual and predicted)
 * - initialDamping 1e-3 (τ of Madsen, Nielsen & Tingleff 2004, Sect. 3.2)
 * - divergenceLimit 1e8 (a parameter exceeding 1e8 times its starting scale is declared diverging)
 */
export const LEVENBERG_MARQUARDT_DEFAULTS: ResolvedLevenbergMarquardtOptions = {
  maximumIterations: 500,
  gradientTolerance: 1e-12,
  stepTolerance: 1e-12,
  costTolerance: 1e-14,
  initialDamping: 1e-3,
  divergenceLimit: 1e8,
};

/**
 * resolveLevenbergMarquardtOptions: fills in the defaults once and checks the values.
 *
 * @throws RangeError for a non-positive tolerance, damping, limit or iteration count
 */
export function resolveLevenbergMarquardtOptions(options: LevenbergMarquardtOptions = {}): ResolvedLevenbergMarquardtOptions {
  const resolved = { ...LEVENBERG_MARQUARDT_DEFAULTS };
  for (const key of Object.keys(LEVENBERG_MARQUARDT_DEFAULTS) as (keyof LevenbergMarquardtOptions)[]) {
    const value = options[key];
    if (value === undefined) continue;
    if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`levenbergMarquardt: ${key} must be a positive finite number, got ${value}`);
    resolved[key] = value;
  }
  resolved.maximumIterations = Math.floor(resolved.maximumIterations);
  return resolved;
}
