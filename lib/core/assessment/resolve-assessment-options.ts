import type { AssessmentOptions } from "./types";

/** Assessment options with every default filled in. */
export interface ResolvedAssessmentOptions {
  cleanWindowDays: number;
  cleanWindows: "tiled" | "after-cleanings";
  fitExponents: boolean;
  designSplit: { hotFilm: number; coldFilm: number };
  cleanUAtReferenceWPerM2K: number | null;
  validationFraction: number;
  horizonDays: number;
  recentDays: number;
  effectivenessWindowDays: number;
  bandStepDays: number;
  usePriors: boolean;
  autocorrelation: "ar1" | "none";
  aggregation: "daily" | "none";
}

/**
 * Defaults (resolved once):
 * - cleanWindowDays 30, cleanWindows "tiled", fitExponents false, designSplit 0.45/0.45, validationFraction 0.3 (see resolveCleanModelOptions)
 * - cleanUAtReferenceWPerM2K: none (the data sheet's 1/(1/U_design − Rf_design))
 * - horizonDays 1826 (five years, the brief)
 * - recentDays 7 (a week of data for the current observed U; common practice)
 * - effectivenessWindowDays 7 (a week either side of a cleaning; common practice)
 * - bandStepDays 7, usePriors true, autocorrelation "ar1", aggregation "daily"
 *
 * @throws RangeError for non-positive windows or horizon
 */
export function resolveAssessmentOptions(options: AssessmentOptions = {}): ResolvedAssessmentOptions {
  const resolved: ResolvedAssessmentOptions = {
    cleanWindowDays: options.cleanWindowDays ?? 30,
    cleanWindows: options.cleanWindows ?? "tiled",
    fitExponents: options.fitExponents ?? false,
    designSplit: options.designSplit ?? { hotFilm: 0.45, coldFilm: 0.45 },
    cleanUAtReferenceWPerM2K: options.cleanUAtReferenceWPerM2K ?? null,
    validationFraction: options.validationFraction ?? 0.3,
    horizonDays: options.horizonDays ?? 1826,
    recentDays: options.recentDays ?? 7,
    effectivenessWindowDays: options.effectivenessWindowDays ?? 7,
    bandStepDays: options.bandStepDays ?? 7,
    usePriors: options.usePriors ?? true,
    autocorrelation: options.autocorrelation ?? "ar1",
    aggregation: options.aggregation ?? "daily",
  };
  for (const key of ["cleanWindowDays", "horizonDays", "recentDays", "effectivenessWindowDays", "bandStepDays"] as const) {
    if (!(resolved[key] > 0) || !Number.isFinite(resolved[key])) throw new RangeError(`assessAsset: ${key} must be a positive number of days, got ${resolved[key]}`);
  }
  const given = resolved.cleanUAtReferenceWPerM2K;
  if (given !== null && !(given > 0)) throw new RangeError(`assessAsset: cleanUAtReferenceWPerM2K must be positive, got ${given}`);
  return resolved;
}
