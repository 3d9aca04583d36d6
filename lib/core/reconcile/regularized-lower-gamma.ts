import { gammaln } from "simple-statistics";

const TINY = 1e-300;

/**
 * regularizedLowerGamma: P(a, x) = γ(a, x)/Γ(a), the regularized lower incomplete gamma function.
 *
 * Formula: x < a + 1: P = e^(−x + a·ln x − lnΓ(a))·Σ_(n≥0) xⁿ/(a(a+1)···(a+n)); otherwise P = 1 − Q with
 * Q = e^(−x + a·ln x − lnΓ(a))·1/(x + 1 − a − 1·(1 − a)/(x + 3 − a − 2·(2 − a)/(x + 5 − a − …))) by modified Lentz.
 * Valid: a > 0, x ≥ 0; relative accuracy about 1e-14. lnΓ from simple-statistics' gammaln (Lanczos).
 * Source: Press, Teukolsky, Vetterling & Flannery (2007), Numerical Recipes 3rd ed., Sect. 6.2, Eqs. 6.2.5 and 6.2.7;
 * Abramowitz & Stegun (1964), Eq. 6.5.29 (from memory).
 *
 * @throws RangeError for a ≤ 0 or x < 0.
 * @example regularizedLowerGamma(0.5, 1.92072941) // 0.95 (so χ²₀.₉₅(1) = 3.8415)
 */
export function regularizedLowerGamma(a: number, x: number): number {
  if (!(a > 0)) throw new RangeError(`shape must be positive, got ${a}`);
  if (!(x >= 0)) throw new RangeError(`argument must not be negative, got ${x}`);
  if (x === 0) return 0;
  if (x === Number.POSITIVE_INFINITY) return 1;
  const logPrefactor = -x + a * Math.log(x) - gammaln(a);
  if (x < a + 1) {
    let term = 1 / a;
    let sum = term;
    for (let n = 1; n < 1000; n += 1) {
      term *= x / (a + n);
      sum += term;
      if (Math.abs(term) < Math.abs(sum) * 1e-16) break;
    }
    return Math.min(1, sum * Math.exp(logPrefactor));
  }
  let b = x + 1 - a;
  let c = 1 / TINY;
  let d = 1 / b;
  let fraction = d;
  for (let n = 1; n < 1000; n += 1) {
    const an = -n * (n - a);
    b += 2;
    d = an * d + b;
    if (Math.abs(d) < TINY) d = TINY;
    c = b + an / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    const delta = d * c;
    fraction *= delta;
    if (Math.abs(delta - 1) < 1e-16) break;
  }
  return Math.max(0, 1 - Math.exp(logPrefactor) * fraction);
}
