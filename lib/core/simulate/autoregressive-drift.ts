import type { SeededRandom } from "./seeded-random";
import type { RandomDrift } from "./types";

/**
 * autoregressiveDrift: a stationary first-order autoregressive (AR(1)) process sampled every step,
 * the discrete form of an Ornstein–Uhlenbeck process (Uhlenbeck & Ornstein 1930):
 * x_(k+1) = φ·x_k + σ·sqrt(1 − φ²)·z_k, φ = exp(−Δt/τ), z_k standard normal.
 * It starts from its stationary distribution N(0, σ²), so its standard deviation is σ at every step.
 *
 * @param random the stream to draw from (one normal per step, one at start).
 * @param drift σ (standardDeviation) and τ (correlationHours, > 0).
 * @param stepMs sampling interval, ms.
 * @returns a function giving the next value at each call (the first call gives the starting value).
 */
export function autoregressiveDrift(random: SeededRandom, drift: RandomDrift, stepMs: number): () => number {
  const phi = Math.exp(-stepMs / (drift.correlationHours * 3_600_000));
  const innovation = drift.standardDeviation * Math.sqrt(1 - phi * phi);
  let value = drift.standardDeviation * random.normal();
  let started = false;
  return () => {
    if (started) value = phi * value + innovation * random.normal();
    started = true;
    return value;
  };
}
