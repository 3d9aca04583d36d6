import { heatBalance, ThermalInputError } from "../thermal";
import { exclusionReasonAt } from "./exclusion-reason-at";
import { nominalStep } from "./nominal-step";
import {
  EXCLUSION_REASONS,
  type ExchangerModel,
  type ExclusionCounts,
  type ExclusionReason,
  type PeriodAggregate,
  type ReadingColumns,
  type SampleFlags,
} from "./types";

/** Options of {@link aggregatePeriods}; defaults in brackets. */
export interface AggregateOptions {
  /** Period length, s: 3600 (hourly) or 86400 (daily) [3600]. */
  periodS?: 3600 | 86400;
  /** A period is usable with at least this many used samples [half the samples a full period holds, at least 1]. */
  minimumSamples?: number;
  /** Periods start at originMs + j·periodS (e.g. a site's local midnight as an offset from UTC) [0: UTC]. */
  originMs?: number;
}

/** A period's duties from its means (null when the means are incomplete or inconsistent). */
export interface PeriodAggregateWithDuties extends PeriodAggregate {
  hotDutyW: number | null;
  coldDutyW: number | null;
  /** (hot − cold)/mean duty, dimensionless. */
  closure: number | null;
}

function emptyCounts(): ExclusionCounts {
  return { missing: 0, transient: 0, outlier: 0, fault: 0, impossible: 0 };
}

/**
 * aggregatePeriods: screened samples to hourly or daily periods: counts by exclusion reason, means of the used
 * samples, hot and cold duties of the means, and whether the period is usable.
 *
 * Each sample is counted once, under its first reason in the order missing, transient, outlier, fault, impossible
 * (EXCLUSION_REASONS), so samplesTotal = samplesUsed + Σ excluded. Means are arithmetic means of the used samples.
 * Duties: Q = m̄·∫cp dT between the mean end temperatures (heatBalance of the thermal core); the mean of products
 * m·ΔT differs from the product of means by the covariance of flow and temperature change over the period, which is
 * small for screened steady samples (common practice in performance monitoring).
 * A period is usable when samplesUsed ≥ minimumSamples and its duties can be computed; otherwise `reason` says why:
 * "instrument fault: coldOut drift (20 of 24 samples)" when a fault is the largest exclusion, else
 * "too few usable samples (3 of 24, need 12): 18 transient, 3 missing". Only periods holding samples are returned.
 *
 * @param columns readings sorted by time; not modified.
 * @param flags screening flags (from screenSamples, with fault flags from faultExclusionFlags).
 * @param model heat capacities for the duties.
 * @param options period length, minimum samples, origin.
 * @throws RangeError for a period other than 3600 or 86400 s, or a minimum below 1.
 */
export function aggregatePeriods(
  columns: ReadingColumns,
  flags: SampleFlags,
  model: ExchangerModel,
  options: AggregateOptions = {},
): PeriodAggregateWithDuties[] {
  const periodS = options.periodS ?? 3600;
  if (periodS !== 3600 && periodS !== 86400) throw new RangeError(`period must be 3600 or 86400 s, got ${String(periodS)}`);
  const periodMs = periodS * 1000;
  const originMs = options.originMs ?? 0;
  const step = nominalStep(columns.timeMs);
  const perPeriod = Number.isFinite(step) ? Math.max(1, Math.round(periodMs / step)) : 1;
  const minimumSamples = options.minimumSamples ?? Math.max(1, Math.ceil(perPeriod / 2));
  if (!(minimumSamples >= 1)) throw new RangeError(`minimum samples must be at least 1, got ${minimumSamples}`);

  const periods: PeriodAggregateWithDuties[] = [];
  const count = columns.timeMs.length;
  let index = 0;
  while (index < count) {
    const time = columns.timeMs[index] as number;
    if (!Number.isFinite(time)) {
      index += 1;
      continue;
    }
    const startMs = originMs + Math.floor((time - originMs) / periodMs) * periodMs;
    const endMs = startMs + periodMs;
    const excluded = emptyCounts();
    let faultCounts: Map<number, number> | null = null;
    let total = 0;
    let used = 0;
    let hotIn = 0;
    let hotOut = 0;
    let coldIn = 0;
    let coldOut = 0;
    let hotFlow = 0;
    let coldFlow = 0;
    while (index < count && (columns.timeMs[index] as number) < endMs) {
      total += 1;
      const reason = exclusionReasonAt(flags, index);
      if (reason === null) {
        used += 1;
        hotIn += columns.hotInK[index] as number;
        hotOut += columns.hotOutK[index] as number;
        coldIn += columns.coldInK[index] as number;
        coldOut += columns.coldOutK[index] as number;
        hotFlow += columns.hotFlowKgPerS[index] as number;
        coldFlow += columns.coldFlowKgPerS[index] as number;
      } else {
        excluded[reason] += 1;
        if (reason === "fault") {
          const label = flags.fault[index] as number;
          faultCounts ??= new Map<number, number>();
          faultCounts.set(label, (faultCounts.get(label) ?? 0) + 1);
        }
      }
      index += 1;
    }
    const means =
      used > 0
        ? { hotInK: hotIn / used, hotOutK: hotOut / used, coldInK: coldIn / used, coldOutK: coldOut / used, hotFlowKgPerS: hotFlow / used, coldFlowKgPerS: coldFlow / used }
        : { hotInK: null, hotOutK: null, coldInK: null, coldOutK: null, hotFlowKgPerS: null, coldFlowKgPerS: null };
    let hotDutyW: number | null = null;
    let coldDutyW: number | null = null;
    let closure: number | null = null;
    let dutyProblem: string | null = null;
    if (used > 0) {
      try {
        const balance = heatBalance({
          hot: { massFlowKgPerS: hotFlow / used, heatCapacity: model.hotHeatCapacity, inletK: hotIn / used, outletK: hotOut / used },
          cold: { massFlowKgPerS: coldFlow / used, heatCapacity: model.coldHeatCapacity, inletK: coldIn / used, outletK: coldOut / used },
        });
        hotDutyW = balance.hotDutyW;
        coldDutyW = balance.coldDutyW;
        closure = balance.closure;
      } catch (error) {
        if (!(error instanceof ThermalInputError)) throw error;
        dutyProblem = error.message;
      }
    }
    let reason: string | null = null;
    if (used < minimumSamples) {
      let largest: ExclusionReason = "missing";
      for (const candidate of EXCLUSION_REASONS) if (excluded[candidate] > excluded[largest]) largest = candidate;
      if (largest === "fault" && excluded.fault > 0) {
        let label = 0;
        let most = -1;
        for (const [key, value] of faultCounts ?? []) if (value > most) [label, most] = [key, value];
        reason = `instrument fault: ${flags.faultLabels[label - 1] ?? "unknown"} (${excluded.fault} of ${total} samples)`;
      } else {
        const parts = EXCLUSION_REASONS.filter((candidate) => excluded[candidate] > 0).map((candidate) => `${excluded[candidate]} ${candidate}`);
        reason = `too few usable samples (${used} of ${total}, need ${minimumSamples})${parts.length > 0 ? `: ${parts.join(", ")}` : ""}`;
      }
    } else if (dutyProblem !== null) {
      reason = `period means give no duty: ${dutyProblem}`;
    }
    periods.push({
      startMs,
      lengthS: periodS,
      samplesTotal: total,
      samplesUsed: used,
      excluded,
      usable: reason === null,
      reason,
      means,
      hotDutyW,
      coldDutyW,
      closure,
    });
  }
  return periods;
}
