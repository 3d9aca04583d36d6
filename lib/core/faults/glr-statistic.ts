/**
 * glrStatistic: the GLR statistic T = S²/I of a candidate with accumulated score S = Σ sᵀΣ⁻¹ρ and information
 * I = Σ sᵀΣ⁻¹s (0 when I = 0). Under no fault T ~ χ²₁. Source: Narasimhan & Mah (1987), AIChE J. 33(9):1514–1521.
 */
export function glrStatistic(score: number, information: number): number {
  return information > 0 ? (score * score) / information : 0;
}
