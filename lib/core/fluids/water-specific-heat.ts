import { waterSaturationPressure } from "./water-saturation-pressure";

/**
 * Isobaric specific heat of liquid water, IAPWS-IF97 Region 1.
 *
 * Formula: γ(π, τ) = Σ nᵢ (7.1 − π)^Iᵢ (τ − 1.222)^Jᵢ with π = p/16.53 MPa, τ = 1386 K/T;
 * cp = −R·τ²·γ_ττ, R = 0.461526 kJ/(kg·K).
 * Valid: 273.15 K ≤ T ≤ 623.15 K and p_sat(T) ≤ p ≤ 100 MPa (compressed or saturated liquid).
 * Source: IAPWS R7-97(2012), Eq. 7, Tables 2 and 4 (coefficients transcribed from memory; the tests check them
 * against the release's Table 5 values and against IAPWS-95 values computed with CoolProp).
 */
const REGION_1: ReadonlyArray<readonly [number, number, number]> = [
  [0, -2, 0.14632971213167], [0, -1, -0.84548187169114], [0, 0, -0.3756360367204e1], [0, 1, 0.33855169168385e1],
  [0, 2, -0.95791963387872], [0, 3, 0.15772038513228], [0, 4, -0.16616417199501e-1], [0, 5, 0.81214629983568e-3],
  [1, -9, 0.28319080123804e-3], [1, -7, -0.60706301565874e-3], [1, -1, -0.18990068218419e-1], [1, 0, -0.32529748770505e-1],
  [1, 1, -0.21841717175414e-1], [1, 3, -0.5283835796993e-4], [2, -3, -0.47184321073267e-3], [2, 0, -0.30001780793026e-3],
  [2, 1, 0.47661393906987e-4], [2, 3, -0.44141845330846e-5], [2, 17, -0.72694996297594e-15], [3, -4, -0.31679644845054e-4],
  [3, 0, -0.28270797985312e-5], [3, 6, -0.85205128120103e-9], [4, -5, -0.22425281908e-5], [4, -2, -0.65171222895601e-6],
  [4, 10, -0.14342945483302e-12], [5, -8, -0.40516996860117e-6], [8, -11, -0.12734301741641e-8], [8, -6, -0.17424871230634e-9],
  [21, -29, -0.68762131295531e-18], [23, -31, 0.14478307828521e-19], [29, -38, 0.26335781662795e-22],
  [30, -39, -0.11947622640071e-22], [31, -40, 0.18228094581404e-23], [32, -41, -0.93537087292458e-25],
];

/** Specific gas constant of water in IAPWS-IF97, J/(kg·K). */
const GAS_CONSTANT_J_PER_KG_K = 461.526;

/**
 * @param temperatureK 273.15 K to 623.15 K
 * @param pressurePa at or above the saturation pressure at T, at most 100 MPa
 * @returns cp, J/(kg·K)
 * @throws RangeError naming the temperature or pressure when outside the liquid region of Region 1
 * @example waterSpecificHeat(300, 3e6) // ≈ 4173.01
 */
export function waterSpecificHeat(temperatureK: number, pressurePa: number): number {
  if (!(temperatureK >= 273.15 && temperatureK <= 623.15)) {
    throw new RangeError(`liquid water specific heat (IAPWS-IF97 Region 1) needs 273.15 K ≤ T ≤ 623.15 K, got ${temperatureK} K`);
  }
  const saturation = waterSaturationPressure(temperatureK);
  if (!(pressurePa >= saturation && pressurePa <= 100e6)) {
    throw new RangeError(
      `water at ${temperatureK} K is liquid only at or above its saturation pressure ${saturation.toPrecision(6)} Pa (and at most 100 MPa), got ${pressurePa} Pa`,
    );
  }
  const pi = pressurePa / 16.53e6;
  const tau = 1386 / temperatureK;
  let gammaTauTau = 0;
  for (const [i, j, n] of REGION_1) {
    gammaTauTau += n * (7.1 - pi) ** i * j * (j - 1) * (tau - 1.222) ** (j - 2);
  }
  return -GAS_CONSTANT_J_PER_KG_K * tau * tau * gammaTauTau;
}
