import { foulingGrowth, validateFoulingModel } from "./fouling-growth";
import type { FoulingModel, FoulingPlan, PlannedCleaning } from "./types";

/** One fouling cycle: from startMs (cleaning start, or service start) until the next cleaning starts. */
export interface FoulingCycle {
  /** Start of the cycle: the start of the cleaning that opened it (or the service start). */
  startMs: number;
  /** Return to service: the fouling clock of `model` starts here. */
  returnMs: number;
  /** Next cleaning start, or +Infinity for the last cycle. */
  endMs: number;
  /** Fouling left at the start of the cycle, m²·K/W. */
  residualM2KPerW: number;
  model: FoulingModel;
  /** The cleaning that opened this cycle (null for the first cycle). */
  cleaning: PlannedCleaning | null;
  /** Fouling just before that cleaning (null for the first cycle). */
  foulingBeforeCleaningM2KPerW: number | null;
}

/**
 * foulingHistory: the fouling cycles implied by a fouling plan and its cleanings.
 *
 * Within cycle i: Rf(t) = residual_i + model_i(t − returnMs_i), with the model's time clipped at 0 so
 * that Rf stays at residual_i (+ the model's value at 0) while the exchanger is isolated for cleaning.
 * A cleaning with effectiveness e removes that fraction of the fouling present when it starts:
 * residual_(i+1) = (1 − e)·Rf(cleaning start) (common practice for partial cleaning). The next cycle's
 * model starts again from t = 0 on top of that residual.
 *
 * @param fouling service start, initial resistance, one model per cycle (cleanings.length + 1 models).
 * @param cleanings sorted, non-overlapping, starting at or after the service start, effectiveness in [0, 1].
 * @throws with a message naming the broken rule.
 * @returns the cycles in time order.
 */
export function foulingHistory(fouling: FoulingPlan, cleanings: readonly PlannedCleaning[]): FoulingCycle[] {
  if (fouling.cycles.length !== cleanings.length + 1) {
    throw new Error(
      `foulingHistory: need one fouling model per cycle (${cleanings.length + 1}), got ${fouling.cycles.length}`,
    );
  }
  if (!(fouling.initialResistanceM2KPerW >= 0)) throw new Error("foulingHistory: initial resistance must be >= 0");
  fouling.cycles.forEach(validateFoulingModel);
  let previousEnd = fouling.serviceStartMs;
  for (const cleaning of cleanings) {
    if (!(cleaning.effectiveness >= 0 && cleaning.effectiveness <= 1)) {
      throw new Error(`foulingHistory: cleaning effectiveness must be in [0, 1], got ${cleaning.effectiveness}`);
    }
    if (!(cleaning.endMs >= cleaning.startMs)) throw new Error("foulingHistory: a cleaning ends before it starts");
    if (cleaning.startMs < previousEnd) {
      throw new Error("foulingHistory: cleanings must be sorted, not overlap, and start after the service start");
    }
    previousEnd = cleaning.endMs;
  }

  const firstModel = fouling.cycles[0] as FoulingModel;
  const cycles: FoulingCycle[] = [
    {
      startMs: fouling.serviceStartMs,
      returnMs: fouling.serviceStartMs,
      endMs: Number.POSITIVE_INFINITY,
      residualM2KPerW: fouling.initialResistanceM2KPerW,
      model: firstModel,
      cleaning: null,
      foulingBeforeCleaningM2KPerW: null,
    },
  ];
  cleanings.forEach((cleaning, index) => {
    const previous = cycles[cycles.length - 1] as FoulingCycle;
    previous.endMs = cleaning.startMs;
    const before = cycleResistance(previous, cleaning.startMs);
    cycles.push({
      startMs: cleaning.startMs,
      returnMs: cleaning.endMs,
      endMs: Number.POSITIVE_INFINITY,
      residualM2KPerW: (1 - cleaning.effectiveness) * before,
      model: fouling.cycles[index + 1] as FoulingModel,
      cleaning,
      foulingBeforeCleaningM2KPerW: before,
    });
  });
  return cycles;
}

/** Fouling resistance within one cycle at timeMs (the cycle's formula, whether or not timeMs lies in it). */
export function cycleResistance(cycle: FoulingCycle, timeMs: number): number {
  return cycle.residualM2KPerW + foulingGrowth(cycle.model, (timeMs - cycle.returnMs) / 1000);
}

/** Index of the cycle in effect at timeMs (times before the service start belong to the first cycle). */
export function cycleIndexAt(cycles: readonly FoulingCycle[], timeMs: number): number {
  let index = 0;
  while (index + 1 < cycles.length && (cycles[index + 1] as FoulingCycle).startMs <= timeMs) index += 1;
  return index;
}

/** foulingResistanceAt: Rf (m²·K/W) at timeMs from the cycles of foulingHistory. */
export function foulingResistanceAt(cycles: readonly FoulingCycle[], timeMs: number): number {
  return cycleResistance(cycles[cycleIndexAt(cycles, timeMs)] as FoulingCycle, timeMs);
}
