import { trendValue, type TrendFit } from "../trend";
import { referenceRating } from "./reference-rating";
import type { ReferenceConditions } from "./types";

const SECONDS_PER_DAY = 86_400;
/** At most this many rating nodes per integral (the integrand is smooth; trapezoid error is then negligible). */
const MAXIMUM_NODES = 400;

/**
 * cycleLostEnergy: heat not transferred in the current cycle because of fouling, at reference conditions.
 *
 * Formula: E = ∫ from t0 to t1 of [Q_ref(0) − Q_ref(Rf̂(t))] dt, Q_ref(Rf) the duty rated at reference conditions
 * (referenceRating), Rf̂ the fitted trend; trapezoid rule on at most 400 equal steps of at least one day.
 * Valid: reference conditions stand in for actual operation, and operation is assumed continuous over the interval
 * (shutdown days count as operating); the result is an index of the energy lost, not a metered quantity.
 * Source: trapezoid rule (e.g. Press et al. 2007, Sect. 4.1); duty loss as in Kern (1950), Ch. 6 (from memory).
 *
 * @param conditions reference conditions
 * @param fit current cycle's trend
 * @param fromDays start of the interval (cycle time, days), usually 0
 * @param toDays end (asOf in cycle time), days
 * @returns energy, J (0 for an empty interval)
 */
export function cycleLostEnergy(conditions: ReferenceConditions, fit: TrendFit, fromDays: number, toDays: number): number {
  if (!(toDays > fromDays)) return 0;
  const cleanDuty = referenceRating(conditions, 0).dutyW;
  const steps = Math.max(1, Math.min(MAXIMUM_NODES, Math.ceil(toDays - fromDays)));
  const width = (toDays - fromDays) / steps;
  let sum = 0;
  for (let index = 0; index <= steps; index += 1) {
    const fouling = Math.max(0, trendValue(fit, fromDays + index * width));
    const loss = cleanDuty - referenceRating(conditions, fouling).dutyW;
    sum += index === 0 || index === steps ? 0.5 * loss : loss;
  }
  return sum * width * SECONDS_PER_DAY;
}
