/**
 * covarianceStandardError: sqrt of a covariance diagonal entry, or null when it is missing or negative.
 *
 * @param covariance square matrix with null entries for non-estimable parameters
 * @param index diagonal index
 */
export function covarianceStandardError(covariance: (number | null)[][] | null, index: number): number | null {
  const entry = covariance?.[index]?.[index];
  return entry === null || entry === undefined || !(entry >= 0) ? null : Math.sqrt(entry);
}
