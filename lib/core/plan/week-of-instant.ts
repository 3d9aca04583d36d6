import { WEEK_MS } from "./constants";

/**
 * weekOfInstant: index of the planning week containing an instant, floor((t − start)/1 week); negative before the
 * horizon, >= W after it.
 *
 * @param horizonStartMs 00:00 UTC of the first planning day, epoch ms
 * @param instantMs epoch ms
 */
export function weekOfInstant(horizonStartMs: number, instantMs: number): number {
  return Math.floor((instantMs - horizonStartMs) / WEEK_MS);
}
