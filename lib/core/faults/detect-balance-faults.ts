import { chiSquareQuantile } from "../reconcile/chi-square-quantile";
import type { InstrumentUncertainties } from "../screening/instrument-uncertainties";
import { nominalStep } from "../screening/nominal-step";
import { operatingPointAt } from "../screening/operating-point-at";
import { standardDeviationsAt } from "../screening/standard-deviations-at";
import type { ExchangerModel, ReadingColumns } from "../screening/types";
import { classifyOffsetGrowth } from "./classify-offset-growth";
import { cusumAverageRunLength } from "./cusum-average-run-length";
import { cusumBlocks } from "./cusum-blocks";
import type { FaultCandidate } from "./fault-candidates";
import { firstCusumAlarm, type CusumAlarm } from "./first-cusum-alarm";
import { formatInstant } from "./format-instant";
import { glrQuadraticForms } from "./glr-quadratic-forms";
import { instrumentTag } from "./instrument-tag";
import { isolateFault, type Isolation, type RankedCandidate } from "./isolate-fault";
import { movingBalanceOffset } from "./moving-balance-offset";
import { normalisedBalanceResiduals } from "./normalised-balance-residuals";
import { rampStart } from "./ramp-start";
import { rateEvidenceSettings } from "./rate-evidence-settings";
import { sampleEvidence, type EvidenceSettings } from "./sample-evidence";
import { trackFaultEnd } from "./track-fault-end";
import type { InstrumentAlert } from "./types";

const DAY_MS = 86_400_000;
const HOUR_MS = 3_600_000;

/** Options of {@link detectBalanceFaults}; defaults in BALANCE_FAULT_DEFAULTS. */
export interface BalanceFaultOptions {
  /** CUSUM block length, s: residuals are averaged over blocks (one sample each for hourly data). */
  blockS?: number;
  /** CUSUM reference value k, in σ of a block mean (0.5: fastest for a 1σ shift). */
  reference?: number;
  /** CUSUM decision interval h (10: in-control ARL ≈ 70 700 blocks, about 8 years of hourly blocks). */
  decisionInterval?: number;
  /** Centre of the normalised balance residual: a trailing 60-day median of daily means ending 7 days back, or zero. */
  balanceOffset?: "moving" | "zero";
  /** Window before the onset for the U model of the rate equation, s. */
  baselineS?: number;
  /** Fewest baseline samples for the rate equation; with fewer the balance alone is used. */
  minimumBaselineSamples?: number;
  /**
   * Smallest day-level error of the U model's prediction after its fit window, fraction of duty (a cross-validated
   * estimate replaces it when larger; see rateEvidenceSettings). On six demo exchangers without faults the daily means
   * of the rate residual in the week after a 14-day fit window were off by 0.6–1.8 % of duty RMS (4 % on one cooler
   * with a correction factor near its limit): flow mix and fouling move beyond the fit.
   */
  rateModelDayError?: number;
  /** The U-model baseline stops at a gap in the screened samples longer than this, s (a long data outage). */
  baselineGapS?: number;
  /** In-service flags (screenSamples); the U-model baseline does not reach back past a time out of service. */
  inService?: Uint8Array;
  /**
   * Isolation, tracking and sizing use at most one sample per this interval, s (detection uses them all). Keeps the
   * cost of the per-sample Jacobians bounded for one-minute data; hourly data are not thinned.
   */
  evidenceIntervalS?: number;
  /** Name the fault once the best candidate's GLR statistic beats the runner-up by this much. */
  isolationMargin?: number;
  /** Longest time after the onset to wait for that margin, s; then the best candidate is named anyway. */
  maximumIsolationS?: number;
  /** Level of the confirmation test on samples after the alarm (the alarm window itself is biased). */
  confirmationLevel?: number;
  /** Fewest samples after the alarm before naming. */
  minimumConfirmationSamples?: number;
  /** A temperature fault is a drift when a ramp beats a constant offset by this much over the classification window. */
  driftMargin?: number;
  /** Window from the onset over which drift and bias are told apart, s. */
  classificationS?: number;
  /** How far before the CUSUM onset a drift may have started, s. */
  driftLookbackS?: number;
  /** Block length for following a named fault to its end, s. */
  trackingBlockS?: number;
  /** A tracking block shows the fault when its signed GLR z-value reaches this. */
  presenceZ?: number;
  /** The fault has ended after this many blocks in a row without it. */
  clearBlocks?: number;
  /** A drift's size is its mean offset over this last stretch of the alert, s. */
  driftSizeS?: number;
}

