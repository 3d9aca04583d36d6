import { R_STATISTIC_DEFAULTS } from "../screening/cao-rhinehart-r-statistic";
import { nominalStep } from "../screening/nominal-step";
import { STEADY_STATE_CRITICAL_VALUE, STEADY_STATE_SIGNALS } from "../screening/steady-state-flags";
import type { ReadingColumns } from "../screening/types";
import type { DataQualityOptions } from "./assess-data-quality";
import type { ResolvedDataQualitySettings } from "./types";

/**
 * Sampling interval above which the steady-state test changes to its historian-data settings, s (5 minutes).
 * Below it, the published settings (Cao & Rhinehart 1995; FIELD-NOTES §6): the inlet temperatures and flows, R < 2.
 */
export const FAST_SAMPLING_LIMIT_S = 300;

/**
 * Steady-state settings for hourly (historian) data: the two flows only, R < 3.
 * Why: at hourly sampling the inlet temperatures wander slowly (feed tanks, column draws, weather: correlation times
 * of 12–48 h), which the R statistic reads as "not steady" although an exchanger (time constant of minutes) is
 * quasi-steady at every hourly sample. On three demo exchangers (2.25 years each, simulated with known modes)
 * requiring all four signals at R < 2 passed only 13 % of the truly normal hours; the two flows at R < 3 pass 89 %
 * of them and flag 50 % of the 12-hour "transient" windows after throughput steps (most of the real movement: the
 * steps settle with a 3-hour time constant) and, with the in-service check, 96 % of shutdown, start-up and cleaning
 * hours. On one-minute data the published settings pass 99 % of normal minutes. Source: measured in
 * test/core/screening/steady-state-flags.test.ts (simulation with known truth).
 */
export const HISTORIAN_STEADY_STATE = { signals: ["hotFlow", "coldFlow"] as const, criticalValue: 3 };

/**
 * resolveDataQualitySettings: the settings assessDataQuality will use, defaults filled in once.
 *
 * Defaults: hourly periods; α = 0.05; minimumSamples = half the samples a full period holds (at least 1);
 * periods aligned to UTC (originMs 0); Hampel k = 6, t = 3; steady state by sampling interval (published settings up
 * to 5 minutes, HISTORIAN_STEADY_STATE above); in-service minimum 0.3 of the reference flow; plausibility 3σ.
 *
 * @throws RangeError for α outside (0, 1) or a period other than 3600 or 86400 s.
 */
export function resolveDataQualitySettings(columns: ReadingColumns, options: DataQualityOptions = {}): ResolvedDataQualitySettings {
  const periodS = options.periodS ?? 3600;
  if (periodS !== 3600 && periodS !== 86400) throw new RangeError(`period must be 3600 or 86400 s, got ${String(periodS)}`);
  const alpha = options.alpha ?? 0.05;
  if (!(alpha > 0 && alpha < 1)) throw new RangeError(`alpha must be in (0, 1), got ${alpha}`);
  const step = nominalStep(columns.timeMs);
  const nominalStepS = Number.isFinite(step) ? step / 1000 : null;
  const perPeriod = nominalStepS === null ? 1 : Math.max(1, Math.round(periodS / nominalStepS));
  const minimumSamples = options.minimumSamples ?? Math.max(1, Math.ceil(perPeriod / 2));
  if (!(minimumSamples >= 1)) throw new RangeError(`minimum samples must be at least 1, got ${minimumSamples}`);
  const fast = nominalStepS !== null && nominalStepS <= FAST_SAMPLING_LIMIT_S;
  const steady = options.screening?.steadyState;
  return {
    periodS,
    alpha,
    minimumSamples,
    originMs: options.originMs ?? 0,
    nominalStepS,
    hampel: { halfWidth: options.screening?.hampel?.halfWidth ?? 6, threshold: options.screening?.hampel?.threshold ?? 3 },
    steadyState: {
      signals: [...(steady?.signals ?? (fast ? STEADY_STATE_SIGNALS : HISTORIAN_STEADY_STATE.signals))],
      criticalValue: steady?.criticalValue ?? (fast ? STEADY_STATE_CRITICAL_VALUE : HISTORIAN_STEADY_STATE.criticalValue),
      meanFilter: steady?.meanFilter ?? R_STATISTIC_DEFAULTS.meanFilter,
      varianceFilter: steady?.varianceFilter ?? R_STATISTIC_DEFAULTS.varianceFilter,
      differenceFilter: steady?.differenceFilter ?? R_STATISTIC_DEFAULTS.differenceFilter,
    },
    minimumFlowFraction: options.screening?.minimumFlowFraction ?? 0.3,
    plausibilityCoverage: options.screening?.plausibility?.coverage ?? 3,
  };
}
