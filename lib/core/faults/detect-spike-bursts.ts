import { nominalStep } from "../screening/nominal-step";
import type { ExchangerModel, InstrumentRole } from "../screening/types";
import { formatInstant } from "./format-instant";
import { instrumentTag } from "./instrument-tag";
import type { InstrumentAlert } from "./types";

const ROLES: readonly InstrumentRole[] = ["hotIn", "hotOut", "coldIn", "coldOut", "hotFlow", "coldFlow"];
const DAY_MS = 86_400_000;

/** Options of {@link detectSpikeBursts}; defaults in brackets. */
export interface SpikeBurstOptions {
  /** Window over which outliers are counted, s [7 days]. */
  windowS?: number;
  /** Outliers within one window that make a burst [5]. */
  minimumCount?: number;
  /**
   * Expected rate of false Hampel flags per sample on a healthy instrument [0.003: the two-sided 3σ tail of normal
   * noise, 0.27 %, rounded up]. With many samples per window (minute data) the threshold rises above the background:
   * max(minimumCount, ⌈λ + 4·√λ⌉), λ = rate × samples per window (a normal approximation to the Poisson tail).
   */
  backgroundRate?: number;
}

/**
 * detectSpikeBursts: repeated spikes on one instrument (a loose connection, electrical noise, a failing
 * transmitter). Isolated spikes are only excluded from the data; a burst raises a "spikes" alert.
 *
 * Rule: for each role, a window (t − W, t] ending at an outlier that holds at least c* Hampel outliers marks all of
 * them; marked outliers less than W apart form one episode. Alert from the first to just after the last marked
 * outlier (one nominal step), or open (endMs null) when the last window of the data still holds c* outliers;
 * size = number of outliers in the episode (unit "count").
 * Source: common practice (repeated-outlier rule, e.g. 5 in 7 days as the brief asks); Hampel flags from
 * hampelFilter (Pearson 2002).
 *
 * @param timeMs sample times, sorted.
 * @param outliers Hampel flags by role (1 = outlier); not modified.
 * @param model instrument tags.
 * @param options window, count, background rate.
 */
export function detectSpikeBursts(
  timeMs: Float64Array,
  outliers: Readonly<Record<InstrumentRole, Uint8Array>>,
  model: ExchangerModel,
  options: SpikeBurstOptions = {},
): InstrumentAlert[] {
  const windowMs = (options.windowS ?? 7 * 86_400) * 1000;
  const minimumCount = options.minimumCount ?? 5;
  const backgroundRate = options.backgroundRate ?? 0.003;
  if (!(windowMs > 0)) throw new RangeError("window must be positive");
  if (!(Number.isInteger(minimumCount) && minimumCount >= 2)) throw new RangeError(`minimum count must be an integer of at least 2, got ${minimumCount}`);
  const step = nominalStep(timeMs);
  const expected = Number.isFinite(step) ? (backgroundRate * windowMs) / step : 0;
  const threshold = Math.max(minimumCount, Math.ceil(expected + 4 * Math.sqrt(expected)));
  const lastTimeMs = timeMs.length > 0 ? (timeMs[timeMs.length - 1] as number) : 0;
  const alerts: InstrumentAlert[] = [];

  for (const role of ROLES) {
    const flags = outliers[role];
    const times: number[] = [];
    for (let index = 0; index < flags.length; index += 1) if (flags[index] === 1) times.push(timeMs[index] as number);
    if (times.length < threshold) continue;
    const marked = new Uint8Array(times.length);
    let first = 0;
    for (let last = 0; last < times.length; last += 1) {
      while ((times[first] as number) <= (times[last] as number) - windowMs) first += 1;
      if (last - first + 1 >= threshold) marked.fill(1, first, last + 1);
    }
    let episodeStart = -1;
    let episodeEnd = -1;
    let episodeCount = 0;
    const emit = (): void => {
      const startMs = times[episodeStart] as number;
      const endOutlierMs = times[episodeEnd] as number;
      let inLastWindow = 0;
      for (const time of times) if (time > lastTimeMs - windowMs) inLastWindow += 1;
      const open = inLastWindow >= threshold && endOutlierMs > lastTimeMs - windowMs;
      let detectedIndex = episodeStart;
      for (let probe = episodeStart; probe <= episodeEnd; probe += 1) {
        if (probe - episodeStart + 1 >= threshold) {
          detectedIndex = probe;
          break;
        }
      }
      alerts.push({
        role,
        instrumentTag: instrumentTag(model, role),
        kind: "spikes",
        startMs,
        endMs: open ? null : endOutlierMs + (Number.isFinite(step) ? step : 0),
        detectedMs: times[detectedIndex] as number,
        size: episodeCount,
        sizeUnit: "count",
        evidence:
          `${episodeCount} Hampel outliers on ${role} between ${formatInstant(startMs)} and ${formatInstant(endOutlierMs)} ` +
          `(threshold ${threshold} within any ${(windowMs / DAY_MS).toPrecision(3)} days)` +
          (open ? "; still spiking at the end of the data" : ""),
      });
    };
    for (let index = 0; index < times.length; index += 1) {
      if (marked[index] !== 1) continue;
      if (episodeStart >= 0 && (times[index] as number) - (times[episodeEnd] as number) >= windowMs) {
        emit();
        episodeStart = -1;
      }
      if (episodeStart < 0) {
        episodeStart = index;
        episodeCount = 0;
      }
      episodeEnd = index;
      episodeCount += 1;
    }
    if (episodeStart >= 0) emit();
  }
  return alerts.sort((a, b) => a.startMs - b.startMs);
}
