import { referenceDuty } from "./reference-duty";
import type { CleanCoefficientParameters, ExchangerSpec } from "./types";

/** Chebyshev points used on the fouling range (enough for the smooth duty curve to reach ~1e-12 relative). */
const CURVE_NODES = 32;
/** Largest relative interpolation error accepted at the check points; above it every value is rated directly. */
const CURVE_RELATIVE_TOLERANCE = 1e-10;

/**
 * referenceDutyCurve: a fast stand-in for referenceDuty over a known fouling range, for long simulations.
 *
 * The duty at reference conditions is a smooth, monotone function of Rf. It is rated with referenceDuty (the
 * thermal core's `rate`) at Chebyshev points of the second kind, x_j = cos(jπ/n), on [lowRf, highRf] and
 * evaluated by barycentric Lagrange interpolation with weights (−1)^j, halved at both ends
 * (Berrut & Trefethen 2004, SIAM Review 46(3):501–517, eq. 5.3). The interpolant is checked against direct
 * rating halfway between neighbouring nodes; if any relative error exceeds 1e-10 the curve falls back to
 * rating every value directly. Values outside the range are always rated directly.
 *
 * @param spec exchanger spec.
 * @param cleanCoefficient true clean-U parameters.
 * @param lowRf lowest fouling resistance to be asked for, m²·K/W.
 * @param highRf highest, m²·K/W.
 * @returns a function of Rf giving the duty at reference conditions, W.
 */
export function referenceDutyCurve(
  spec: ExchangerSpec,
  cleanCoefficient: CleanCoefficientParameters,
  lowRf: number,
  highRf: number,
): (foulingM2KPerW: number) => number {
  const direct = (fouling: number): number => referenceDuty(spec, cleanCoefficient, fouling);
  if (!(highRf - lowRf > 1e-12 * Math.max(1e-6, Math.abs(highRf)))) return direct;

  const middle = 0.5 * (lowRf + highRf);
  const halfWidth = 0.5 * (highRf - lowRf);
  const nodes = new Float64Array(CURVE_NODES + 1);
  const values = new Float64Array(CURVE_NODES + 1);
  const weights = new Float64Array(CURVE_NODES + 1);
  for (let index = 0; index <= CURVE_NODES; index += 1) {
    nodes[index] = middle + halfWidth * Math.cos((index * Math.PI) / CURVE_NODES);
    values[index] = direct(nodes[index] as number);
    weights[index] = (index % 2 === 0 ? 1 : -1) * (index === 0 || index === CURVE_NODES ? 0.5 : 1);
  }

  const interpolate = (fouling: number): number => {
    let numerator = 0;
    let denominator = 0;
    for (let index = 0; index <= CURVE_NODES; index += 1) {
      const difference = fouling - (nodes[index] as number);
      if (difference === 0) return values[index] as number;
      const term = (weights[index] as number) / difference;
      numerator += term * (values[index] as number);
      denominator += term;
    }
    return numerator / denominator;
  };

  for (let index = 0; index < CURVE_NODES; index += 1) {
    const check = 0.5 * ((nodes[index] as number) + (nodes[index + 1] as number));
    const exact = direct(check);
    if (Math.abs(interpolate(check) - exact) > CURVE_RELATIVE_TOLERANCE * Math.abs(exact)) return direct;
  }
  return (fouling: number) => (fouling >= lowRf && fouling <= highRf ? interpolate(fouling) : direct(fouling));
}
