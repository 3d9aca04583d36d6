// Seeded synthetic fleet for the planner benchmark: realistic magnitudes (duties of MW, fuel prices per GJ, cleanings
// of tens of thousands), invented numbers; not plant data.
import { sampledDutyLoss, type AssetEconomics, type DutyLossForecast } from "../../lib/core/economics";
import type { ExclusionGroup, PlanAsset, PlanInput } from "../../lib/core/plan";
import { deriveSeed, seededRandom } from "../../lib/core/simulate";

const DAY_MS = 86_400_000;

export interface SyntheticFleetOptions {
  assets: number;
  weeks: number;
  crewCapacity: number;
  groups: number;
  /** Share of assets that may be cleaned twice in the horizon; default 0. */
  twoCleaningShare?: number;
  /** Crews during the turnaround weeks (contractor surge); default crewCapacity. */
  turnaroundCrews?: number;
  /** Multiplies every fouling rate (1.6 makes about half the fleet reach its threshold within the year); default 1. */
  foulingScale?: number;
}

/** Duty loss of a fouling curve sampled weekly over ten years, as the forecast module would hand it over. */
function sampledCurve(lossAt: (days: number) => number): DutyLossForecast {
  const elapsedDays: number[] = [];
  const dutyLossW: number[] = [];
  for (let days = 0; days <= 4200; days += 7) {
    elapsedDays.push(days);
    dutyLossW.push(lossAt(days));
  }
  return sampledDutyLoss({ elapsedDays, dutyLossW });
}

/** First day the loss exceeds a limit, by bisection on a non-decreasing curve; null within ten years. */
function crossingDay(lossAt: (days: number) => number, limitW: number): number | null {
  if (lossAt(3650) <= limitW) return null;
  let low = 0;
  let high = 3650;
  while (high - low > 0.01) {
    const middle = (low + high) / 2;
    if (lossAt(middle) > limitW) high = middle;
    else low = middle;
  }
  return high;
}

/**
 * syntheticPlanInput: a seeded fleet: a 6-crew site with a few blackout weeks, one turnaround, and groups of 2–4
 * exchangers; each exchanger with its own duty, fouling curve (linear, asymptotic or falling rate), energy prices,
 * cleaning method, outage loss, optional throughput limit and threshold crossings.
 */
export function syntheticPlanInput(seed: number, options: SyntheticFleetOptions): PlanInput {
  const site = seededRandom(deriveSeed(seed, "site"));
  const startMs = Date.UTC(2026, 0, 5); // a Monday
  const turnaroundFirst = Math.min(options.weeks - 4, 20);
  const inTurnaround = (week: number) => week >= turnaroundFirst && week <= turnaroundFirst + 3;
  const blackoutWeeks = [...new Set([options.weeks - 1, site.integer(4, options.weeks - 2), site.integer(4, options.weeks - 2)])]
    .filter((week) => !inTurnaround(week))
    .sort((a, b) => a - b);
  const assets: PlanAsset[] = [];
  for (let index = 0; index < options.assets; index += 1) {
    const tag = `E-${1000 + index}`;
    const random = seededRandom(deriveSeed(seed, tag));
    const cleanDutyW = random.between(2e6, 2e7);
    const kind = random.integer(0, 2);
    const scale = options.foulingScale ?? 1;
    const fractionPerYear = scale * random.between(0.05, 0.25);
    const lossAt =
      kind === 0
        ? (days: number) => cleanDutyW * Math.min(0.6, (fractionPerYear * days) / 365)
        : kind === 1
          ? (() => {
              const asymptote = Math.min(0.9, scale * random.between(0.1, 0.45));
              const theta = random.between(90, 500);
              return (days: number) => -cleanDutyW * asymptote * Math.expm1(-days / theta);
            })()
          : (days: number) => cleanDutyW * Math.min(0.6, fractionPerYear * Math.pow(days / 365, 0.6));
    const speed = random.between(0.8, 1.3);
    const currentLossAt = (days: number) => lossAt(days * speed);
    const outageDays = random.integer(3, 10);
    const economics: AssetEconomics = {
      energy: {
        fuelPricePerGJ: random.between(6, 12),
        heaterEfficiency: random.between(0.8, 0.9),
        co2KgPerGJFuel: 56.1,
        co2PricePerTonne: 80,
      },
      method: { name: random.chance(0.7) ? "hydro-blast" : "chemical", cost: random.between(15_000, 80_000), outageDays },
      outageLostProductionPerDay: random.chance(0.3) ? 0 : random.between(5_000, 50_000),
      bypassDutyLossW: cleanDutyW,
      throughputLimit: random.chance(0.2) ? { dutyLossW: 0.25 * cleanDutyW, lostProductionPerDay: 20_000 } : null,
    };
    const ageDays = random.between(0, 250);
    const lastReturnToServiceMs = startMs - Math.round(ageDays) * DAY_MS;
    const threshold = crossingDay(currentLossAt, 0.3 * cleanDutyW);
    const thresholdCrossing =
      threshold === null
        ? null
        : {
            p10Ms: lastReturnToServiceMs + Math.round(threshold * 0.85) * DAY_MS,
            p50Ms: lastReturnToServiceMs + Math.round(threshold) * DAY_MS,
            p90Ms: lastReturnToServiceMs + Math.round(threshold * 1.2) * DAY_MS,
          };
    assets.push({
      id: String(index + 1),
      tag,
      economics,
      currentCycle: sampledCurve(currentLossAt),
      cleanCycle: sampledCurve(lossAt),
      lastReturnToServiceMs,
      minimumDaysBetweenCleanings: 60,
      maximumCleanings: random.chance(options.twoCleaningShare ?? 0) ? 2 : 1,
      thresholdCrossing,
      ...(index < 5 ? { lockedWeeks: [site.integer(2, options.weeks - 1)] } : {}),
    });
  }
  const groups: ExclusionGroup[] = [];
  let next = 5;
  for (let group = 0; group < options.groups && next < assets.length; group += 1) {
    const size = site.integer(2, 4);
    groups.push({ name: `train-${group + 1}`, assetIds: assets.slice(next, next + size).map((asset) => asset.id) });
    next += size;
  }
  return {
    horizon: { startMs, weeks: options.weeks },
    site: {
      crewCapacity: Array.from({ length: options.weeks }, (_, week) =>
        inTurnaround(week) ? (options.turnaroundCrews ?? options.crewCapacity) : options.crewCapacity,
      ),
      blackoutWeeks,
      turnarounds: [{ name: "TA-2026", firstWeek: turnaroundFirst, lastWeek: turnaroundFirst + 3 }],
      groups,
    },
    assets,
  };
}
