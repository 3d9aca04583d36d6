/** Relative central-difference step ε^(1/3), which balances truncation and rounding error (from memory; Nocedal & Wright 2006, Sect. 8.1). */
const CENTRAL_STEP = Math.cbrt(Number.EPSILON);

/**
 * finiteDifferenceJacobian: ∂r/∂p by central differences, respecting bounds.
 *
 * Formula: J_ij ≈ (r_i(p + h_j e_j) − r_i(p − h_j e_j))/(2h_j), h_j = ε^(1/3)·(|p_j| or 1 when p_j = 0); next to a
 * bound the one-sided forward or backward difference with the same h_j is used instead.
 * Valid: r twice continuously differentiable near p; accuracy about ε^(2/3) relative for well-scaled p.
 * Source: Nocedal & Wright (2006), Numerical Optimization, 2nd ed., Sect. 8.1, Eqs. 8.1 and 8.7 (from memory).
 *
 * @param residuals r(p) (must not keep or modify its argument)
 * @param parameters p (not modified)
 * @param base r(p), already computed
 * @param lower lower bounds (same length as p)
 * @param upper upper bounds
 * @returns row-major m×n Jacobian and the number of residual evaluations spent
 */
export function finiteDifferenceJacobian(
  residuals: (parameters: Float64Array) => Float64Array,
  parameters: Float64Array,
  base: Float64Array,
  lower: Float64Array,
  upper: Float64Array,
): { jacobian: Float64Array; evaluations: number } {
  const rows = base.length;
  const columns = parameters.length;
  const jacobian = new Float64Array(rows * columns);
  let evaluations = 0;
  for (let j = 0; j < columns; j += 1) {
    const value = parameters[j] as number;
    const step = CENTRAL_STEP * (value !== 0 ? Math.abs(value) : 1);
    const canUp = value + step <= (upper[j] as number);
    const canDown = value - step >= (lower[j] as number);
    const shifted = Float64Array.from(parameters);
    let plus: Float64Array;
    let minus: Float64Array;
    let width: number;
    if (canUp && canDown) {
      shifted[j] = value + step;
      plus = residuals(shifted);
      shifted[j] = value - step;
      minus = residuals(shifted);
      width = 2 * step;
      evaluations += 2;
    } else if (canUp) {
      shifted[j] = value + step;
      plus = residuals(shifted);
      minus = base;
      width = step;
      evaluations += 1;
    } else {
      shifted[j] = value - step;
      plus = base;
      minus = residuals(shifted);
      width = step;
      evaluations += 1;
    }
    for (let i = 0; i < rows; i += 1) jacobian[i * columns + j] = ((plus[i] as number) - (minus[i] as number)) / width;
  }
  return { jacobian, evaluations };
}
