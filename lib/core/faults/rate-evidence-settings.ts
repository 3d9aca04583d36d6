import { exchangerBalance } from "../reconcile/exchanger-balance";
import type { InstrumentUncertainties } from "../screening/instrument-uncertainties";
import { MAD_SCALE_FACTOR } from "../screening/mad-scale-factor";
import { medianValue } from "../screening/median-value";
import { operatingPointAt } from "../screening/operating-point-at";
import { standardDeviationsAt } from "../screening/standard-deviations-at";
import type { ExchangerModel, ReadingColumns } from "../screening/types";
import { meanTemperatureDifference, ThermalInputError } from "../thermal";
import { fitOverallCoefficientModel } from "./fit-overall-coefficient-model";
import { rateResidual } from "./rate-residual";
import { sampleEvidence, type EvidenceSettings } from "./sample-evidence";
import type { RateEquationSetup } from "./types";

const DAY_MS = 86_400_000;

/** Input of {@link rateEvidenceSettings}. */
export interface RateEvidenceInput {
  columns: ReadingColumns;
  model: ExchangerModel;
  uncertainties: InstrumentUncertainties;
  /** 1 for samples that may serve as baseline; not modified. */
  available: Uint8Array;
  /** The baseline ends just before this sample. */
  onsetIndex: number;
  /** Baseline length, ms. */
  baselineMs: number;
  /** Fewest baseline samples for the rate equation. */
  minimumBaselineSamples: number;
  /** Centre of g/σ_g at the onset, and the variance inflation κ². */
  balanceOffset: number;
  inflation: number;
  /**
   * Smallest day-level error of the U model's prediction after its fit window, as a fraction of duty (δ). The value
   * used is the larger of this and a cross-validated estimate (fit on the first two thirds of the baseline, daily
   * mean errors on the last third, less their measurement noise). It is correlated over a day, so it is spread over
   * the day's samples as a per-sample variance n_day·δ² (n_day = samples per day): summed over a day it then weighs
   * as one error of δ, not as n_day independent ones.
   */
  dayError: number;
  /** Samples per day (86 400 s over the nominal step). */
  samplesPerDay: number;
  /**
   * The baseline stops at a gap in the available samples longer than this, ms (a long data outage may hide a
   * cleaning), and at any sample out of service (see inService).
   */
  outageGapMs: number;
  /**
   * 1 where the exchanger is in service (screening's in-service flags); a shutdown, trip or cleaning can change U at a
   * stroke, so the baseline does not reach back past one [all in service].
   */
  inService?: Uint8Array;
}

/** Result of {@link rateEvidenceSettings}. */
export interface RateEvidence {
  settings: EvidenceSettings;
  baselineSamples: number;
  /** Day-level U-model error used (fraction of duty), null when the rate equation is not used. */
  dayError: number | null;
}

/**
 * rateEvidenceSettings: prepares the residual pair (energy balance, heat-transfer rate) for fault isolation from the
 * samples just before a suspected onset (back to the last time out of service or the last data gap longer than
 * outageGapMs: a cleaning or shutdown changes U at a stroke): the duty weight, the flow-dependent U model, the centre of h/Q̂ and the part of its spread
 * that measurement noise does not explain.
 *
 * Formula: w = Var(Q_c)/(Var(Q_h) + Var(Q_c)) (inverse-variance weighting of the two duty estimates, both variances by
 * first-order propagation); U_t = Q̂_t/(A·F·LMTD) on the baseline, fitted against flows and time by
 * fitOverallCoefficientModel (so that fouling during the baseline is carried forward);
 * μ_h = median(h/Q̂); τ² = max(0, (1.4826·MAD(h/Q̂))² − median(propagated Var(h)/Q̂²)) + n_day·δ², the first term the
 * in-sample spread that measurement noise does not explain, the second the out-of-sample day-level error δ of the
 * model (flows move outside the mix they were fitted on, fouling bends; see dayError).
 * Falls back to the energy balance alone (rate = null) with fewer than minimumBaselineSamples usable baseline points.
 * Source: inverse-variance weighting, e.g. GUM (JCGM 100:2008) Annex; fitOverallCoefficientModel; rateResidual.
 */
