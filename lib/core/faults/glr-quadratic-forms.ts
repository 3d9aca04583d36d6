import type { SampleEvidence } from "./sample-evidence";

/**
 * glrQuadraticForms: one sample's contribution to the GLR of fault candidate c: information sᵀΣ⁻¹s and score sᵀΣ⁻¹ρ.
 *
 * Formula: over a window, b̂ = Σ sᵀΣ⁻¹ρ / Σ sᵀΣ⁻¹s and T = (Σ sᵀΣ⁻¹ρ)²/Σ sᵀΣ⁻¹s (χ²₁ under no fault); a sample without
 * a rate residual contributes through the balance alone (Σ⁻¹ = diag(1/σ_g², 0)).
 * Source: Narasimhan & Mah (1987), AIChE J. 33(9):1514–1521, generalized likelihood ratio for a bias of known
 * direction (signature) and unknown magnitude.
 *
 * @param evidence the sample's residuals, covariance and signatures.
 * @param candidate index 0..5 (FAULT_CANDIDATES order).
 * @param balanceOnly use the energy-balance residual alone (Σ⁻¹ = diag(1/σ_g², 0)) [false].
 * @returns [information, score].
 */
export function glrQuadraticForms(evidence: SampleEvidence, candidate: number, balanceOnly = false): [number, number] {
  if (balanceOnly) {
    const s = evidence.signatures[2 * candidate] as number;
    return [(s * s) / evidence.balanceVariance, (s * evidence.balance) / evidence.balanceVariance];
  }
  const [i11, i12, i22] = evidence.inverseCovariance;
  const s1 = evidence.signatures[2 * candidate] as number;
  const s2 = evidence.signatures[2 * candidate + 1] as number;
  const rate = Number.isFinite(evidence.rate) ? evidence.rate : 0;
  const information = s1 * s1 * i11 + 2 * s1 * s2 * i12 + s2 * s2 * i22;
  const score = s1 * (i11 * evidence.balance + i12 * rate) + s2 * (i12 * evidence.balance + i22 * rate);
  return [information, score];
}
