import { detectInstrumentFaults, type InstrumentFaultOptions } from "../faults/detect-instrument-faults";
import { faultExclusionFlags } from "../faults/fault-exclusion-flags";
import type { InstrumentAlert } from "../faults/types";
import { criticalValuesFor } from "../reconcile/critical-values-for";
import { reconcileExchanger } from "../reconcile/reconcile-exchanger";
import { aggregatePeriods } from "../screening/aggregate-periods";
import { exclusionReasonAt } from "../screening/exclusion-reason-at";
import { screenSamples, type ScreeningOptions } from "../screening/screen-samples";
import type { ExchangerModel, ExclusionCounts, InstrumentRole, ReadingColumns, SampleFlags } from "../screening/types";
import { ThermalInputError } from "../thermal";
import { resolveDataQualitySettings } from "./resolve-data-quality-settings";

const ROLES: readonly InstrumentRole[] = ["hotIn", "hotOut", "coldIn", "coldOut", "hotFlow", "coldFlow"];
import type { DataQualityAssessment, PeriodResult } from "./types";

/** Options of {@link assessDataQuality}; defaults in resolveDataQualitySettings. */
export interface DataQualityOptions {
  /** Period length, s [3600]. */
  periodS?: 3600 | 86400;
  /** Significance level of the global test [0.05]. */
  alpha?: number;
  /** Used samples a period needs to be usable [half a full period]. */
  minimumSamples?: number;
  /** Period alignment, epoch ms [0: UTC]. */
  originMs?: number;
  screening?: ScreeningOptions;
  faults?: InstrumentFaultOptions;
}

/**
 * assessDataQuality: raw operating data of one exchanger to screened, reconciled periods and instrument alerts.
 *
 * Steps: screenSamples (missing, Hampel outliers, Cao–Rhinehart steady state with an in-service check, physical
 * plausibility) → detectInstrumentFaults (stuck readings, spike bursts, heat-balance CUSUM with GLR isolation on the
 * energy-balance and rate residuals) → faultExclusionFlags (alert spans become "fault") → aggregatePeriods (counts by
 * first reason, means of used samples, duties) → reconcileExchanger on the means of each usable period (global test
 * at α). The covariance of a period mean is taken as the instruments' stated σ² (not σ²/n): a stated uncertainty is
 * mostly calibration, which averaging does not reduce, so the global test of a mean asks whether the balance closes
 * within the instruments' accuracy.
 * Pure; outputs are serialisable (null, never NaN).
 *
 * @param columns readings sorted by time, NaN where missing; not modified.
 * @param model arrangement, area, heat capacities, instruments with standard uncertainties.
 * @param options periods, α, screening and detector settings.
 * @throws RangeError for invalid options; Error for a model without the six instruments.
 */
export function assessDataQuality(columns: ReadingColumns, model: ExchangerModel, options: DataQualityOptions = {}): DataQualityAssessment {
  const settings = resolveDataQualitySettings(columns, options);
  const screening = screenSamples(columns, model, {
    ...options.screening,
    hampel: { ...options.screening?.hampel, halfWidth: settings.hampel.halfWidth, threshold: settings.hampel.threshold },
    steadyState: { ...options.screening?.steadyState, ...settings.steadyState },
    minimumFlowFraction: settings.minimumFlowFraction,
    plausibility: { coverage: settings.plausibilityCoverage },
  });
  const alerts: InstrumentAlert[] = detectInstrumentFaults(columns, model, screening, options.faults);
  const exclusion = faultExclusionFlags(columns.timeMs, alerts);
  const flags: SampleFlags = { ...screening.flags, fault: exclusion.fault, faultLabels: exclusion.faultLabels };
  const aggregates = aggregatePeriods(columns, flags, model, { periodS: settings.periodS, minimumSamples: settings.minimumSamples, originMs: settings.originMs });

  // Alert of each sample for the suspect role (all kinds, including spikes).
  const allAlerts = faultExclusionFlags(columns.timeMs, alerts, { kinds: ["drift", "bias", "scale", "stuck", "spikes"] });
  const alertRoleIndex = [...alerts].sort((a, b) => a.startMs - b.startMs).map((alert) => ROLES.indexOf(alert.role));

  const periods: PeriodResult[] = [];
  const criticalValues = criticalValuesFor(settings.alpha, 1, 6);
  const roleCounts = new Int32Array(ROLES.length);
  let sampleIndex = 0;
  for (const aggregate of aggregates) {
    const endMs = aggregate.startMs + aggregate.lengthS * 1000;
    roleCounts.fill(0);
    while (sampleIndex < columns.timeMs.length) {
      const time = columns.timeMs[sampleIndex] as number;
      if (time >= endMs) break;
      const label = allAlerts.fault[sampleIndex] as number;
      if (label > 0 && time >= aggregate.startMs) {
        const role = alertRoleIndex[label - 1] as number;
        roleCounts[role] = (roleCounts[role] as number) + 1;
      }
      sampleIndex += 1;
    }
    let suspectRole: InstrumentRole | null = null;
    let most = 0;
    for (let role = 0; role < ROLES.length; role += 1) {
      if ((roleCounts[role] as number) > most) {
        most = roleCounts[role] as number;
        suspectRole = ROLES[role] as InstrumentRole;
      }
    }

    let reconciled: PeriodResult["reconciled"] = null;
    let globalTest: number | null = null;
    let globalTestCritical: number | null = null;
    const means = aggregate.means;
    if (aggregate.usable && means.hotInK !== null && means.hotOutK !== null && means.coldInK !== null && means.coldOutK !== null && means.hotFlowKgPerS !== null && means.coldFlowKgPerS !== null) {
      try {
        const result = reconcileExchanger({
          measured: {
            hotInK: means.hotInK,
            hotOutK: means.hotOutK,
            coldInK: means.coldInK,
            coldOutK: means.coldOutK,
            hotFlowKgPerS: means.hotFlowKgPerS,
            coldFlowKgPerS: means.coldFlowKgPerS,
          },
          uncertainties: screening.uncertainties,
          hotHeatCapacity: model.hotHeatCapacity,
          coldHeatCapacity: model.coldHeatCapacity,
          alpha: settings.alpha,
          criticalValues,
        });
        reconciled = { ...result.reconciled, dutyW: result.dutyW };
        globalTest = result.globalTest;
        globalTestCritical = result.globalTestCritical;
      } catch (error) {
        if (!(error instanceof ThermalInputError) && !(error instanceof RangeError)) throw error;
      }
    }
    periods.push({
      startMs: aggregate.startMs,
      lengthS: aggregate.lengthS,
      samplesTotal: aggregate.samplesTotal,
      samplesUsed: aggregate.samplesUsed,
      excluded: aggregate.excluded,
      usable: aggregate.usable,
      reason: aggregate.reason,
      means: aggregate.means,
      hotDutyW: aggregate.hotDutyW,
      coldDutyW: aggregate.coldDutyW,
      closure: aggregate.closure,
      reconciled,
      globalTest,
      globalTestCritical,
      suspectRole,
    });
  }

  const excluded: ExclusionCounts = { missing: 0, transient: 0, outlier: 0, fault: 0, impossible: 0 };
  let used = 0;
  for (let index = 0; index < columns.timeMs.length; index += 1) {
    const reason = exclusionReasonAt(flags, index);
    if (reason === null) used += 1;
    else excluded[reason] += 1;
  }
  return { periods, alerts, sampleCounts: { total: columns.timeMs.length, used, excluded }, settings };
}
