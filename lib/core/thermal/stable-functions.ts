/**
 * Small numerically stable building blocks. Each removes a removable singularity at zero so that the
 * closed-form heat-exchanger relations stay accurate near Cr = 1, NTU = 0, P = 0 and R = 1.
 * They rely on Math.log1p, Math.expm1, Math.tanh and Math.atanh (ECMAScript 2015; the standard leaves their accuracy
 * to the engine, and V8 uses fdlibm ports accurate to about 1 ulp).
 */

/** ln(1 + z)/z, with the limit 1 at z = 0. Valid for z > −1. */
export function log1pOverX(z: number): number {
  return z === 0 ? 1 : Math.log1p(z) / z;
}

/** (e^z − 1)/z (GSL calls it exprel), with the limit 1 at z = 0. */
export function expm1OverX(z: number): number {
  return z === 0 ? 1 : Math.expm1(z) / z;
}

/** tanh(z)/z, with the limit 1 at z = 0. */
export function tanhOverX(z: number): number {
  return z === 0 ? 1 : Math.tanh(z) / z;
}

/** z/atanh(z), with the limit 1 at z = 0. Valid for |z| < 1. */
export function xOverAtanh(z: number): number {
  return z === 0 ? 1 : z / Math.atanh(z);
}
