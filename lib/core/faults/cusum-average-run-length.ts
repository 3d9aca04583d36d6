/**
 * cusumAverageRunLength: Siegmund's approximation to the average run length of a two-sided tabular CUSUM on
 * standardised normal data with reference value k and decision interval h, for a mean shift δ (in σ).
 *
 * Formula: one-sided ARL(Δ) = (e^(−2Δb) + 2Δb − 1)/(2Δ²), b = h + 1.166, Δ = δ − k for the upper and −δ − k for
 * the lower CUSUM (ARL = b² at Δ = 0); two-sided 1/ARL = 1/ARL⁺ + 1/ARL⁻.
 * Valid: independent normal observations; within a few percent of exact values for h ≥ 3 (Montgomery 2009 quotes
 * ARL₀ = 465 for k = 0.5, h = 5; the approximation gives 469).
 * Source: Siegmund (1985), Sequential Analysis, Springer, Eq. 2.57; as used in Montgomery (2009), Introduction to
 * Statistical Quality Control, 6th ed., Sect. 9.1.4, Eq. 9.4 (from memory).
 *
 * @throws RangeError for k < 0 or h ≤ 0.
 * @example cusumAverageRunLength(0.5, 10, 0) // about 70 700 samples between false alarms
 */
export function cusumAverageRunLength(reference: number, decisionInterval: number, shift: number): number {
  if (!(reference >= 0)) throw new RangeError(`reference value must not be negative, got ${reference}`);
  if (!(decisionInterval > 0)) throw new RangeError(`decision interval must be positive, got ${decisionInterval}`);
  const b = decisionInterval + 1.166;
  const oneSided = (delta: number): number =>
    Math.abs(delta) < 1e-12 ? b * b : (Math.exp(-2 * delta * b) + 2 * delta * b - 1) / (2 * delta * delta);
  return 1 / (1 / oneSided(shift - reference) + 1 / oneSided(-shift - reference));
}
