/** Largest lag-one autocorrelation used (beyond it the inflation factor explodes). */
export const MAXIMUM_AUTOCORRELATION = 0.95;

/**
 * varianceInflationFromAutocorrelation: how much AR(1) errors inflate the variance of an estimate, as n/n_eff.
 *
 * Formula: n_eff = n·(1 − ρ)/(1 + ρ), inflation = (1 + ρ)/(1 − ρ), with ρ clipped to [0, 0.95] (negative
 * correlation is not used to narrow a band).
 * Valid: errors approximately AR(1); the factor is exact for the variance of a mean and a common approximation for
 * regression coefficients and extrapolations.
 * Source: Wilks (2011), Statistical Methods in the Atmospheric Sciences, 3rd ed., Eq. 5.12 (effective sample size
 * under AR(1) persistence; from memory); Bayley & Hammersley (1946), J. R. Stat. Soc. Suppl. 8:184–197.
 *
 * @param autocorrelation ρ, or null (no inflation)
 * @returns factor ≥ 1
 */
export function varianceInflationFromAutocorrelation(autocorrelation: number | null): number {
  if (autocorrelation === null || !(autocorrelation > 0)) return 1;
  const rho = Math.min(MAXIMUM_AUTOCORRELATION, autocorrelation);
  return (1 + rho) / (1 - rho);
}
