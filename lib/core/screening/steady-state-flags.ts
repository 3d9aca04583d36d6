import { caoRhinehartRStatistic, type RStatisticOptions } from "./cao-rhinehart-r-statistic";
import { roleColumn } from "./role-column";
import type { InstrumentRole, ReadingColumns } from "./types";

/** Options of {@link steadyStateFlags}; defaults in brackets. */
export interface SteadyStateOptions extends Omit<RStatisticOptions, "skip"> {
  /** Signals that must all be steady [the two inlet temperatures and the two flows]. */
  signals?: readonly InstrumentRole[];
  /** Steady when R is below this for every signal [2]. */
  criticalValue?: number;
  /** Per-role samples to leave out of the R filters (e.g. Hampel outliers). */
  skip?: Partial<Record<InstrumentRole, Uint8Array>>;
}

/**
 * Default key signals: the independent variables of the exchanger, i.e. what the plant moves (inlet temperatures
 * and flows). Outlet temperatures follow them through the exchanger (and slowly with fouling), so they add little
 * except measurement trouble; pass all six roles to require them too.
 */
export const STEADY_STATE_SIGNALS: readonly InstrumentRole[] = ["hotIn", "coldIn", "hotFlow", "coldFlow"];

/**
 * Default critical value: R < 2 is "steady" (FIELD-NOTES §6 [V], `ddss/IdentificacaoEE:PP_Rstatistics.m`, with
 * λ1 = 0.2, λ2 = λ3 = 0.1). For white noise E[R] ≈ 1, so 2 leaves room for the sampling spread of R and for mild
 * autocorrelation of hourly process noise; a throughput step or shutdown drives R to 10–1000. The same value is
 * used for hourly historian data: the statistic compares two variance estimates of the same series, so it does
 * not depend on the sampling interval, only on how much of the sample-to-sample change is noise.
 */
export const STEADY_STATE_CRITICAL_VALUE = 2;

/** Result of {@link steadyStateFlags}. */
export interface SteadyStateFlags {
  /** 1 where every key signal has R below the critical value, 0 otherwise (including missing and warm-up). */
  steady: Uint8Array;
  /** The R statistic of each key signal (NaN where not available). */
  statistics: Partial<Record<InstrumentRole, Float64Array>>;
}

/**
 * steadyStateFlags: steady-state identification by the Cao–Rhinehart R statistic on each key signal.
 *
 * Rule: steady_i = 1 when R_s,i < R_crit for every key signal s (R from caoRhinehartRStatistic), else 0.
 * Valid: as caoRhinehartRStatistic. Source: Cao & Rhinehart (1995), J. Process Control 5(6):363–374 (FIELD-NOTES §6).
 *
 * @param columns readings; not modified.
 * @param options signals, critical value, filter factors.
 * @throws RangeError for a non-positive critical value or as caoRhinehartRStatistic.
 */
export function steadyStateFlags(columns: ReadingColumns, options: SteadyStateOptions = {}): SteadyStateFlags {
  const signals = options.signals ?? STEADY_STATE_SIGNALS;
  const criticalValue = options.criticalValue ?? STEADY_STATE_CRITICAL_VALUE;
  if (!(criticalValue > 0)) throw new RangeError(`critical value must be positive, got ${criticalValue}`);
  const count = columns.timeMs.length;
  const steady = new Uint8Array(count).fill(1);
  const statistics: Partial<Record<InstrumentRole, Float64Array>> = {};
  for (const role of signals) {
    const skip = options.skip?.[role];
    const statistic = caoRhinehartRStatistic(roleColumn(columns, role), columns.timeMs, {
      ...(options.meanFilter === undefined ? {} : { meanFilter: options.meanFilter }),
      ...(options.varianceFilter === undefined ? {} : { varianceFilter: options.varianceFilter }),
      ...(options.differenceFilter === undefined ? {} : { differenceFilter: options.differenceFilter }),
      ...(options.warmupSamples === undefined ? {} : { warmupSamples: options.warmupSamples }),
      ...(options.restartAfterSteps === undefined ? {} : { restartAfterSteps: options.restartAfterSteps }),
      ...(skip === undefined ? {} : { skip }),
    });
    statistics[role] = statistic;
    for (let index = 0; index < count; index += 1) {
      if (!((statistic[index] as number) < criticalValue)) steady[index] = 0;
    }
  }
  return { steady, statistics };
}
