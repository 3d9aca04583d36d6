import { glrStatistic } from "./glr-statistic";

const DAY_MS = 86_400_000;

/** Result of {@link classifyOffsetGrowth}. */
export interface OffsetGrowth {
  /** True when the ramp explains the window better than a constant offset by at least the margin. */
  drift: boolean;
  /** GLR statistic of a constant offset. */
  constantStatistic: number;
  /** GLR statistic of an offset growing linearly from the onset. */
  rampStatistic: number;
}

/**
 * classifyOffsetGrowth: drift or constant offset? Compares a constant b with a ramp b·(t − t₀)/day over a window.
 *
 * Formula: T_c = (Σq)²/Σa, T_r = (Σ Δt·q)²/Σ Δt²·a (a, q the per-sample GLR information and score of the named
 * instrument); drift ⇔ T_r − T_c ≥ margin. Both models have one parameter, so the difference is twice the
 * log-likelihood ratio between them.
 * Source: GLR (Narasimhan & Mah 1987) with a time-varying signature; margin a choice (6 ≈ a likelihood ratio of 20).
 *
 * @param timeMs sample times; onsetMs the start of the window; forms [a, q] per sample.
 */
export function classifyOffsetGrowth(timeMs: readonly number[], onsetMs: number, forms: readonly (readonly [number, number])[], margin: number): OffsetGrowth {
  let information = 0;
  let score = 0;
  let rampInformation = 0;
  let rampScore = 0;
  forms.forEach(([a, q], k) => {
    const ramp = ((timeMs[k] as number) - onsetMs) / DAY_MS;
    information += a;
    score += q;
    rampInformation += ramp * ramp * a;
    rampScore += ramp * q;
  });
  const constantStatistic = glrStatistic(score, information);
  const rampStatistic = glrStatistic(rampScore, rampInformation);
  return { drift: rampStatistic - constantStatistic >= margin, constantStatistic, rampStatistic };
}
