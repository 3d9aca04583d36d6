import { chiSquareQuantile } from "./chi-square-quantile";
import { sidakLevel } from "./sidak-level";
import { standardNormalQuantile } from "./standard-normal-quantile";

/** The critical values of the global and measurement tests for one α, m constraints and n tested measurements. */
export interface CriticalValues {
  /** χ²_(1−α)(m). */
  globalTestCritical: number;
  /** β = 1 − (1 − α)^(1/n). */
  sidakLevel: number;
  /** Φ⁻¹(1 − β/2). */
  measurementTestCritical: number;
}

/**
 * criticalValuesFor: critical values of the global test (χ²_(1−α)(m)) and of the Šidák-adjusted two-sided
 * measurement test (Φ⁻¹(1 − β/2), β = 1 − (1 − α)^(1/n)).
 * Source: Mah & Tamhane (1982), AIChE J. 28(5):828–830; Šidák (1967); FIELD-NOTES §6 (α = 0.05, m = 1, n = 3 →
 * 3.8415, β = 0.016952, 2.3877).
 *
 * @throws RangeError for α outside (0, 1), m ≤ 0 or n < 1.
 * @example criticalValuesFor(0.05, 1, 3).measurementTestCritical // 2.3877
 */
export function criticalValuesFor(alpha: number, degreesOfFreedom: number, tested: number): CriticalValues {
  const level = sidakLevel(alpha, tested);
  return {
    globalTestCritical: chiSquareQuantile(1 - alpha, degreesOfFreedom),
    sidakLevel: level,
    measurementTestCritical: standardNormalQuantile(1 - level / 2),
  };
}
