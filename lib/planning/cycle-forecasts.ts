// Duty-loss forecasts of the running and of the next fouling cycle, from a stored assessment's trend band.
import type { Assessment } from "../core/assessment";
import { sampledDutyLoss, type DutyLossForecast } from "../core/economics";
import { referenceRating, type ReferenceConditions } from "../core/forecast";
import { DAY_MS } from "../core/plan";


/** What the planner needs from an assessment, or why the asset cannot be planned. */
export type CycleForecasts =
  | {
      ok: true;
      /** Return to service that started the running cycle, epoch ms. */
      cycleOriginMs: number;
      /** Duty at reference conditions when clean, W. */
      cleanDutyW: number;
      currentCycle: DutyLossForecast;
      cleanCycle: DutyLossForecast;
      /** The same series as plain numbers (ages in days, losses W), for display and tests. */
      series: { elapsedDays: number[]; dutyLossW: number[] };
    }
  | { ok: false; reason: string };

/**
 * cycleForecasts: the duty lost at reference conditions along the median (P50) of the current cycle's fitted fouling
 * trend, ΔQ(t) = Q(0) − Q(Rf50(t)), with Q(Rf) the ε–NTU rating at 1/U = 1/U_clean,ref + Rf (referenceRating).
 * The series is made non-decreasing (running maximum), as the economics assume, and interpolated linearly
 * (sampledDutyLoss). The next cycle after a cleaning is taken to repeat the current cycle's fitted trend from its
 * origin: the trend is the asset's own most recent fouling behaviour.
 *
 * @param assessment stored assessment (its trend band runs from the cycle origin to the forecast horizon)
 * @param conditions the asset's reference conditions without the clean resistance (taken from the clean model)
 */
export function cycleForecasts(assessment: Assessment, conditions: Omit<ReferenceConditions, "cleanResistanceM2KPerW">): CycleForecasts {
  if (!assessment.cleanModel) return { ok: false, reason: "no clean-U model (too little usable data)" };
  if (!assessment.trend || assessment.trend.band.length < 2) return { ok: false, reason: "no fouling trend for the current cycle" };
  const current = assessment.cycles.at(-1);
  if (!current) return { ok: false, reason: "no fouling cycle in the data" };
  const cycleOriginMs = Date.parse(current.start);
  const rated: ReferenceConditions = { ...conditions, cleanResistanceM2KPerW: assessment.cleanModel.cleanResistanceAtReferenceM2KPerW };
  const cleanDutyW = referenceRating(rated, 0).dutyW;
  const elapsedDays: number[] = [];
  const dutyLossW: number[] = [];
  let running = 0;
  for (const point of assessment.trend.band) {
    const age = (point.timeMs - cycleOriginMs) / DAY_MS;
    if (age < 0 || (elapsedDays.length > 0 && age <= (elapsedDays.at(-1) as number))) continue;
    const loss = cleanDutyW - referenceRating(rated, Math.max(0, point.p50)).dutyW;
    running = Math.max(running, loss, 0);
    elapsedDays.push(age);
    dutyLossW.push(running);
  }
  if (elapsedDays.length < 2) return { ok: false, reason: "fouling trend band too short to forecast" };
  const forecast = sampledDutyLoss({ elapsedDays, dutyLossW });
  return { ok: true, cycleOriginMs, cleanDutyW, currentCycle: forecast, cleanCycle: forecast, series: { elapsedDays, dutyLossW } };
}
