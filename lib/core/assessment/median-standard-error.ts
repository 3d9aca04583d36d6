import { medianOf } from "./median-of";

/** Consistency factor of the MAD for a normal distribution, 1/Φ⁻¹(0.75) (Rousseeuw & Croux 1993). */
const MAD_TO_SIGMA = 1.482602218505602;
/** Asymptotic efficiency factor of the median for normal data, sqrt(π/2). */
const MEDIAN_FACTOR = Math.sqrt(Math.PI / 2);

/**
 * medianStandardError: a robust standard error of a sample median.
 *
 * Formula: SE = sqrt(π/2)·σ̂/sqrt(n), σ̂ = 1.4826·MAD (normal-consistent median absolute deviation).
 * Valid: n ≥ 2, roughly normal scatter; independent values (serial correlation makes it optimistic).
 * Source: Kendall & Stuart (1977), The Advanced Theory of Statistics, vol. 1, Sect. 10.10 (variance of the median,
 * from memory); Rousseeuw & Croux (1993), J. Am. Stat. Assoc. 88:1273–1283 (MAD constant).
 *
 * @param values sample (not modified)
 * @returns the standard error, or null for fewer than two values
 */
export function medianStandardError(values: readonly number[]): number | null {
  if (values.length < 2) return null;
  const center = medianOf(values) as number;
  const mad = medianOf(values.map((value) => Math.abs(value - center))) as number;
  return (MEDIAN_FACTOR * MAD_TO_SIGMA * mad) / Math.sqrt(values.length);
}
