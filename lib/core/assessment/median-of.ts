/**
 * medianOf: the sample median (mean of the two middle values for an even count).
 *
 * Source: definition (e.g. NIST/SEMATECH e-Handbook of Statistical Methods, Sect. 1.3.5.1, from memory).
 *
 * @param values any order (not modified)
 * @returns the median, or null for an empty list
 */
export function medianOf(values: readonly number[]): number | null {
  if (values.length === 0) return null;
  const sorted = [...values].sort((a, b) => a - b);
  const middle = sorted.length >> 1;
  return sorted.length % 2 === 1 ? (sorted[middle] as number) : 0.5 * ((sorted[middle - 1] as number) + (sorted[middle] as number));
}
