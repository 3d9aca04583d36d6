/**
 * Data reconciliation and gross-error tests: linear (Kuehn & Davidson 1961) and the exchanger energy balance by
 * successive linearisation, with the global test and the Šidák-adjusted measurement test (Mah & Tamhane 1982).
 */
export type { GrossErrorTests, LinearReconciliation } from "./types";
export { reconcileLinear, type LinearReconciliationInput } from "./reconcile-linear";
export { reconcileExchanger, type ExchangerReconciliation, type ExchangerReconciliationInput } from "./reconcile-exchanger";
export { exchangerBalance, type ExchangerBalance } from "./exchanger-balance";
export { grossErrorTests, type GrossErrorTestInput } from "./gross-error-tests";
export { criticalValuesFor, type CriticalValues } from "./critical-values-for";
export { operatingPointVector, OPERATING_POINT_KEYS } from "./operating-point-vector";
export { operatingPointFromVector } from "./operating-point-from-vector";
export { invertPositiveDefinite } from "./invert-positive-definite";
export { complementaryErrorFunction } from "./complementary-error-function";
export { standardNormalCdf } from "./standard-normal-cdf";
export { standardNormalQuantile } from "./standard-normal-quantile";
export { regularizedLowerGamma } from "./regularized-lower-gamma";
export { chiSquareQuantile } from "./chi-square-quantile";
export { sidakLevel } from "./sidak-level";
