import { ThermalInputError } from "./errors";
import { requireNonNegative, requireShellCount } from "./input-checks";
import { maximumEffectiveness } from "./maximum-effectiveness";
import { log1pOverX, tanhOverX, xOverAtanh } from "./stable-functions";

/**
 * The largest P (cold-side effectiveness) reachable with infinite area for given R and N shells:
 * P_limit = ε_max(R, N) for R ≤ 1, ε_max(1/R, N)/R for R > 1 (the hot side is then Cmin and ε = P·R).
 */
export function limitingEffectivenessP(R: number, shells: number): number {
  if (R <= 1) {
    return maximumEffectiveness(R, { shells });
  }
  return maximumEffectiveness(1 / R, { shells }) / R;
}

/**
 * LMTD correction factor F for N TEMA E shells in series, each with one shell pass and 2, 4, … tube passes.
 *
 * Formula (Fakheri 2003, general N): W = [(1 − P·R)/(1 − P)]^(1/N), S = √(R² + 1)/(R − 1),
 * F = S·ln W / ln[(1 + W − S + S·W)/(1 + W + S − S·W)]; for N = 1 this is Bowman, Mueller & Nagle (1940)
 * F = [√(R²+1)/(R−1)]·ln[(1−P)/(1−PR)] / ln{[2 − P(R+1−√(R²+1))]/[2 − P(R+1+√(R²+1))]};
 * at R = 1 (Fakheri): W′ = (N − N·P)/(N − N·P + P), F = √2·[(1 − W′)/W′] / ln{[W′/(1−W′) + 1/√2]/[W′/(1−W′) − 1/√2]}.
 * Evaluated in the identical form h = ln W/2, F = S·h / atanh(S·tanh h) (because (W − 1)/(W + 1) = tanh h), with
 * S·h = −√(R²+1)·P/(2N(1 − P))·ln(1 + x)/x, x = −P(R − 1)/(1 − P), which is continuous through R = 1
 * (S·h → −P/(√2·N(1 − P)), reproducing the R = 1 branch), P = 0 (F = 1) and R = 0 (F = 1).
 * Valid: 0 ≤ P < P_limit(R, N) (the log arguments positive), R ≥ 0, N ≥ 1 whole.
 * Source: Bowman, Mueller & Nagle (1940), Trans. ASME 62:283–294 (pages from memory); Fakheri (2003),
 * J. Heat Transfer 125(3):527–530; general form verified as coded in CalebBell/ht hx.py F_LMTD_Fakheri.
 *
 * @param input.P cold-side thermal effectiveness (t_co − t_ci)/(T_hi − t_ci)
 * @param input.R capacity ratio (T_hi − T_ho)/(t_co − t_ci) = C_cold/C_hot
 * @param input.shells number of shells in series
 * @returns F, 0 < F ≤ 1
 * @throws ThermalInputError "temperature-cross" when P ≥ P_limit (message names the limit); "negative",
 *   "not-finite", "out-of-range" (P ≥ 1 or a bad shell count)
 * @example shellAndTubeCorrectionFactor({ P: 0.5, R: 1, shells: 1 }) // 0.80228
 */
export function shellAndTubeCorrectionFactor(input: { P: number; R: number; shells: number }): number {
  const P = requireNonNegative(input.P, "thermal effectiveness P", "");
  const R = requireNonNegative(input.R, "capacity ratio R", "");
  const shells = requireShellCount(input.shells);
  if (P >= 1) {
    throw new ThermalInputError(
      "thermal effectiveness P",
      P,
      "out-of-range",
      `thermal effectiveness P must be below 1, got ${P}`,
    );
  }
  const limit = limitingEffectivenessP(R, shells);
  const crossError = (): ThermalInputError =>
    new ThermalInputError(
      "thermal effectiveness P",
      P,
      "temperature-cross",
      `thermal effectiveness P must be below the limiting value ${limit} for R = ${R} and ${shells === 1 ? "1 shell" : `${shells} shells`} (no finite area reaches it), got ${P}`,
    );
  if (P >= limit) {
    throw crossError();
  }
  // (1 − P·R)/(1 − P) = 1 + ratioMinusOne
  const ratioMinusOne = (-P * (R - 1)) / (1 - P);
  if (!(ratioMinusOne > -1)) {
    throw crossError();
  }
  const halfLogW = Math.log1p(ratioMinusOne) / shells / 2; // h = ln W/2
  // S·h = −√(R² + 1)·P/(2N(1 − P))·ln(1 + x)/x, finite through R = 1
  const sTimesHalfLogW = ((-Math.sqrt(R * R + 1) * P) / (2 * shells * (1 - P))) * log1pOverX(ratioMinusOne);
  const atanhArgument = sTimesHalfLogW * tanhOverX(halfLogW); // S·tanh h
  if (!(Math.abs(atanhArgument) < 1)) {
    throw crossError();
  }
  // F = S·h/atanh(S·tanh h) = [y/atanh y]/[tanh(h)/h], y = S·tanh h
  return xOverAtanh(atanhArgument) / tanhOverX(halfLogW);
}
