import { glrStatistic } from "./glr-statistic";

const DAY_MS = 86_400_000;

/**
 * rampStart: the most likely start of a linearly growing offset (a drift), by a least-squares change-point search.
 *
 * Formula: for each candidate start t₀, fit b(t) = β·max(0, t − t₀) by weighted least squares (β̂ = Σ(t − t₀)⁺q /
 * Σ((t − t₀)⁺)²a) and keep the t₀ with the largest statistic (Σ(t − t₀)⁺q)²/Σ((t − t₀)⁺)²a, i.e. the largest
 * likelihood under normal errors.
 * Source: maximum-likelihood change point of a segmented (broken-line) regression, Hinkley (1971), J. Am. Stat.
 * Assoc. 66:736–743 (from memory).
 *
 * @param timeMs sample times of the window; forms [a, q] per sample (information and score of the instrument).
 * @param candidates positions into timeMs to try as the start.
 * @returns the best position (the first candidate if none fits).
 */
export function rampStart(timeMs: readonly number[], forms: readonly (readonly [number, number])[], candidates: readonly number[]): number {
  let best = candidates[0] ?? 0;
  let bestStatistic = -1;
  for (const candidate of candidates) {
    const startMs = timeMs[candidate] as number;
    let information = 0;
    let score = 0;
    for (let k = 0; k < forms.length; k += 1) {
      const elapsed = ((timeMs[k] as number) - startMs) / DAY_MS;
      if (elapsed <= 0) continue;
      const [a, q] = forms[k] as readonly [number, number];
      information += elapsed * elapsed * a;
      score += elapsed * q;
    }
    const value = glrStatistic(score, information);
    if (value > bestStatistic) {
      bestStatistic = value;
      best = candidate;
    }
  }
  return best;
}
