import type { DutyLossForecast } from "./types";

/**
 * dutyLossFromResistance: a duty-loss forecast from a fouling-resistance forecast and a rating curve.
 *
 * Formula: ΔQ(t) = max(0, Q(Rf = 0) − Q(Rf(t))), with Q(Rf) the duty at reference conditions for a fouling
 * resistance Rf (e.g. foulingRatingCurve, 1/U = 1/U_clean + Rf).
 * Validity: the rating curve is evaluated at fixed reference conditions, so the loss is the fouling effect alone;
 * the loss is measured from the fully clean exchanger, so a residual left by an imperfect cleaning costs from day 0.
 * Source: definition (FIELD-NOTES §4 resistance model; duty from the ε–NTU rating).
 *
 * @param resistanceM2KPerW fouling resistance against days since return to service, m²·K/W (e.g. a fitted model)
 * @param dutyAtResistanceW duty at reference conditions for a given resistance, W
 * @returns a DutyLossForecast
 * @example dutyLossFromResistance((days) => 1e-5 * days, foulingRatingCurve(cleanRatingInput))
 */
export function dutyLossFromResistance(
  resistanceM2KPerW: (elapsedDays: number) => number,
  dutyAtResistanceW: (resistanceM2KPerW: number) => number,
): DutyLossForecast {
  const cleanDutyW = dutyAtResistanceW(0);
  return {
    dutyLossW: (elapsedDays) => Math.max(0, cleanDutyW - dutyAtResistanceW(resistanceM2KPerW(elapsedDays))),
  };
}
