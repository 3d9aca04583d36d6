import { medianValue } from "./median-value";
import type { ReadingColumns } from "./types";

/** Options of {@link inServiceFlags}; defaults in brackets. */
export interface InServiceOptions {
  /** In service when both flows are above this fraction of their reference flow [0.3]. */
  minimumFlowFraction?: number;
  /** Reference flows, kg/s [the median of each meter's positive readings]. */
  referenceFlows?: { hotKgPerS: number; coldKgPerS: number };
}

function positiveMedian(values: Float64Array): number {
  return medianValue(values.filter((value) => value > 0));
}

/**
 * inServiceFlags: 1 where both streams flow at a meaningful rate, 0 where the exchanger is shut down, bypassed or
 * isolated for cleaning (a flow at or below minimumFlowFraction of its reference) or a flow is missing.
 *
 * Rule: in service ⇔ m_h > f·m_h,ref and m_c > f·m_c,ref. A shut-down exchanger can look perfectly "steady" to the
 * R statistic (flows parked at a low value), so steady-state identification needs this check beside it.
 * Source: common practice (a minimum-throughput filter before performance monitoring); f = 0.3 is a choice: well
 * below the turndown of normal operation (≈ 0.5–0.7) and well above a blocked-in or recirculating flow.
 *
 * @param columns readings; not modified.
 * @param options fraction f in (0, 1) and reference flows.
 */
export function inServiceFlags(columns: ReadingColumns, options: InServiceOptions = {}): Uint8Array {
  const fraction = options.minimumFlowFraction ?? 0.3;
  if (!(fraction >= 0 && fraction < 1)) throw new RangeError(`minimum flow fraction must be in [0, 1), got ${fraction}`);
  const hotReference = options.referenceFlows?.hotKgPerS ?? positiveMedian(columns.hotFlowKgPerS);
  const coldReference = options.referenceFlows?.coldKgPerS ?? positiveMedian(columns.coldFlowKgPerS);
  const count = columns.timeMs.length;
  const flags = new Uint8Array(count);
  for (let index = 0; index < count; index += 1) {
    if ((columns.hotFlowKgPerS[index] as number) > fraction * hotReference && (columns.coldFlowKgPerS[index] as number) > fraction * coldReference) {
      flags[index] = 1;
    }
  }
  return flags;
}
