import { hampelDeviations } from "./hampel-deviations";
import type { HampelOptions } from "./hampel-filter";
import { inServiceFlags } from "./in-service-flags";
import { instrumentUncertainties, type InstrumentUncertainties } from "./instrument-uncertainties";
import { plausibilityFlags, type PlausibilityOptions } from "./plausibility-flags";
import { roleColumn } from "./role-column";
import { steadyStateFlags, type SteadyStateOptions } from "./steady-state-flags";
import type { ExchangerModel, InstrumentRole, ReadingColumns, SampleFlags } from "./types";

const ROLES: readonly InstrumentRole[] = ["hotIn", "hotOut", "coldIn", "coldOut", "hotFlow", "coldFlow"];

/** Options of {@link screenSamples}; see each part for its defaults. */
export interface ScreeningOptions {
  /** Hampel settings (threshold 3, half-width 6); the scale floors default to each instrument's standard uncertainty (flows: relative). */
  hampel?: HampelOptions;
  steadyState?: SteadyStateOptions;
  plausibility?: PlausibilityOptions;
  /** See inServiceFlags [0.3]. */
  minimumFlowFraction?: number;
}

/** Result of {@link screenSamples}. */
export interface ScreeningResult {
  /** Per-sample flags; `fault` is all zero here (faults come from the fault detector). */
  flags: SampleFlags;
  /** Hampel outlier flags of each instrument (also where another value of the sample is missing). */
  outliers: Record<InstrumentRole, Uint8Array>;
  /** Hampel deviations |x − median|/scale of each instrument (NaN where not judged), for stronger thresholds. */
  outlierScores: Record<InstrumentRole, Float64Array>;
  /** Plausibility check codes (see IMPOSSIBLE_CHECKS). */
  impossibleCode: Uint8Array;
  /** Cao–Rhinehart R of each key signal. */
  steadyStatistics: Partial<Record<InstrumentRole, Float64Array>>;
  /** 1 where both flows are above the in-service minimum. */
  inService: Uint8Array;
  uncertainties: InstrumentUncertainties;
}

/**
 * screenSamples: per-sample screening of raw operating data: missing values, Hampel outliers, steady state
 * (Cao–Rhinehart R on the key signals, plus an in-service flow check) and physical plausibility.
 *
 * Rules: missing ⇔ any of the six values (or the time) is NaN; outlier ⇔ any instrument's Hampel flag;
 * transient ⇔ not steady or not in service (outliers are left out of the R filters, so a spike does not make the
 * following samples look transient); impossible ⇔ plausibilityFlags. Flags are independent; aggregatePeriods
 * applies the precedence of EXCLUSION_REASONS.
 * Source: see hampelFilter, caoRhinehartRStatistic, inServiceFlags, plausibilityFlags.
 *
 * @param columns readings sorted by time; not modified.
 * @param model arrangement, heat capacities and instrument uncertainties.
 * @param options settings of each part.
 * @throws Error for columns of different lengths or a model without the six instruments.
 */
export function screenSamples(columns: ReadingColumns, model: ExchangerModel, options: ScreeningOptions = {}): ScreeningResult {
  const count = columns.timeMs.length;
  for (const role of ROLES) {
    if (roleColumn(columns, role).length !== count) throw new Error(`column of ${role} has ${roleColumn(columns, role).length} values, expected ${count}`);
  }
  const uncertainties = instrumentUncertainties(model, columns);
  const missing = new Uint8Array(count);
  for (let index = 0; index < count; index += 1) {
    if (!Number.isFinite(columns.timeMs[index] as number)) missing[index] = 1;
  }
  for (const role of ROLES) {
    const column = roleColumn(columns, role);
    for (let index = 0; index < count; index += 1) {
      if (!Number.isFinite(column[index] as number)) missing[index] = 1;
    }
  }

  const threshold = options.hampel?.threshold ?? 3;
  if (!(threshold > 0)) throw new RangeError(`Hampel threshold must be positive, got ${threshold}`);
  const outliers = {} as Record<InstrumentRole, Uint8Array>;
  const outlierScores = {} as Record<InstrumentRole, Float64Array>;
  const outlier = new Uint8Array(count);
  for (const role of ROLES) {
    const flow = role === "hotFlow" || role === "coldFlow";
    const relative = flow ? uncertainties[role] : 0;
    const scores = hampelDeviations(roleColumn(columns, role), {
      ...(options.hampel?.halfWidth === undefined ? {} : { halfWidth: options.hampel.halfWidth }),
      minimumScale: options.hampel?.minimumScale ?? (flow ? 0 : uncertainties[role]),
      minimumRelativeScale: options.hampel?.minimumRelativeScale ?? (Number.isFinite(relative) ? relative : 0),
    });
    const flags = new Uint8Array(count);
    for (let index = 0; index < count; index += 1) {
      if ((scores[index] as number) > threshold) {
        flags[index] = 1;
        outlier[index] = 1;
      }
    }
    outliers[role] = flags;
    outlierScores[role] = scores;
  }

  const steady = steadyStateFlags(columns, { ...options.steadyState, skip: { ...outliers, ...options.steadyState?.skip } });
  const inService = inServiceFlags(columns, {
    ...(options.minimumFlowFraction === undefined ? {} : { minimumFlowFraction: options.minimumFlowFraction }),
    referenceFlows: uncertainties.referenceFlows,
  });
  const transient = new Uint8Array(count);
  for (let index = 0; index < count; index += 1) {
    if (steady.steady[index] !== 1 || inService[index] !== 1) transient[index] = 1;
  }
  const plausibility = plausibilityFlags(columns, model.arrangement, uncertainties, options.plausibility);

  return {
    flags: { missing, transient, outlier, impossible: plausibility.impossible, fault: new Uint16Array(count), faultLabels: [] },
    outliers,
    outlierScores,
    impossibleCode: plausibility.code,
    steadyStatistics: steady.statistics,
    inService,
    uncertainties,
  };
}
