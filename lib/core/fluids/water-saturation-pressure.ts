/**
 * Saturation pressure of water, IAPWS-IF97 Region 4 (the saturation-pressure equation).
 *
 * Formula: ϑ = T + n9/(T − n10); A = ϑ² + n1ϑ + n2; B = n3ϑ² + n4ϑ + n5; C = n6ϑ² + n7ϑ + n8;
 * p_sat = [2C / (−B + √(B² − 4AC))]⁴ · 1 MPa.
 * Valid: 273.15 K ≤ T ≤ 647.096 K.
 * Source: IAPWS R7-97(2012), Revised Release on the IAPWS Industrial Formulation 1997, Eq. 30 and Table 34
 * (coefficients transcribed from memory; checked against the release's Table 35 values in the tests).
 */
const N = [
  0.11670521452767e4, -0.72421316703206e6, -0.17073846940092e2, 0.12020824702470e5, -0.32325550322333e7,
  0.14915108613530e2, -0.48232657361591e4, 0.40511340542057e6, -0.23855557567849, 0.65017534844798e3,
] as const;

export const WATER_TRIPLE_POINT_K = 273.16;
export const WATER_CRITICAL_TEMPERATURE_K = 647.096;

/**
 * @param temperatureK 273.15 K to 647.096 K
 * @returns saturation pressure, Pa
 * @throws RangeError outside the validity range
 * @example waterSaturationPressure(500) // 2.638897756e6
 */
export function waterSaturationPressure(temperatureK: number): number {
  if (!(temperatureK >= 273.15 && temperatureK <= WATER_CRITICAL_TEMPERATURE_K)) {
    throw new RangeError(`water saturation pressure is defined from 273.15 K to 647.096 K, got ${temperatureK} K`);
  }
  const [n1, n2, n3, n4, n5, n6, n7, n8, n9, n10] = N;
  const theta = temperatureK + n9 / (temperatureK - n10);
  const a = theta * theta + n1 * theta + n2;
  const b = n3 * theta * theta + n4 * theta + n5;
  const c = n6 * theta * theta + n7 * theta + n8;
  return (2 * c / (-b + Math.sqrt(b * b - 4 * a * c))) ** 4 * 1e6;
}
