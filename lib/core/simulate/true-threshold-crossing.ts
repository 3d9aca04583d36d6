import { cycleIndexAt, cycleResistance, foulingHistory, type FoulingCycle } from "./fouling-history";
import { referenceDuty } from "./reference-duty";
import type { ExchangerSpec, SimulationPlan } from "./types";

const MS_PER_YEAR = 365.25 * 24 * 3600 * 1000;

export interface ThresholdCrossingOptions {
  /** Search no further than this after fromMs; default 10 years. */
  horizonMs?: number;
  /** Bisection stops when the bracket is this narrow; default 1000 ms. */
  toleranceMs?: number;
}

/**
 * trueThresholdCrossing: when the true duty at reference conditions first falls below spec.dutyThresholdW,
 * continuing the fouling cycle in effect at fromMs with no further cleanings.
 *
 * The duty at reference conditions falls monotonically as Rf grows, and every fouling model here is
 * non-decreasing in time, so the crossing is bracketed and found by bisection on time
 * (tolerance 1 s by default). The search starts at the start of the current cycle: if the exchanger
 * was already below the threshold before fromMs, the returned time lies before fromMs (it is the
 * start of the cycle if the residual left by the last cleaning was already below the threshold).
 *
 * @param spec exchanger spec with reference conditions and dutyThresholdW.
 * @param plan simulation plan (clean-U parameters, fouling plan, cleanings).
 * @param fromMs the instant whose fouling cycle is continued, epoch ms.
 * @returns epoch ms (rounded up to a whole millisecond) of the first instant with duty below the
 *   threshold, or null if that does not happen within the horizon (default 10 years after fromMs).
 */
export function trueThresholdCrossing(
  spec: ExchangerSpec,
  plan: SimulationPlan,
  fromMs: number,
  options: ThresholdCrossingOptions = {},
): number | null {
  const horizonMs = options.horizonMs ?? 10 * MS_PER_YEAR;
  const toleranceMs = options.toleranceMs ?? 1000;
  const cycles = foulingHistory(plan.fouling, plan.cleanings);
  const cycle = cycles[cycleIndexAt(cycles, fromMs)] as FoulingCycle;
  const below = (timeMs: number): boolean =>
    referenceDuty(spec, plan.cleanCoefficient, cycleResistance(cycle, timeMs)) < spec.dutyThresholdW;

  let low = Math.min(cycle.startMs, fromMs);
  let high = fromMs + horizonMs;
  if (below(low)) return Math.ceil(low);
  if (!below(high)) return null;
  while (high - low > toleranceMs) {
    const middle = 0.5 * (low + high);
    if (below(middle)) high = middle;
    else low = middle;
  }
  return Math.ceil(high);
}
