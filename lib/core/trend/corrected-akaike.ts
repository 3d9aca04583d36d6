/**
 * correctedAkaike: small-sample corrected Akaike information criterion of a least-squares fit with Gaussian errors.
 *
 * Formula: AICc = n·ln(RSS/n) + 2K + 2K(K + 1)/(n − K − 1), K = p + 1 (the p model parameters and σ²).
 * Valid: n > K + 1 and RSS > 0 (otherwise null); only differences between models fitted to the same data mean anything.
 * Source: Hurvich & Tsai (1989), Biometrika 76(2):297–307; Burnham & Anderson (2002), Model Selection and Multimodel
 * Inference, 2nd ed., Eqs. 2.14 (AIC for least squares) and 2.20 (AICc) (from memory).
 *
 * @param residualSumOfSquares RSS (weighted if the fit was), > 0
 * @param observations n
 * @param parameters p, the number of fitted model parameters
 * @returns AICc, or null when undefined
 * @example correctedAkaike(2.4, 5, 2) // 5·ln(0.48) + 6 + 24/1 = 26.330…
 */
export function correctedAkaike(residualSumOfSquares: number, observations: number, parameters: number): number | null {
  const k = parameters + 1;
  const denominator = observations - k - 1;
  if (!(denominator > 0) || !(residualSumOfSquares > 0)) return null;
  return observations * Math.log(residualSumOfSquares / observations) + 2 * k + (2 * k * (k + 1)) / denominator;
}
