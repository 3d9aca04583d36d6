import { seededRandom } from "../../../lib/core/simulate";
import type { CleanModelParameters, CleanModelPoint } from "../../../lib/core/clean-model";

const DAY_MS = 86_400_000;
export const START_MS = Date.UTC(2025, 0, 1, 12);

/** Settings of a synthetic record: daily 1/U_obs = clean model + fouling + white noise (simulation with known truth). */
export interface SyntheticRecord {
  truth: CleanModelParameters;
  days: number;
  /** Day numbers of cleanings (fouling returns to `residualAfterCleaning`). */
  cleaningDays: number[];
  foulingRatePerDay: number;
  initialFouling: number;
  residualAfterCleaning: number;
  /** Relative flow swings (standard deviations of independent AR(1)-like walks) and their coupling. */
  hotSwing: number;
  coldSwing: number;
  /** Cold flow = coupling·hot + (1 − coupling)·own variation (1: flows move exactly together). */
  coupling: number;
  noise: number;
  seed: number;
}

/** Daily points of a synthetic record and the cleaning instants. */
export function syntheticRecord(settings: SyntheticRecord): { points: CleanModelPoint[]; cleaningsMs: number[]; truthFouling: number[] } {
  const random = seededRandom(settings.seed);
  const points: CleanModelPoint[] = [];
  const truthFouling: number[] = [];
  let hotState = 0;
  let coldState = 0;
  let lastCleaning = 0;
  let base = settings.initialFouling;
  for (let day = 0; day < settings.days; day += 1) {
    if (settings.cleaningDays.includes(day)) {
      lastCleaning = day;
      base = settings.residualAfterCleaning;
    }
    hotState = 0.8 * hotState + 0.6 * random.normal();
    coldState = 0.8 * coldState + 0.6 * random.normal();
    const hotRatio = 1 + settings.hotSwing * hotState;
    const coldRatio = 1 + settings.coldSwing * (settings.coupling * hotState + (1 - settings.coupling) * coldState);
    const hotFlow = settings.truth.hotFlowRefKgPerS * hotRatio;
    const coldFlow = settings.truth.coldFlowRefKgPerS * coldRatio;
    const fouling = base + settings.foulingRatePerDay * (day - lastCleaning);
    const clean =
      settings.truth.hotFilmResistanceRefM2KPerW * Math.pow(hotRatio, -settings.truth.exponentHot) +
      settings.truth.coldFilmResistanceRefM2KPerW * Math.pow(coldRatio, -settings.truth.exponentCold) +
      settings.truth.wallResistanceM2KPerW;
    truthFouling.push(fouling);
    points.push({ timeMs: START_MS + day * DAY_MS, hotFlowKgPerS: hotFlow, coldFlowKgPerS: coldFlow, resistanceM2KPerW: clean + fouling + settings.noise * random.normal() });
  }
  return { points, cleaningsMs: settings.cleaningDays.map((day) => START_MS + day * DAY_MS - DAY_MS / 4), truthFouling };
}

/** Truth: R0 = 2e-3 m²·K/W split 60/30/10 (hot/cold/wall), exponents 0.8, reference flows 10 and 20 kg/s. */
export const TRUTH: CleanModelParameters = {
  hotFilmResistanceRefM2KPerW: 1.2e-3,
  coldFilmResistanceRefM2KPerW: 0.6e-3,
  wallResistanceM2KPerW: 0.2e-3,
  exponentHot: 0.8,
  exponentCold: 0.8,
  hotFlowRefKgPerS: 10,
  coldFlowRefKgPerS: 20,
};

/** Design data whose clean resistance 1/U − Rf equals the truth's 2e-3 m²·K/W exactly (U = 400, Rf = 5e-4). */
export const DESIGN = { uWPerM2K: 400, foulingM2KPerW: 5e-4 };

export const BASE_RECORD: SyntheticRecord = {
  truth: TRUTH,
  days: 400,
  cleaningDays: [200],
  foulingRatePerDay: 1e-6,
  initialFouling: 5e-5,
  residualAfterCleaning: 2e-5,
  hotSwing: 0.06,
  coldSwing: 0.06,
  coupling: 0.3,
  noise: 1e-5,
  seed: 5,
};
