import { ThermalInputError } from "./errors";

/** Number of standard deviations (plus a fixed margin) beyond which a Poisson tail is treated as 0 or 1. */
const TAIL_STANDARD_DEVIATIONS = 20;
const TAIL_MARGIN = 40;

/**
 * Largest NTU accepted by the exact crossflow series. The work grows as √(Cr·NTU); at 1e8 a call sums about
 * 4e5 terms (a few milliseconds). For Cr = 1, ε(1e8) ≈ 1 − 1/√(π·1e8) ≈ 0.99994, far beyond practical exchangers.
 */
export const CROSSFLOW_UNMIXED_MAXIMUM_NTU = 1e8;

/** Below this Cr·NTU the Cr = 0 form is exact in double precision (the relative correction is O(Cr·NTU)). */
const NEGLIGIBLE_SMALLER_MEAN = 1e-100;

/** Where the Poisson(mean) distribution has non-negligible mass: [lowest, highest]. */
function poissonBulk(mean: number): { lowest: number; highest: number } {
  const spread = TAIL_STANDARD_DEVIATIONS * Math.sqrt(mean) + TAIL_MARGIN;
  return { lowest: Math.max(0, Math.floor(mean - spread)), highest: Math.ceil(mean + spread) };
}

/**
 * Upper tails U(n) = P(N > n), N ~ Poisson(mean), for n = from … to.
 * Needs `from` at or below the bulk of the distribution (from = 0 or from ≤ mean − 20√mean − 40), so that the
 * probabilities on [from, highest] can be normalised to sum to 1. Weights are built outwards from the mode by
 * the ratio recurrence p(m+1)/p(m) = mean/(m+1), which neither overflows nor loses the tail to cancellation, and
 * each tail is summed from the top (no 1 − CDF subtraction).
 */
function poissonUpperTails(mean: number, from: number, to: number): Float64Array {
  const highest = Math.max(to, poissonBulk(mean).highest);
  const size = highest - from + 1;
  const weights = new Float64Array(size);
  const mode = Math.min(Math.max(Math.floor(mean), from), highest);
  weights[mode - from] = 1;
  for (let count = mode + 1; count <= highest; count += 1) {
    weights[count - from] = (weights[count - 1 - from] ?? 0) * (mean / count);
  }
  for (let count = mode - 1; count >= from; count -= 1) {
    weights[count - from] = (weights[count + 1 - from] ?? 0) * ((count + 1) / mean);
  }
  let total = 0;
  for (let index = 0; index < size; index += 1) {
    total += weights[index] ?? 0;
  }
  const tails = new Float64Array(to - from + 1);
  let above = 0;
  for (let count = highest; count > from; count -= 1) {
    above += weights[count - from] ?? 0;
    // `above` now holds P(N ≥ count) = P(N > count − 1)
    if (count - 1 <= to) {
      tails[count - 1 - from] = above / total;
    }
  }
  return tails;
}

/**
 * Exact effectiveness of single-pass crossflow with both streams unmixed.
 *
 * Formula: ε = (1/(Cr·NTU))·Σ_{n≥0} [1 − e^(−NTU)·Σ_{m≤n} NTU^m/m!]·[1 − e^(−Cr·NTU)·Σ_{m≤n} (Cr·NTU)^m/m!],
 * i.e. Σ_n P(Poisson(NTU) > n)·P(Poisson(Cr·NTU) > n)/(Cr·NTU); ε = 1 − e^(−NTU) at Cr = 0.
 * Valid: 0 ≤ Cr ≤ 1, 0 ≤ NTU ≤ 1e8 (CROSSFLOW_UNMIXED_MAXIMUM_NTU); NTU → ∞ gives ε → 1 for every Cr.
 * Source: Mason (1954), "Heat transfer in cross flow", Proc. 2nd U.S. National Congress of Applied Mechanics,
 * pp. 801–803, series as tabulated in Shah & Sekulic (2003), Fundamentals of Heat Exchanger Design, Table 3.3
 * (both from memory). Equals the integral form of Triboix (2009), Int. Commun. Heat Mass Transfer 36(2):121–124,
 * to 40 digits at (NTU, Cr) = (5, 0.7) and (1, 0.5) (computed with mpmath).
 * Numerics: terms with n more than 20 standard deviations (+40) below Cr·NTU are 1 each and terms above
 * Cr·NTU + 20σ + 40 are 0, to within the neglected Poisson tails, which stay below 1e-76 (checked with mpmath for
 * means from 1e-6 to 1e6); only the window between is summed, so the work grows as √(Cr·NTU).
 */
export function crossflowUnmixedEffectiveness(ntu: number, capacityRatio: number): number {
  if (ntu > CROSSFLOW_UNMIXED_MAXIMUM_NTU) {
    throw new ThermalInputError(
      "NTU",
      ntu,
      "out-of-range",
      `NTU for unmixed crossflow must not exceed ${CROSSFLOW_UNMIXED_MAXIMUM_NTU}, got ${ntu}`,
    );
  }
  if (ntu === 0) {
    return 0;
  }
  const smallerMean = capacityRatio * ntu;
  if (smallerMean < NEGLIGIBLE_SMALLER_MEAN) {
    // ε = (1 − e^(−NTU))·(1 − O(Cr·NTU)): the correction is far below double precision, and the series would
    // otherwise divide subnormal numbers.
    return -Math.expm1(-ntu);
  }
  const largerMean = ntu;
  const window = poissonBulk(smallerMean);
  const from = window.lowest;
  const to = window.highest;
  const smallerTails = poissonUpperTails(smallerMean, from, to);
  const largerBulk = poissonBulk(largerMean);
  // Where the window lies wholly below the bulk of Poisson(NTU), its upper tails are 1.
  const largerTails = to < largerBulk.lowest ? undefined : poissonUpperTails(largerMean, from, to);
  // Terms below `from` contribute 1·1 each; the window is summed from its high end, where terms are smallest.
  let sum = 0;
  for (let order = to; order >= from; order -= 1) {
    const index = order - from;
    sum += (largerTails === undefined ? 1 : (largerTails[index] ?? 0)) * (smallerTails[index] ?? 0);
  }
  return Math.min(1, (from + sum) / smallerMean);
}