export function rateEvidenceSettings(input: RateEvidenceInput): RateEvidence {
  const { columns, model, uncertainties, available, onsetIndex } = input;
  const time = columns.timeMs;
  const onsetMs = time[onsetIndex] as number;
  const baseline: number[] = [];
  let laterMs = onsetMs;
  for (let index = onsetIndex - 1; index >= 0 && (time[index] as number) >= onsetMs - input.baselineMs; index -= 1) {
    if (input.inService !== undefined && input.inService[index] === 0) break;
    if (available[index] !== 1) continue;
    if (laterMs - (time[index] as number) > input.outageGapMs) break;
    laterMs = time[index] as number;
    baseline.push(index);
  }
  const balanceOnly: EvidenceSettings = {
    hotHeatCapacity: model.hotHeatCapacity,
    coldHeatCapacity: model.coldHeatCapacity,
    rate: null,
    balanceOffset: input.balanceOffset,
    rateOffset: 0,
    inflation: input.inflation * input.inflation,
    rateModelVariance: 0,
  };
  if (baseline.length < input.minimumBaselineSamples) return { settings: balanceOnly, baselineSamples: baseline.length, dayError: null };

  let hotVariance = 0;
  let coldVariance = 0;
  for (const index of baseline) {
    const point = operatingPointAt(columns, index);
    const gradient = exchangerBalance(point, model.hotHeatCapacity, model.coldHeatCapacity).gradient;
    const sigma = standardDeviationsAt(point, uncertainties);
    hotVariance += (gradient[0] * (sigma[0] as number)) ** 2 + (gradient[1] * (sigma[1] as number)) ** 2 + (gradient[4] * (sigma[4] as number)) ** 2;
    coldVariance += (gradient[2] * (sigma[2] as number)) ** 2 + (gradient[3] * (sigma[3] as number)) ** 2 + (gradient[5] * (sigma[5] as number)) ** 2;
  }
  const hotWeight = hotVariance + coldVariance > 0 ? coldVariance / (hotVariance + coldVariance) : 0.5;

  baseline.reverse();
  const fitOn = (indices: readonly number[]): RateEquationSetup | null => {
    const times: number[] = [];
    const hotFlows: number[] = [];
    const coldFlows: number[] = [];
    const coefficients: number[] = [];
    for (const index of indices) {
      const point = operatingPointAt(columns, index);
      try {
        const balance = exchangerBalance(point, model.hotHeatCapacity, model.coldHeatCapacity);
        const duty = hotWeight * balance.hotDutyW + (1 - hotWeight) * balance.coldDutyW;
        const difference = meanTemperatureDifference(point, model.arrangement);
        times.push(time[index] as number);
        hotFlows.push(point.hotFlowKgPerS);
        coldFlows.push(point.coldFlowKgPerS);
        coefficients.push(duty / (model.areaM2 * difference.meanK));
      } catch (error) {
        if (!(error instanceof ThermalInputError)) throw error;
      }
    }
    const coefficient = fitOverallCoefficientModel({ timeMs: times, hotFlowKgPerS: hotFlows, coldFlowKgPerS: coldFlows, uWPerM2K: coefficients });
    return coefficient === null
      ? null
      : { areaM2: model.areaM2, arrangement: model.arrangement, hotHeatCapacity: model.hotHeatCapacity, coldHeatCapacity: model.coldHeatCapacity, coefficient, hotWeight };
  };
  /** h/Q̂ at each index (and its propagated variance, measurement noise only, when asked: that needs the Jacobian). */
  const residualsOn = (indices: readonly number[], rate: RateEquationSetup, withVariance: boolean): { timeMs: number[]; relative: number[]; propagated: number[]; kept: number[] } => {
    const result = { timeMs: [] as number[], relative: [] as number[], propagated: [] as number[], kept: [] as number[] };
    const provisional: EvidenceSettings = { ...balanceOnly, rate, inflation: 1 };
    for (const index of indices) {
      const point = operatingPointAt(columns, index);
      const residual = rateResidual(point, time[index] as number, rate);
      if (!Number.isFinite(residual.residualW) || !(residual.dutyW > 0)) continue;
      if (withVariance) {
        const evidence = sampleEvidence(point, time[index] as number, standardDeviationsAt(point, uncertainties), provisional);
        if (!Number.isFinite(evidence.rate)) continue;
        const [i11, i12, i22] = evidence.inverseCovariance;
        const determinant = i11 * i22 - i12 * i12;
        if (!(determinant > 0)) continue;
        result.propagated.push(i11 / determinant / (residual.dutyW * residual.dutyW));
      }
      result.timeMs.push(time[index] as number);
      result.relative.push(residual.residualW / residual.dutyW);
      result.kept.push(index);
    }
    return result;
  };

  const rate = fitOn(baseline);
  if (rate === null) return { settings: balanceOnly, baselineSamples: baseline.length, dayError: null };
  const inSample = residualsOn(baseline, rate, true);
  // The propagated variance hardly depends on the U model, so the in-sample values serve the cross-validation too.
  const propagatedAt = new Map<number, number>();
  inSample.kept.forEach((index, k) => propagatedAt.set(index, inSample.propagated[k] as number));
  if (inSample.relative.length < input.minimumBaselineSamples) return { settings: balanceOnly, baselineSamples: baseline.length, dayError: null };
  const rateOffset = medianValue(inSample.relative);
  const rateSpread = MAD_SCALE_FACTOR * medianValue(inSample.relative.map((value) => Math.abs(value - rateOffset)));

  // Out-of-sample day-level error: fit on the first two thirds of the baseline, predict the last third by day.
  let dayError = input.dayError;
  const firstMs = time[baseline[0] as number] as number;
  const cutMs = firstMs + (2 / 3) * (onsetMs - firstMs);
  const early = baseline.filter((index) => (time[index] as number) < cutMs);
  const late = baseline.filter((index) => (time[index] as number) >= cutMs);
  if (early.length >= input.minimumBaselineSamples && late.length >= input.minimumBaselineSamples / 2) {
    const earlyRate = fitOn(early);
    if (earlyRate !== null) {
      const earlyOffset = medianValue(residualsOn(early, earlyRate, false).relative);
      const predicted = residualsOn(late, earlyRate, false);
      const days = new Map<number, { sum: number; noise: number; count: number }>();
      predicted.timeMs.forEach((t, k) => {
        const day = Math.floor((t - cutMs) / DAY_MS);
        const entry = days.get(day) ?? { sum: 0, noise: 0, count: 0 };
        entry.sum += (predicted.relative[k] as number) - earlyOffset;
        entry.noise += propagatedAt.get(predicted.kept[k] as number) ?? 0;
        entry.count += 1;
        days.set(day, entry);
      });
      let excess = 0;
      let counted = 0;
      for (const entry of days.values()) {
        if (entry.count < 4) continue;
        const mean = entry.sum / entry.count;
        excess += mean * mean - entry.noise / (entry.count * entry.count);
        counted += 1;
      }
      if (counted > 0 && Number.isFinite(earlyOffset)) dayError = Math.max(dayError, Math.sqrt(Math.max(0, excess / counted)));
    }
  }
  const rateModelVariance = Math.max(0, rateSpread * rateSpread - medianValue(inSample.propagated)) + input.samplesPerDay * dayError * dayError;
  return { settings: { ...balanceOnly, rate, rateOffset, rateModelVariance }, baselineSamples: baseline.length, dayError };
}
