import { expm1OverX, log1pOverX } from "./stable-functions";

/*
 * Closed-form effectiveness relations of Incropera et al. (2007), 6th ed., Table 11.3, rearranged with
 * expm1/log1p/tanh so that they stay accurate and continuous at Cr = 0, Cr = 1 and NTU = 0.
 * Inputs are assumed checked (NTU ≥ 0, 0 ≤ Cr ≤ 1, shells a whole number ≥ 1).
 */

/**
 * Counterflow: ε = [1 − e^(−NTU(1−Cr))]/[1 − Cr·e^(−NTU(1−Cr))], evaluated as reduced/(1 + Cr·reduced) with
 * reduced = [1 − e^(−NTU(1−Cr))]/(1 − Cr) = NTU·(1 − e^(−a))/a, a = NTU(1 − Cr); at Cr = 1 this is NTU/(1 + NTU).
 */
export function counterflowEffectiveness(ntu: number, capacityRatio: number): number {
  const exponent = ntu * (1 - capacityRatio);
  const reduced = ntu * expm1OverX(-exponent);
  return reduced / (1 + capacityRatio * reduced);
}

/**
 * One shell, 2n tube passes: ε₁ = 2/(1 + Cr + s·coth(NTU·s/2)), s = √(1 + Cr²) (coth(y) = (1 + e^(−2y))/(1 − e^(−2y))),
 * evaluated as 2·tanh(y)/((1 + Cr)·tanh(y) + s), y = NTU·s/2, which is exact at NTU = 0.
 */
export function oneShellEffectiveness(ntu: number, capacityRatio: number): number {
  const root = Math.sqrt(1 + capacityRatio * capacityRatio);
  const tangent = Math.tanh((ntu * root) / 2);
  return (2 * tangent) / ((1 + capacityRatio) * tangent + root);
}

/**
 * N identical shells in series from the per-shell effectiveness ε₁:
 * ε = (φ^N − 1)/(φ^N − Cr), φ = (1 − ε₁Cr)/(1 − ε₁), evaluated as term/(term + 1) with term = (φ^N − 1)/(1 − Cr),
 * which stays finite at Cr = 1 (term = N·ε₁/(1 − ε₁), giving ε = N·ε₁/(1 + (N − 1)·ε₁)).
 */
export function seriesShellsEffectiveness(oneShell: number, capacityRatio: number, shells: number): number {
  if (shells === 1) {
    return oneShell;
  }
  if (capacityRatio === 0) {
    // φ = 1/(1 − ε₁): ε = 1 − (1 − ε₁)^N
    return -Math.expm1(shells * Math.log1p(-oneShell));
  }
  const odds = oneShell / (1 - oneShell);
  const phiMinusOne = odds * (1 - capacityRatio);
  const logPhiPower = shells * Math.log1p(phiMinusOne);
  const term = expm1OverX(logPhiPower) * shells * odds * log1pOverX(phiMinusOne);
  // φ^N beyond the double range: ε = 1 − (1 − Cr)/(φ^N − Cr) rounds to 1.
  return Number.isFinite(term) ? term / (term + 1) : 1;
}
