import { seededRandom } from "../../../lib/core/simulate";
import { fitTrendModel, trendBand, type TrendModelKind } from "../../../lib/core/trend";

/** Settings of one seeded coverage experiment (simulation with known truth). */
export interface CoverageExperiment {
  kind: TrendModelKind;
  truth: (timeDays: number) => number;
  /** Daily observations at t = 0..days − 1, each missing with this probability. */
  days: number;
  missingFraction: number;
  /** Marginal noise standard deviation, m²·K/W. */
  noiseStandardDeviation: number;
  /** AR(1) coefficient of the daily noise (0: independent). */
  noiseAutocorrelation: number;
  horizonsDays: number[];
  replicates: number;
  seed: number;
  autocorrelation: "ar1" | "none";
}

/** Fraction of future noisy observations inside the 80 % and 95 % bands, over replicates and horizons. */
export function bandCoverage(experiment: CoverageExperiment): { coverage80: number; coverage95: number; fitted: number } {
  const random = seededRandom(experiment.seed);
  const innovationScale = experiment.noiseStandardDeviation * Math.sqrt(1 - experiment.noiseAutocorrelation ** 2);
  let inside80 = 0;
  let inside95 = 0;
  let checks = 0;
  let fitted = 0;
  const lastHorizon = Math.max(...experiment.horizonsDays);
  for (let replicate = 0; replicate < experiment.replicates; replicate += 1) {
    const noise: number[] = [];
    let state = experiment.noiseStandardDeviation * random.normal();
    for (let day = 0; day < experiment.days + lastHorizon; day += 1) {
      noise.push(state);
      state = experiment.noiseAutocorrelation * state + innovationScale * random.normal();
    }
    const timeDays: number[] = [];
    const values: number[] = [];
    for (let day = 0; day < experiment.days; day += 1) {
      const missing = random.chance(experiment.missingFraction);
      if (missing) continue;
      timeDays.push(day);
      values.push(experiment.truth(day) + (noise[day] as number));
    }
    const fit = fitTrendModel(experiment.kind, { timeDays, foulingM2KPerW: values }, { autocorrelation: experiment.autocorrelation });
    if (fit === null || !fit.converged) continue;
    fitted += 1;
    const futureTimes = experiment.horizonsDays.map((horizon) => experiment.days - 1 + horizon);
    const band = trendBand(fit, futureTimes);
    futureTimes.forEach((time, index) => {
      const point = band[index];
      if (point === undefined) return;
      const observed = experiment.truth(time) + (noise[time] as number);
      checks += 1;
      if (observed >= point.lower80 && observed <= point.upper80) inside80 += 1;
      if (observed >= point.lower95 && observed <= point.upper95) inside95 += 1;
    });
  }
  return { coverage80: inside80 / checks, coverage95: inside95 / checks, fitted };
}
