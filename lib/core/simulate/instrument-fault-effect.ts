import type { PlannedFault } from "./types";

/** Whether a fault is in effect at timeMs (start inclusive, end exclusive; a null end never comes). */
export function faultActive(fault: PlannedFault, timeMs: number): boolean {
  return timeMs >= fault.startMs && (fault.endMs === null || timeMs < fault.endMs);
}

/**
 * instrumentFaultEffect: the reading of a faulty instrument, before noise-free spikes and gaps.
 *
 * drift: reading = value + size·min(1, (t − start)/ramp)   (linear drift then a constant offset)
 * bias:  reading = value + size
 * scale: reading = value·(1 + size)                         (calibration span error)
 * stuck: reading = the frozen value (the caller supplies it)
 *
 * @param fault the planned fault, active at timeMs.
 * @param timeMs epoch ms.
 * @param value the reading the healthy instrument would give (true value plus noise).
 * @param frozen the frozen reading for a stuck instrument.
 * @returns the faulty reading.
 */
export function instrumentFaultEffect(fault: PlannedFault, timeMs: number, value: number, frozen: number): number {
  switch (fault.kind) {
    case "drift": {
      const rampMs = fault.rampMs ?? 0;
      const progress = rampMs > 0 ? Math.min(1, (timeMs - fault.startMs) / rampMs) : 1;
      return value + fault.size * progress;
    }
    case "bias":
      return value + fault.size;
    case "scale":
      return value * (1 + fault.size);
    case "stuck":
      return frozen;
  }
}
