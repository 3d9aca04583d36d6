import { cleanResistance, fitCleanModel } from "../clean-model";
import {
  criticalFoulingResistance,
  cycleLostEnergy,
  forecastCrossings,
  referenceRating,
  type CrossingCriterion,
  type ReferenceConditions,
} from "../forecast";
import {
  fitTrendModel,
  selectTrendModel,
  trendBand,
  trendBandQuantiles,
  trendPriorFromFits,
  trendValue,
  type PriorSource,
  type TrendFit,
  type TrendModelKind,
} from "../trend";
import { cleaningEffectiveness } from "./cleaning-effectiveness";
import { cycleOrigins } from "./cycle-origins";
import { dailyPeriods } from "./daily-periods";
import { medianOf } from "./median-of";
import { observedResistances } from "./observed-resistances";
import { resolveAssessmentOptions } from "./resolve-assessment-options";
import type { CrossingForecast } from "../forecast";
import type { Assessment, AssessmentCycle, AssessmentInput, FoulingSeriesPoint, ForecastBandPoint } from "./types";

const MS_PER_DAY = 86_400_000;
const KINDS: TrendModelKind[] = ["linear", "asymptotic", "falling-rate"];

function iso(ms: number): string {
  return new Date(ms).toISOString();
}

/** Median spacing of ascending times, ms (a day when there are fewer than two). */
function nominalSpacing(timesMs: readonly number[]): number {
  if (timesMs.length < 2) return MS_PER_DAY;
  const gaps: number[] = [];
  for (let index = 1; index < timesMs.length; index += 1) gaps.push((timesMs[index] as number) - (timesMs[index - 1] as number));
  return medianOf(gaps) as number;
}

/**
 * assessAsset: the fouling assessment of one exchanger at an instant, from its screened periods and cleaning records.
 *
 * Steps: (1) usable periods up to asOf, averaged into UTC days (option); (2) 1/U_obs per day from the reconciled duty and
 * measured temperatures (thermal core observedU); (3) the grey-box clean-U model on the clean windows (fitCleanModel);
 * (4) Rf = 1/U_obs − 1/U_clean(m_h, m_c) per day, split into cycles at the cleanings (cycleOrigins), with each cleaning's
 * effectiveness from the medians a week either side; (5) per cycle the linear, asymptotic and falling-rate trends, chosen
 * by AICc; the current cycle is refitted with empirical-Bayes shape priors from the earlier cycles (trendPriorFromFits);
 * (6) the exchanger is rated at reference conditions with U_ref = 1/(R0 + Rf): current duty and loss, the energy lost in
 * the current cycle, and P10/P50/P90 dates for the duty threshold, the design fouling allowance and the outlet limit
 * (criticalFoulingResistance once per limit, then forecastCrossings on the trend and its 80 % band).
 * Times of daily periods are taken at mid-day; trend time is days since the cycle origin.
 * Valid: periods screened for steady operation and instrument faults upstream; cleanings at their return to service.
 * Source: see the functions named above (Kern & Seaton 1959; Hurvich & Tsai 1989; Theil & Goldberger 1961; Levenberg
 * 1944 / Marquardt 1963; Incropera et al. 2007 for the rating).
 *
 * @param input asset, periods, cleanings, asOf (epoch ms) and options (not modified)
 * @returns a plain, serialisable Assessment (no NaN or Infinity; null where unknown)
 * @throws RangeError for inconsistent design data or options
 */
