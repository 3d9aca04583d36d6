import { requirePositive } from "./input-checks";

/**
 * Fouling resistance from an observed (dirty) and a clean overall coefficient on the same area basis.
 *
 * Formula: R_f = 1/U_observed − 1/U_clean.
 * Valid: both U positive and referred to the same area; negative results (observed better than clean) are
 * returned as they are, since measurement noise produces them and callers may want to see it.
 * Source: Kern (1950), Process Heat Transfer, Ch. 6, dirt factor R_d = (U_C − U_D)/(U_C·U_D) (from memory);
 * Incropera et al. (2007), 6th ed., Sect. 11.2, Eq. 11.5 (from memory).
 *
 * @param observedUWPerM2K observed overall coefficient, W/(m²·K)
 * @param cleanUWPerM2K clean overall coefficient, W/(m²·K)
 * @returns fouling resistance, m²·K/W
 * @throws ThermalInputError "non-positive"/"not-finite" for either coefficient
 * @example foulingResistance(400, 500) // 5e-4
 */
export function foulingResistance(observedUWPerM2K: number, cleanUWPerM2K: number): number {
  requirePositive(observedUWPerM2K, "observed U", "W/(m²·K)");
  requirePositive(cleanUWPerM2K, "clean U", "W/(m²·K)");
  return 1 / observedUWPerM2K - 1 / cleanUWPerM2K;
}
