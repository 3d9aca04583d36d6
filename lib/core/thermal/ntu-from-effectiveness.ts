import {
  CROSSFLOW_UNMIXED_MAXIMUM_NTU,
  crossflowUnmixedEffectiveness,
} from "./crossflow-unmixed-effectiveness";
import { ThermalInputError } from "./errors";
import { describeFlowKind, checkFlowKind, type CheckedFlowKind } from "./flow-kind-checks";
import { findRoot } from "./find-root";
import { requireCapacityRatio, requireNonNegative } from "./input-checks";
import { maximumEffectiveness } from "./maximum-effectiveness";
import { expm1OverX, log1pOverX } from "./stable-functions";
import type { FlowKind } from "./types";

/** Counterflow NTU = ln[(1 − ε·Cr)/(1 − ε)]/(1 − Cr), evaluated as (ε/(1 − ε))·ln(1 + z)/z with z = ε(1 − Cr)/(1 − ε); Cr = 1: ε/(1 − ε). */
export function counterflowNTU(effectiveness: number, capacityRatio: number): number {
  const odds = effectiveness / (1 - effectiveness);
  return odds * log1pOverX(odds * (1 - capacityRatio));
}

/**
 * 1 shell, 2n tube passes: NTU₁ = −(1 + Cr²)^(−1/2)·ln[(E − 1)/(E + 1)], E = [2/ε₁ − (1 + Cr)]/√(1 + Cr²),
 * evaluated as NTU₁ = (2/√(1 + Cr²))·atanh(1/E), 1/E = √(1 + Cr²)·ε₁/(2 − (1 + Cr)·ε₁) (identical, since
 * ln[(E + 1)/(E − 1)] = 2·atanh(1/E), and exact at ε₁ → 0).
 */
function oneShellNTU(oneShell: number, capacityRatio: number): number {
  const root = Math.sqrt(1 + capacityRatio * capacityRatio);
  const inverseE = (root * oneShell) / (2 - (1 + capacityRatio) * oneShell);
  return (2 / root) * Math.atanh(inverseE);
}

/**
 * Per-shell effectiveness of N shells in series: F = [(ε·Cr − 1)/(ε − 1)]^(1/N), ε₁ = (F − 1)/(F − Cr),
 * evaluated as ε₁ = m/(m + 1) with m = (F − 1)/(1 − Cr), finite at Cr = 1 (m = ε/(N(1 − ε))).
 */
function oneShellFromSeries(effectiveness: number, capacityRatio: number, shells: number): number {
  if (shells === 1) {
    return effectiveness;
  }
  const odds = effectiveness / (1 - effectiveness);
  const seriesRatioMinusOne = odds * (1 - capacityRatio); // (1 − εCr)/(1 − ε) − 1
  const logShellRatio = Math.log1p(seriesRatioMinusOne) / shells; // ln F
  const term = (expm1OverX(logShellRatio) * odds * log1pOverX(seriesRatioMinusOne)) / shells; // (F − 1)/(1 − Cr)
  return term / (term + 1);
}

/** Bracketed Brent solve of crossflowUnmixedEffectiveness(NTU, Cr) = ε. */
function crossflowUnmixedNTU(effectiveness: number, capacityRatio: number): number {
  // ε(NTU, Cr) ≤ ε(NTU, 0) = 1 − e^(−NTU), so the root is at least −ln(1 − ε).
  const lower = -Math.log1p(-effectiveness);
  if (capacityRatio === 0) {
    return lower;
  }
  const residual = (ntu: number): number => crossflowUnmixedEffectiveness(ntu, capacityRatio) - effectiveness;
  if (residual(lower) >= 0) {
    // Cr·NTU negligible: the Cr = 0 root is the answer to within rounding.
    return lower;
  }
  let upper = 2 * lower;
  while (residual(upper) < 0) {
    if (upper >= CROSSFLOW_UNMIXED_MAXIMUM_NTU) {
      throw new ThermalInputError(
        "effectiveness",
        effectiveness,
        "out-of-range",
        `effectiveness ${effectiveness} for unmixed crossflow at capacity ratio ${capacityRatio} needs NTU above ${CROSSFLOW_UNMIXED_MAXIMUM_NTU}, beyond the supported range`,
      );
    }
    upper = Math.min(upper * 2, CROSSFLOW_UNMIXED_MAXIMUM_NTU);
  }
  return findRoot(residual, lower, upper);
}

