import { requirePositive } from "./input-checks";

/** Below this relative spread (ΔA − ΔB)/ΔB the series branch is used. */
const SERIES_THRESHOLD = 1e-3;

/**
 * Log-mean of two positive temperature differences, symmetric in its arguments and safe when they are equal.
 *
 * Formula: LMTD = (ΔA − ΔB)/ln(ΔA/ΔB), limit ΔA as ΔA → ΔB.
 * Valid: ΔA > 0, ΔB > 0 (K or any consistent unit of temperature difference).
 * Source: Incropera, DeWitt, Bergman & Lavine (2007), Fundamentals of Heat and Mass Transfer, 6th ed.,
 * Sect. 11.3.1, Eq. 11.15 (from memory). Near ΔA = ΔB, with z = (ΔA − ΔB)/ΔB ≥ 0 (smaller difference below):
 * LMTD = ΔB·z/ln(1 + z) = ΔB·(1 + z/2 − z²/12 + z³/24 − 19z⁴/720 + 3z⁵/160 − …), the Gregory coefficients
 * (OEIS A002206/A002207); truncation error below 1e-17 relative for z < 1e-3.
 *
 * @param deltaAK temperature difference at one end, K, positive
 * @param deltaBK temperature difference at the other end, K, positive
 * @returns log-mean temperature difference, K, between min and max of the two
 * @throws ThermalInputError "not-finite" or "non-positive" (message names the terminal difference)
 * @example logMeanTemperatureDifference(40, 20) // 28.853900817779268
 */
export function logMeanTemperatureDifference(deltaAK: number, deltaBK: number): number {
  requirePositive(deltaAK, "terminal temperature difference A", "K");
  requirePositive(deltaBK, "terminal temperature difference B", "K");
  const larger = Math.max(deltaAK, deltaBK);
  const smaller = Math.min(deltaAK, deltaBK);
  const spread = (larger - smaller) / smaller;
  if (spread < SERIES_THRESHOLD) {
    const series =
      1 +
      spread *
        (1 / 2 +
          spread * (-1 / 12 + spread * (1 / 24 + spread * (-19 / 720 + spread * (3 / 160)))));
    return smaller * series;
  }
  return (smaller * spread) / Math.log1p(spread);
}