export function assessAsset(input: AssessmentInput): Assessment {
  const settings = resolveAssessmentOptions(input.options);
  const { asset, asOfMs } = input;
  const notes: string[] = [];
  const inWindow = input.periods.filter((period) => period.usable && period.startMs <= asOfMs);
  const periods = settings.aggregation === "daily" ? dailyPeriods(inWindow) : [...inWindow].sort((a, b) => a.startMs - b.startMs);
  const { points, rejected } = observedResistances(asset, periods);
  if (rejected > 0) notes.push(`${rejected} periods were rejected by the thermal core (inconsistent temperatures or duty) and left out.`);
  const halfPeriod = settings.aggregation === "daily" ? MS_PER_DAY / 2 : nominalSpacing(points.map((point) => point.timeMs)) / 2;
  const times = points.map((point) => point.timeMs + halfPeriod);

  const firstMs = times[0] ?? asOfMs;
  const { originsMs, firstIsRecorded } = cycleOrigins(firstMs, input.cleanings, asOfMs);
  if (!firstIsRecorded) notes.push("No cleaning record before the data: the first cycle is taken to start at the first usable period.");

  const cleanModel = points.length === 0
    ? null
    : fitCleanModel({
        points: points.map((point, index) => ({ ...point, timeMs: times[index] as number })),
        windowOriginsMs: [firstMs, ...originsMs.slice(1)],
        reference: asset.reference,
        design: { uWPerM2K: asset.designUWPerM2K, foulingM2KPerW: asset.designFoulingM2KPerW },
        options: {
          windowDays: settings.cleanWindowDays,
          windows: settings.cleanWindows,
          fitExponents: settings.fitExponents,
          designSplit: settings.designSplit,
          validationFraction: settings.validationFraction,
          ...(settings.cleanUAtReferenceWPerM2K === null ? {} : { cleanResistanceAtReferenceM2KPerW: 1 / settings.cleanUAtReferenceWPerM2K }),
        },
      });
  const cleanResistanceAtReference = cleanModel?.cleanResistanceAtReferenceM2KPerW ?? 1 / asset.designUWPerM2K - asset.designFoulingM2KPerW;
  if (cleanModel === null) notes.push("No usable periods: the clean model falls back to the data sheet and there is no trend.");

  // Fouling-resistance series, split into cycles.
  const fouling = points.map((point) =>
    cleanModel === null ? Number.NaN : point.resistanceM2KPerW - cleanResistance(cleanModel.parameters, point.hotFlowKgPerS, point.coldFlowKgPerS),
  );
  const cycleOf = times.map((time) => {
    let index = 0;
    while (index + 1 < originsMs.length && (originsMs[index + 1] as number) <= time) index += 1;
    return index;
  });
  const series: FoulingSeriesPoint[] = points.map((_, index) => ({
    time: iso(times[index] as number),
    timeMs: times[index] as number,
    foulingM2KPerW: fouling[index] as number,
    cycle: cycleOf[index] as number,
  }));

  // Per-cycle trends without priors (also the prior sources), then the current cycle with priors.
  const cycleCount = originsMs.length;
  const currentIndex = cycleCount - 1;
  const dataOf = (cycle: number) => {
    const timeDays: number[] = [];
    const values: number[] = [];
    series.forEach((point) => {
      if (point.cycle !== cycle) return;
      timeDays.push(Math.max(0, (point.timeMs - (originsMs[cycle] as number)) / MS_PER_DAY));
      values.push(point.foulingM2KPerW);
    });
    return { timeDays, foulingM2KPerW: values };
  };
  const plainFits: (TrendFit | null)[][] = [];
  const chosenKinds: (TrendModelKind | null)[] = [];
  for (let cycle = 0; cycle < currentIndex; cycle += 1) {
    const data = dataOf(cycle);
    const fits = KINDS.map((kind) => fitTrendModel(kind, data, { autocorrelation: settings.autocorrelation }));
    plainFits.push(fits);
    chosenKinds.push(selectTrendModel(fits).chosen?.kind ?? null);
  }
  const currentData = dataOf(currentIndex);
  const currentFits = KINDS.map((kind, k) => {
    const sources: PriorSource[] = [];
    if (settings.usePriors) {
      for (let cycle = 0; cycle < currentIndex; cycle += 1) {
        const fit = plainFits[cycle]?.[k];
        if (fit) sources.push({ cycleIndex: cycle, fit });
      }
    }
    const prior = trendPriorFromFits(kind, sources);
    return fitTrendModel(kind, currentData, { autocorrelation: settings.autocorrelation, ...(prior === null ? {} : { prior }) });
  });
  const selection = selectTrendModel(currentFits);
  const currentFit = selection.chosen;
  chosenKinds.push(currentFit?.kind ?? null);
  const currentOriginMs = originsMs[currentIndex] as number;
  const asOfDays = (asOfMs - currentOriginMs) / MS_PER_DAY;

  // Current state.
  const lastTimeMs = times[times.length - 1] ?? asOfMs;
  const recent = points
    .map((point, index) => ({ point, index }))
    .filter(({ index }) => (times[index] as number) > lastTimeMs - settings.recentDays * MS_PER_DAY);
  const recentMedian = medianOf(recent.map(({ index }) => fouling[index] as number).filter(Number.isFinite));
  const currentFouling = currentFit !== null ? trendValue(currentFit, asOfDays) : recentMedian;
  const currentObservedU =
    cleanModel === null || recent.length === 0
      ? null
      : {
          uWPerM2K: medianOf(recent.map(({ point }) => 1 / point.resistanceM2KPerW)) as number,
          percentOfClean:
            100 * (medianOf(recent.map(({ point }) => cleanResistance(cleanModel.parameters, point.hotFlowKgPerS, point.coldFlowKgPerS) / point.resistanceM2KPerW)) as number),
          periods: recent.length,
        };

  const conditions: ReferenceConditions = {
    arrangement: asset.arrangement,
    areaM2: asset.areaM2,
    hotHeatCapacity: asset.hotHeatCapacity,
    coldHeatCapacity: asset.coldHeatCapacity,
    reference: asset.reference,
    cleanResistanceM2KPerW: cleanResistanceAtReference,
  };
  const cleanDutyW = referenceRating(conditions, 0).dutyW;
  const currentDutyW = currentFouling === null ? null : referenceRating(conditions, currentFouling).dutyW;
  const lossEnergyJ = currentFit === null ? null : cycleLostEnergy(conditions, currentFit, 0, asOfDays);

  // Forecasts: one critical Rf per limit (bisection on Rf), then the crossing dates of the trend and its band.
  const criteria: CrossingCriterion[] = [
    { kind: "duty", minimumDutyW: asset.dutyThresholdW },
    { kind: "fouling-allowance", allowanceM2KPerW: asset.designFoulingM2KPerW },
  ];
  const outlet = asset.minimumOutlet;
  if (outlet !== undefined) {
    criteria.push(outlet.stream === "cold" ? { kind: "cold-outlet", minimumK: outlet.temperatureK } : { kind: "hot-outlet", maximumK: outlet.temperatureK });
  }
  const crossings = forecastCrossings({
    targets: criteria.map((criterion) => ({ criterion: criterion.kind, critical: criticalFoulingResistance(conditions, criterion) })),
    fit: currentFit,
    cycleOriginMs: currentOriginMs,
    asOfMs,
    horizonDays: settings.horizonDays,
  });
  const [duty, foulingAllowance, outletForecast] = crossings as [CrossingForecast, CrossingForecast, CrossingForecast | undefined];
  const minimumOutlet = outletForecast ?? null;

  // Band for charts: from the current cycle origin to the horizon, every bandStepDays.
  let trend: Assessment["trend"] = null;
  if (currentFit !== null) {
    const endDays = asOfDays + settings.horizonDays;
    const bandTimes: number[] = [];
    for (let day = 0; day < endDays; day += settings.bandStepDays) bandTimes.push(day);
    bandTimes.push(endDays);
    const band: ForecastBandPoint[] = trendBand(currentFit, bandTimes, trendBandQuantiles(currentFit)).map((point) => {
      const timeMs = Math.round(currentOriginMs + point.timeDays * MS_PER_DAY);
      return { time: iso(timeMs), timeMs, p10: point.lower80, p50: point.center, p90: point.upper80, lower95: point.lower95, upper95: point.upper95 };
    });
    const prior = currentFit.prior;
    trend = {
      model: currentFit.kind,
      parameters: currentFit.parameters,
      aiccTable: selection.table,
      reason: selection.reason,
      priorUsed: prior === null ? null : { parameter: prior.parameter, mean: prior.mean, standardDeviation: prior.standardDeviation, sourceCycles: prior.sourceCycles },
      lagOneAutocorrelation: currentFit.lagOneAutocorrelation,
      varianceInflation: currentFit.varianceInflation,
      band,
    };
  } else {
    notes.push(`No trend for the current cycle: ${selection.reason}`);
  }

  const cycles: AssessmentCycle[] = originsMs.map((originMs, index) => {
    const next = originsMs[index + 1];
    return {
      index,
      start: iso(originMs),
      end: next === undefined ? null : iso(next),
      usablePoints: series.filter((point) => point.cycle === index).length,
      model: chosenKinds[index] ?? null,
      effectivenessOfCleaningThatEndedIt:
        next === undefined ? null : cleaningEffectiveness(times, fouling, next, settings.effectivenessWindowDays),
    };
  });

  return {
    asOf: iso(asOfMs),
    asOfMs,
    cleanModel,
    currentObservedU,
    foulingResistance: { current: currentFouling, recentMedian, series: cleanModel === null ? [] : series },
    referenceDuty: {
      cleanW: cleanDutyW,
      currentW: currentDutyW,
      lossW: currentDutyW === null ? null : cleanDutyW - currentDutyW,
      lossEnergyJ,
    },
    trend,
    forecasts: { duty, foulingAllowance, minimumOutlet },
    cycles,
    notes: [...notes, ...(cleanModel?.notes ?? [])],
  };
}