function solve(effectiveness: number, capacityRatio: number, flow: CheckedFlowKind): number {
  switch (flow.kind) {
    case "counterflow":
      return counterflowNTU(effectiveness, capacityRatio);
    case "parallel": {
      // NTU = −ln[1 − ε(1 + Cr)]/(1 + Cr)
      const sum = 1 + capacityRatio;
      return -Math.log1p(-effectiveness * sum) / sum;
    }
    case "shells": {
      const oneShell = oneShellFromSeries(effectiveness, capacityRatio, flow.shells);
      return flow.shells * oneShellNTU(oneShell, capacityRatio);
    }
    case "crossflow-unmixed":
      return crossflowUnmixedNTU(effectiveness, capacityRatio);
    case "crossflow-cmax-mixed": {
      // NTU = −ln[1 + (1/Cr)·ln(1 − ε·Cr)]: unmixedPart = 1 − e^(−NTU) = −ln(1 − Cr·ε)/Cr = ε·ln(1 − x)/(−x), x = Cr·ε
      const unmixedPart = effectiveness * log1pOverX(-capacityRatio * effectiveness);
      return -Math.log1p(-unmixedPart);
    }
    case "crossflow-cmin-mixed": {
      // NTU = −(1/Cr)·ln[1 + Cr·ln(1 − ε)]: mixedPart = −ln(1 − ε), NTU = −ln(1 − x)/Cr = mixedPart·ln(1 − x)/(−x), x = Cr·mixedPart
      const mixedPart = -Math.log1p(-effectiveness);
      return mixedPart * log1pOverX(-capacityRatio * mixedPart);
    }
  }
}

/**
 * Number of transfer units needed for an effectiveness: the inverse of effectivenessFromNTU.
 *
 * Formula (closed forms): counterflow NTU = ln[(ε − 1)/(ε·Cr − 1)]/(Cr − 1), Cr = 1: ε/(1 − ε);
 * parallel NTU = −ln[1 − ε(1 + Cr)]/(1 + Cr); 1 shell NTU₁ = −(1 + Cr²)^(−1/2)·ln[(E − 1)/(E + 1)],
 * E = [2/ε₁ − (1 + Cr)]/(1 + Cr²)^(1/2); N shells F = [(ε·Cr − 1)/(ε − 1)]^(1/N), ε₁ = (F − 1)/(F − Cr), NTU = N·NTU₁;
 * Cmax mixed NTU = −ln[1 + (1/Cr)·ln(1 − ε·Cr)]; Cmin mixed NTU = −(1/Cr)·ln[Cr·ln(1 − ε) + 1];
 * Cr = 0: NTU = −ln(1 − ε). Unmixed crossflow has no closed form: Brent's method on the exact series,
 * bracketed below by −ln(1 − ε) and above by doubling, to machine precision.
 * Valid: 0 ≤ ε < maximumEffectiveness(Cr, flow), 0 ≤ Cr ≤ 1.
 * Source: Incropera et al. (2007), Fundamentals of Heat and Mass Transfer, 6th ed., Table 11.4 (the 1-shell and
 * N-shell forms verified as quoted in the docstring of CalebBell/ht hx.py NTU_from_effectiveness, which cites it).
 *
 * @param effectiveness ε, 0 ≤ ε < limit
 * @param capacityRatio Cmin/Cmax, 0 … 1
 * @param flow flow kind relative to Cmin
 * @returns NTU ≥ 0
 * @throws ThermalInputError "exceeds-limit" when ε ≥ the limit for the flow kind at this Cr (message gives the
 *   limit); "negative", "not-finite", "out-of-range" for other bad input
 * @example ntuFromEffectiveness(0.9, 1, "counterflow") // 9
 */
export function ntuFromEffectiveness(effectiveness: number, capacityRatio: number, flow: FlowKind): number {
  requireNonNegative(effectiveness, "effectiveness", "");
  requireCapacityRatio(capacityRatio);
  const checked = checkFlowKind(flow);
  const limit = maximumEffectiveness(capacityRatio, flow);
  if (effectiveness >= limit) {
    throw new ThermalInputError(
      "effectiveness",
      effectiveness,
      "exceeds-limit",
      `effectiveness must be below ${limit} (the infinite-area limit for ${describeFlowKind(checked)} at capacity ratio ${capacityRatio}), got ${effectiveness}`,
    );
  }
  if (effectiveness === 0) {
    return 0;
  }
  const ntu = solve(effectiveness, capacityRatio, checked);
  if (!Number.isFinite(ntu)) {
    // Within rounding of the limit the closed forms reach ln 0 or atanh 1.
    throw new ThermalInputError(
      "effectiveness",
      effectiveness,
      "exceeds-limit",
      `effectiveness must be below ${limit} (the infinite-area limit for ${describeFlowKind(checked)} at capacity ratio ${capacityRatio}), got ${effectiveness}, which is within rounding of it`,
    );
  }
  return ntu;
}
