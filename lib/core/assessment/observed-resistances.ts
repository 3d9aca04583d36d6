import { observedU, ThermalInputError } from "../thermal";
import type { AssessmentAsset, AssessmentPeriod } from "./types";

/** One period's observed overall resistance. */
export interface ObservedResistance {
  timeMs: number;
  hotFlowKgPerS: number;
  coldFlowKgPerS: number;
  /** 1/U_observed, m²·K/W. */
  resistanceM2KPerW: number;
}

/**
 * observedResistances: 1/U_observed of each usable period from its reconciled duty and measured temperatures.
 *
 * Formula: U_obs = Q/(A·F·LMTD) (thermal core observedU), resistance = 1/U_obs.
 * Valid: periods with consistent terminal temperatures for the arrangement; periods the thermal core rejects
 * (temperature cross, F undefined, non-positive duty) are skipped and counted.
 * Source: Incropera et al. (2007), 6th ed., Sect. 11.3 (rate equation), via lib/core/thermal.
 *
 * @param asset arrangement and area
 * @param periods usable periods in time order (not modified)
 * @returns the resistances and the number of periods rejected by the thermal core
 */
export function observedResistances(
  asset: Pick<AssessmentAsset, "arrangement" | "areaM2">,
  periods: readonly AssessmentPeriod[],
): { points: ObservedResistance[]; rejected: number } {
  const points: ObservedResistance[] = [];
  let rejected = 0;
  for (const period of periods) {
    if (!period.usable) continue;
    try {
      const observed = observedU({
        dutyW: period.dutyW,
        areaM2: asset.areaM2,
        arrangement: asset.arrangement,
        temperatures: { hotInK: period.hotInK, hotOutK: period.hotOutK, coldInK: period.coldInK, coldOutK: period.coldOutK },
      });
      if (!(period.hotFlowKgPerS > 0 && period.coldFlowKgPerS > 0)) {
        rejected += 1;
        continue;
      }
      points.push({
        timeMs: period.startMs,
        hotFlowKgPerS: period.hotFlowKgPerS,
        coldFlowKgPerS: period.coldFlowKgPerS,
        resistanceM2KPerW: 1 / observed.uWPerM2K,
      });
    } catch (error) {
      if (!(error instanceof ThermalInputError)) throw error;
      rejected += 1;
    }
  }
  return { points, rejected };
}
