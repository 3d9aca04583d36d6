import type { InstrumentUncertainties } from "../screening/instrument-uncertainties";
import { roleColumn } from "../screening/role-column";
import type { ExchangerModel, InstrumentRole, ReadingColumns } from "../screening/types";
import { formatInstant } from "./format-instant";
import { instrumentTag } from "./instrument-tag";
import type { InstrumentAlert } from "./types";

const ROLES: readonly InstrumentRole[] = ["hotIn", "hotOut", "coldIn", "coldOut", "hotFlow", "coldFlow"];

/** Index of the n-th finite (and considered) value of column[from..to] (the last index if there are fewer). */
function nthValidIndex(column: Float64Array, consider: Uint8Array | undefined, from: number, to: number, n: number): number {
  let seen = 0;
  for (let index = from; index <= to; index += 1) {
    if (Number.isFinite(column[index] as number) && (consider === undefined || consider[index] === 1)) seen += 1;
    if (seen === n) return index;
  }
  return to;
}

/** Options of {@link detectStuckSignals}; defaults in brackets. */
export interface StuckSignalOptions {
  /** Frozen readings (repeats of the previous valid reading) needed for an alert [12]. */
  minimumRunSamples?: number;
  /** A reading repeats the previous one when they differ by at most this fraction of its magnitude [1e-9]. */
  relativeTolerance?: number;
  /** Optional absolute tolerance per role (e.g. half the reading resolution), SI units [none]. */
  absoluteTolerance?: Partial<Record<InstrumentRole, number>>;
  /** The process moved when another instrument's range over the run reaches this many of its σ [3]. */
  movementSigmas?: number;
  /**
   * Samples to judge (1), e.g. screening's in-service flags; the others are passed over like missing values [all].
   * A flow parked at its shutdown minimum can repeat exactly once quantised, which says nothing about the meter.
   */
  consider?: Uint8Array;
}

/**
 * detectStuckSignals: instruments whose reading froze while the process kept moving (a flat-lined transmitter or a
 * historian value that stopped updating).
 *
 * Rule: a run of at least N consecutive valid readings each within tol = max(ε·|x|, absolute) of the previous valid
 * reading (missing values, and samples outside options.consider, are passed over), during which at least one other instrument's range max − min reaches
 * c·σ (σ its standard uncertainty; for flows the relative uncertainty times the run's median flow). The alert starts
 * at the first repeated reading (the first sample that failed to update) and ends at the first reading that differs,
 * or stays open (endMs null) when the run reaches the end of the data; size = the frozen value.
 * With noise of σ and a resolution q ≪ σ a healthy reading repeats with probability about q/(2σ√π) per sample, so
 * N = 12 repeats do not happen by chance; the movement test keeps a genuinely idle, quiet plant (or a historian
 * with a compression dead band on every tag) from raising alerts.
 * Source: common practice in process-data validation (flat-line or "frozen value" check, e.g. Narasimhan &
 * Jordache 2000, ch. 1, on instrument failure modes; from memory); N = 12 hourly samples as the brief asks.
 *
 * @param columns readings sorted by time; not modified.
 * @param model instrument tags.
 * @param uncertainties σ by role (temperatures K, flows relative).
 * @param options run length, tolerances, movement threshold.
 */
export function detectStuckSignals(
  columns: ReadingColumns,
  model: ExchangerModel,
  uncertainties: InstrumentUncertainties,
  options: StuckSignalOptions = {},
): InstrumentAlert[] {
  const minimumRunSamples = options.minimumRunSamples ?? 12;
  const relativeTolerance = options.relativeTolerance ?? 1e-9;
  const movementSigmas = options.movementSigmas ?? 3;
  if (!(Number.isInteger(minimumRunSamples) && minimumRunSamples >= 2)) throw new RangeError(`minimum run must be an integer of at least 2, got ${minimumRunSamples}`);
  const count = columns.timeMs.length;
  const alerts: InstrumentAlert[] = [];

  const processMoved = (role: InstrumentRole, from: number, to: number): boolean => {
    for (const other of ROLES) {
      if (other === role) continue;
      const column = roleColumn(columns, other);
      let low = Number.POSITIVE_INFINITY;
      let high = Number.NEGATIVE_INFINITY;
      for (let index = from; index <= to; index += 1) {
        const value = column[index] as number;
        if (!Number.isFinite(value)) continue;
        if (value < low) low = value;
        if (value > high) high = value;
      }
      if (!(high >= low)) continue;
      const flow = other === "hotFlow" || other === "coldFlow";
      const sigma = flow ? uncertainties[other] * Math.abs((low + high) / 2) : uncertainties[other];
      if (Number.isFinite(sigma) && high - low >= movementSigmas * sigma) return true;
    }
    return false;
  };

  for (const role of ROLES) {
    const column = roleColumn(columns, role);
    const absolute = options.absoluteTolerance?.[role] ?? 0;
    let anchor = -1; // index of the last reading before the repeats (the value that froze)
    let firstRepeat = -1;
    let lastRepeat = -1;
    let repeats = 0;
    const close = (endIndex: number | null): void => {
      if (repeats >= minimumRunSamples && processMoved(role, anchor, lastRepeat)) {
        const value = column[anchor] as number;
        const flow = role === "hotFlow" || role === "coldFlow";
        const endMs = endIndex === null ? null : (columns.timeMs[endIndex] as number);
        alerts.push({
          role,
          instrumentTag: instrumentTag(model, role),
          kind: "stuck",
          startMs: columns.timeMs[firstRepeat] as number,
          endMs,
          detectedMs: columns.timeMs[nthValidIndex(column, options.consider, firstRepeat, lastRepeat, minimumRunSamples)] as number,
          size: value,
          sizeUnit: flow ? "kg/s" : "K",
          evidence:
            `${role} reading frozen at ${value.toPrecision(6)} ${flow ? "kg/s" : "K"} for ${repeats} consecutive readings ` +
            `(${formatInstant(columns.timeMs[firstRepeat] as number)} to ${formatInstant(columns.timeMs[lastRepeat] as number)}; ` +
            `threshold ${minimumRunSamples}) while the other instruments moved by more than ${movementSigmas} σ` +
            (endMs === null ? "; still frozen at the end of the data" : `; reading changed again ${formatInstant(endMs)}`),
        });
      }
      repeats = 0;
      firstRepeat = -1;
      lastRepeat = -1;
    };
    for (let index = 0; index < count; index += 1) {
      const value = column[index] as number;
      if (!Number.isFinite(value) || (options.consider !== undefined && options.consider[index] !== 1)) continue;
      if (anchor >= 0) {
        const previous = column[lastRepeat >= 0 ? lastRepeat : anchor] as number;
        const tolerance = Math.max(relativeTolerance * Math.abs(previous), absolute);
        if (Math.abs(value - previous) <= tolerance) {
          if (repeats === 0) firstRepeat = index;
          repeats += 1;
          lastRepeat = index;
          continue;
        }
        close(index);
      }
      anchor = index;
    }
    if (anchor >= 0 && repeats > 0) close(null);
  }
  return alerts.sort((a, b) => a.startMs - b.startMs);
}
