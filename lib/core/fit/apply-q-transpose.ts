import type { QrDecomposition } from "./types";

/**
 * applyQTranspose: Qᵀ·b for the Q of a Householder QR factorisation, applying H_0, H_1, ... in turn.
 *
 * Formula: H_k·b = b − τ_k·v_k·(v_kᵀ·b), with v_k[k] = 1 and v_k zero above k.
 * Source: Golub & Van Loan (2013), Matrix Computations, 4th ed., Sect. 5.1.6 (applying Householder matrices).
 *
 * @param decomposition from householderQr
 * @param vector b, length m (not modified)
 * @returns Qᵀ·b, length m
 * @throws RangeError when the length is not m
 */
export function applyQTranspose(decomposition: QrDecomposition, vector: Float64Array | readonly number[]): Float64Array {
  const { rows, factors, scalars } = decomposition;
  if (vector.length !== rows) throw new RangeError(`applyQTranspose: need ${rows} values, got ${vector.length}`);
  const result = Float64Array.from(vector);
  for (let k = 0; k < scalars.length; k += 1) {
    const tau = scalars[k] as number;
    if (tau === 0) continue;
    const offset = k * rows;
    let dot = result[k] as number;
    for (let i = k + 1; i < rows; i += 1) dot += (factors[offset + i] as number) * (result[i] as number);
    dot *= tau;
    result[k] = (result[k] as number) - dot;
    for (let i = k + 1; i < rows; i += 1) result[i] = (result[i] as number) - dot * (factors[offset + i] as number);
  }
  return result;
}
