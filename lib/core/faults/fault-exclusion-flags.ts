import type { AlertKind, InstrumentAlert } from "./types";

/** Options of {@link faultExclusionFlags}; defaults in brackets. */
export interface FaultExclusionOptions {
  /** Alert kinds whose samples are excluded ["drift", "bias", "scale", "stuck"]. */
  kinds?: readonly AlertKind[];
}

/** Result of {@link faultExclusionFlags}: the `fault` and `faultLabels` parts of SampleFlags. */
export interface FaultExclusion {
  /** 0 where no alert applies, k ≥ 1 where the alert labelled faultLabels[k − 1] applies. */
  fault: Uint16Array;
  /** One label per alert used, e.g. "coldOut drift". */
  faultLabels: string[];
}

/**
 * faultExclusionFlags: marks every sample from an alert's start to its end (exclusive), or to the end of the data
 * when the alert is open, so that screening counts it as "fault".
 *
 * Rule: sample i is faulted by alert a when a.startMs ≤ t_i < a.endMs (or a.endMs is null); where alerts overlap the
 * one that started first is recorded. "spikes" alerts are not excluded by default: their spikes are already Hampel
 * outliers, and the readings between the spikes are sound.
 *
 * @param timeMs sample times, sorted.
 * @param alerts instrument alerts; not modified.
 * @param options which kinds exclude samples.
 */
export function faultExclusionFlags(timeMs: Float64Array, alerts: readonly InstrumentAlert[], options: FaultExclusionOptions = {}): FaultExclusion {
  const kinds = new Set<AlertKind>(options.kinds ?? ["drift", "bias", "scale", "stuck"]);
  const used = alerts.filter((alert) => kinds.has(alert.kind)).sort((a, b) => a.startMs - b.startMs);
  if (used.length > 65_535) throw new RangeError("too many alerts for the fault labels (at most 65 535)");
  const fault = new Uint16Array(timeMs.length);
  const faultLabels: string[] = [];
  used.forEach((alert, position) => {
    faultLabels.push(`${alert.role} ${alert.kind}`);
    const label = position + 1;
    let low = 0;
    let high = timeMs.length;
    while (low < high) {
      const middle = (low + high) >> 1;
      if ((timeMs[middle] as number) < alert.startMs) low = middle + 1;
      else high = middle;
    }
    for (let index = low; index < timeMs.length; index += 1) {
      const time = timeMs[index] as number;
      if (alert.endMs !== null && time >= alert.endMs) break;
      if (fault[index] === 0) fault[index] = label;
    }
  });
  return { fault, faultLabels };
}
