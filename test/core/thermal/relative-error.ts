/** |actual − expected|/|expected| (absolute error when expected is 0). Shared by the thermal tests. */
export function relativeError(actual: number, expected: number): number {
  return expected === 0 ? Math.abs(actual) : Math.abs(actual - expected) / Math.abs(expected);
}

/** Kelvin from degrees Celsius (exact offset 273.15, NIST SP 811 B.9). */
export function kelvin(celsius: number): number {
  return celsius + 273.15;
}