/** Resolved defaults of {@link detectBalanceFaults}. */
export const BALANCE_FAULT_DEFAULTS = {
  blockS: 3600,
  reference: 0.5,
  decisionInterval: 10,
  balanceOffset: "moving",
  baselineS: 14 * 86_400,
  minimumBaselineSamples: 48,
  rateModelDayError: 0.005,
  baselineGapS: 3 * 86_400,
  isolationMargin: 10,
  maximumIsolationS: 7 * 86_400,
  confirmationLevel: 1e-3,
  minimumConfirmationSamples: 6,
  driftMargin: 6,
  classificationS: 7 * 86_400,
  driftLookbackS: 7 * 86_400,
  trackingBlockS: 86_400,
  presenceZ: 3,
  clearBlocks: 2,
  driftSizeS: 2 * 86_400,
  evidenceIntervalS: 600,
} as const satisfies Required<Omit<BalanceFaultOptions, "inService">>;

/** A confirmed alarm and what isolated it. */
interface NamedAlarm {
  alarm: CusumAlarm;
  isolation: Isolation;
  evidence: EvidenceSettings;
  baselineSamples: number;
  dayError: number | null;
}

function signed(value: number, digits: number): string {
  return `${value >= 0 ? "+" : "−"}${Math.abs(value).toFixed(digits)}`;
}

/**
 * detectBalanceFaults: finds instrument faults that upset the heat balance (thermocouple drift or offset, flow-meter
 * span error), estimates when they started and ended and how large they are, and names the instrument.
 *
 * 1. Detection: z_t = (g_t/σ_g,t − μ_t)/κ on the available samples (normalisedBalanceResiduals; μ_t from
 *    movingBalanceOffset); block sums Σz/√n feed a two-sided CUSUM (Page 1954), k = 0.5, h = 10 (Siegmund's in-control
 *    ARL ≈ 70 700 blocks); onset = one past the last zero of the alarming CUSUM (firstCusumAlarm).
 * 2. Isolation (isolateFault): the energy balance alone cannot tell instruments apart (all measurement-test statistics
 *    of a single constraint are equal; FIELD-NOTES §6), so the GLR bias test (Narasimhan & Mah 1987) runs on the
 *    residual pair (g, h), h the heat-transfer rate residual with U fitted on the baselineS before the onset, back to
 *    the last time out of service (rateEvidenceSettings); confirmed on the energy balance after the alarm, else the
 *    alarm is dropped and the CUSUM restarts after it. Isolation, tracking and sizing use at most one sample per
 *    evidenceIntervalS (10 minutes), which leaves hourly data whole and bounds the cost for one-minute data.
 * 3. Extent (trackFaultEnd): daily blocks of the balance residual alone (the U model grows stale) follow the named
 *    instrument until two clear days in a row, else the alert stays open (endMs null).
 * 4. Kind: flows → "scale"; thermometers → "drift" when a ramp beats a constant offset over the first
 *    classificationS of the alert (classifyOffsetGrowth), else "bias"; a drift's start is re-estimated by a change-
 *    point search over driftLookbackS before the onset (rampStart).
 * 5. Size (energy balance alone, mean of the per-sample ratios g/s over the alert): bias → mean offset (K);
 *    scale → b̂/(1 − b̂), since the signature x_i·∂g/∂x_i uses the faulty reading (1 + b)·x, so the first-order estimate
 *    is b/(1 + b); drift → mean offset over its last driftSizeS.
 * After an alert that ends, the samples it covers are dropped and the CUSUM restarts after its end.
 * Valid: one instrument fault at a time, lasting at least a day; screened steady samples; a single-phase exchanger
 * without large varying heat losses. Source: Page (1954), Biometrika 41:100–115; Siegmund (1985); Narasimhan & Mah
 * (1987), AIChE J. 33(9):1514–1521; Narasimhan & Jordache (2000), Data Reconciliation and Gross Error Detection, ch. 8.
 *
 * @param columns readings; not modified.
 * @param model exchanger model (area, arrangement, heat capacities, tags).
 * @param uncertainties σ by role (temperatures K, flows relative).
 * @param usable 1 for screened samples (not missing, transient, outlier, impossible, or in a stuck alert); not modified.
 * @param options detector settings.
 */
export function detectBalanceFaults(
  columns: ReadingColumns,
  model: ExchangerModel,
  uncertainties: InstrumentUncertainties,
  usable: Uint8Array,
  options: BalanceFaultOptions = {},
): InstrumentAlert[] {
  const settings = { ...BALANCE_FAULT_DEFAULTS, ...options };
  const time = columns.timeMs;
  const count = time.length;
  const available = Uint8Array.from(usable);
  const residuals = normalisedBalanceResiduals(columns, model, uncertainties, available);
  for (let index = 0; index < count; index += 1) if (!Number.isFinite(residuals.values[index] as number)) available[index] = 0;
  const step = nominalStep(time);
  const blockMs = Math.max(settings.blockS * 1000, Number.isFinite(step) ? step : 0);
  const evidenceMs = Math.max(settings.evidenceIntervalS * 1000, Number.isFinite(step) ? step : 0);
  /** The available samples thinned to one per evidence interval (recomputed when alert spans are dropped). */
  const thinned = (): Uint8Array => {
    const result = new Uint8Array(count);
    let lastBucket = Number.NaN;
    for (let index = 0; index < count; index += 1) {
      if (available[index] !== 1) continue;
      const bucket = Math.floor((time[index] as number) / evidenceMs);
      if (bucket === lastBucket) continue;
      lastBucket = bucket;
      result[index] = 1;
    }
    return result;
  };
  const confirmationCritical = chiSquareQuantile(1 - settings.confirmationLevel, 1);
  const averageRunLength = cusumAverageRunLength(settings.reference, settings.decisionInterval, 0);
  const alerts: InstrumentAlert[] = [];

  let fromMs = Number.NEGATIVE_INFINITY;
  for (;;) {
    // Standardised residuals with the offset from the samples still available (dropped alert spans excluded).
    const offsets = settings.balanceOffset === "moving" ? movingBalanceOffset(time, Float64Array.from(residuals.values, (value, index) => (available[index] === 1 ? value : Number.NaN))) : null;
    const standardised = new Float64Array(count).fill(Number.NaN);
    for (let index = 0; index < count; index += 1) {
      if (available[index] !== 1 || (time[index] as number) < fromMs) continue;
      standardised[index] = ((residuals.values[index] as number) - (offsets === null ? 0 : (offsets[index] as number))) / residuals.inflation;
    }
    const blocks = cusumBlocks(time, standardised, blockMs);
    const sparse = thinned();
    let fromBlock = 0;
    let named: NamedAlarm | null = null;
    while (fromBlock < blocks.values.length) {
      const alarm = firstCusumAlarm(blocks.values, fromBlock, settings.reference, settings.decisionInterval);
      if (alarm === null) break;
      const onsetIndex = blocks.first[alarm.onsetIndex] as number;
      const alarmIndex = blocks.last[alarm.alarmIndex] as number;
      const offset = offsets === null ? 0 : (offsets[onsetIndex] as number);
      const { settings: evidence, baselineSamples, dayError } = rateEvidenceSettings({
        columns,
        model,
        uncertainties,
        available: sparse,
        onsetIndex,
        baselineMs: settings.baselineS * 1000,
        minimumBaselineSamples: settings.minimumBaselineSamples,
        balanceOffset: Number.isFinite(offset) ? offset : 0,
        inflation: residuals.inflation,
        dayError: settings.rateModelDayError,
        outageGapMs: settings.baselineGapS * 1000,
        ...(options.inService === undefined ? {} : { inService: options.inService }),
        samplesPerDay: DAY_MS / evidenceMs,
      });
      const isolation = isolateFault({
        timeMs: time,
        available: sparse,
        onsetIndex,
        alarmIndex,
        evidenceAt: (index) => {
          const point = operatingPointAt(columns, index);
          return sampleEvidence(point, time[index] as number, standardDeviationsAt(point, uncertainties), evidence);
        },
        isolationMargin: settings.isolationMargin,
        maximumIsolationMs: settings.maximumIsolationS * 1000,
        confirmationCritical,
        minimumConfirmationSamples: settings.minimumConfirmationSamples,
      });
      if (isolation !== null) {
        named = { alarm, isolation, evidence, baselineSamples, dayError };
        break;
      }
      fromBlock = alarm.alarmIndex + 1;
    }
    if (named === null) break;

    const { alarm, isolation, evidence, baselineSamples, dayError } = named;
    const candidate: FaultCandidate = isolation.candidate;
    const c = candidate.index;
    const onsetIndex = blocks.first[alarm.onsetIndex] as number;
    const onsetMs = time[onsetIndex] as number;
    const alarmMs = time[blocks.last[alarm.alarmIndex] as number] as number;
    const balanceEvidence: EvidenceSettings = { ...evidence, rate: null };
    const formsAt = (index: number): [number, number] => {
      const point = operatingPointAt(columns, index);
      return glrQuadraticForms(sampleEvidence(point, time[index] as number, standardDeviationsAt(point, uncertainties), balanceEvidence), c);
    };
    const best = isolation.ranking[0] as RankedCandidate;
    const direction = Math.sign(best.estimate) || 1;

    // Extent.
    const endIndex = trackFaultEnd({
      timeMs: time,
      available: sparse,
      fromIndex: isolation.namingIndex,
      formsAt,
      direction,
      blockMs: settings.trackingBlockS * 1000,
      presenceZ: settings.presenceZ,
      clearBlocks: settings.clearBlocks,
    });
    const lastIndex = endIndex === null ? count - 1 : endIndex - 1;

    // Kind and start.
    const windowTimes: number[] = [];
    const windowForms: [number, number][] = [];
    const classifyUntilMs = Math.min(onsetMs + settings.classificationS * 1000, time[lastIndex] as number);
    for (let index = onsetIndex; index <= lastIndex && (time[index] as number) <= classifyUntilMs; index += 1) {
      if (sparse[index] !== 1) continue;
      windowTimes.push(time[index] as number);
      windowForms.push(formsAt(index));
    }
    const growth = classifyOffsetGrowth(windowTimes, onsetMs, windowForms, settings.driftMargin);
    const kind: InstrumentAlert["kind"] = candidate.kind === "scale" ? "scale" : growth.drift ? "drift" : "bias";
    let startIndex = onsetIndex;
    if (kind === "drift") {
      const lookbackTimes: number[] = [];
      const lookbackForms: [number, number][] = [];
      const lookbackIndices: number[] = [];
      for (let index = onsetIndex - 1; index >= 0 && (time[index] as number) >= onsetMs - settings.driftLookbackS * 1000; index -= 1) {
        if (sparse[index] === 1) lookbackIndices.unshift(index);
      }
      for (const index of lookbackIndices) {
        lookbackTimes.push(time[index] as number);
        lookbackForms.push(formsAt(index));
      }
      const times = [...lookbackTimes, ...windowTimes];
      const forms = [...lookbackForms, ...windowForms];
      const position = rampStart(times, forms, Array.from({ length: lookbackIndices.length + 1 }, (_, k) => k));
      startIndex = position < lookbackIndices.length ? (lookbackIndices[position] as number) : onsetIndex;
    }

    // Size: mean of the per-sample ratios g/s (balance alone). Weighting by 1/σ² would use the measured flows, whose
    // errors are in g as well, and bias a span-error estimate low by a few percent of itself.
    const lastMs = time[lastIndex] as number;
    const sizeFromMs = kind === "drift" ? lastMs - settings.driftSizeS * 1000 : (time[startIndex] as number);
    let ratioSum = 0;
    let sizeSamples = 0;
    for (let index = startIndex; index <= lastIndex; index += 1) {
      if (sparse[index] !== 1 || (time[index] as number) < sizeFromMs) continue;
      const point = operatingPointAt(columns, index);
      const evidenceHere = sampleEvidence(point, time[index] as number, standardDeviationsAt(point, uncertainties), balanceEvidence);
      const signature = evidenceHere.signatures[2 * c] as number;
      if (signature === 0) continue;
      ratioSum += evidenceHere.balance / signature;
      sizeSamples += 1;
    }
    const firstOrder = sizeSamples > 0 ? ratioSum / sizeSamples : 0;
    const size = kind === "scale" ? firstOrder / (1 - firstOrder) : firstOrder;

    const second = isolation.ranking[1] as RankedCandidate;
    const unit = kind === "scale" ? "fraction" : "K";
    const formatSize = (value: number): string => (unit === "K" ? `${signed(value, 1)} K` : `${signed(value * 100, 1)} %`);
    const atNaming = kind === "scale" ? best.estimate / (1 - best.estimate) : best.estimate;
    const startMs = time[startIndex] as number;
    const endMs = endIndex === null ? null : (time[endIndex] as number);
    const namingMs = time[isolation.namingIndex] as number;
    alerts.push({
      role: candidate.role,
      instrumentTag: instrumentTag(model, candidate.role),
      kind,
      startMs,
      endMs,
      detectedMs: namingMs,
      size,
      sizeUnit: unit,
      evidence:
        `heat-balance CUSUM crossed h = ${settings.decisionInterval} (k = ${settings.reference}; in-control ARL about ${Math.round(averageRunLength)} ` +
        `${Math.round(blockMs / HOUR_MS)}-hour blocks) on ${formatInstant(alarmMs)}, onset ${formatInstant(onsetMs)}; ` +
        `GLR over ${isolation.windowSamples} samples to ${formatInstant(namingMs)} ` +
        (evidence.rate === null
          ? `(energy balance only: ${baselineSamples} baseline samples, too few for the rate equation) `
          : `(energy balance and heat-transfer rate, U fitted on ${baselineSamples} samples before the onset, day-level U error ${((dayError ?? 0) * 100).toFixed(1)} %) `) +
        `names ${candidate.role} ${candidate.kind === "scale" ? "span error" : "offset"} ${formatSize(atNaming)} ` +
        `(statistic ${best.statistic.toFixed(0)} vs next best ${second.candidate.role} ${second.statistic.toFixed(0)}` +
        `${isolation.ambiguous ? `; margin ${settings.isolationMargin} not reached in ${(settings.maximumIsolationS / 86_400).toFixed(0)} days: not clearly separated` : ""}; ` +
        `confirmed after the alarm, statistic ${isolation.confirmationStatistic.toFixed(0)} vs ${confirmationCritical.toFixed(1)}); ` +
        (candidate.kind === "bias"
          ? `${kind === "drift" ? "growing" : "steady"} offset over the first ${((classifyUntilMs - onsetMs) / DAY_MS).toFixed(1)} days (ramp ${growth.rampStatistic.toFixed(0)} vs constant ${growth.constantStatistic.toFixed(0)}); `
          : "") +
        `${kind === "drift" ? `offset over the last ${(settings.driftSizeS / 86_400).toFixed(0)} days` : "size"} ${formatSize(size)} from ${sizeSamples} samples; ` +
        (endMs === null ? "still present at the end of the data" : `gone from ${formatInstant(endMs)} (${settings.clearBlocks} clear days in a row)`),
    });
    if (endIndex === null) break;
    for (let index = startIndex; index < endIndex; index += 1) available[index] = 0;
    fromMs = time[endIndex] as number;
  }
  return alerts;
}
