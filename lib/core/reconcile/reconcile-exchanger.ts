import type { HeatCapacity } from "../thermal";
import type { InstrumentUncertainties } from "../screening/instrument-uncertainties";
import type { OperatingPoint } from "../screening/types";
import { exchangerBalance } from "./exchanger-balance";
import type { CriticalValues } from "./critical-values-for";
import { grossErrorTests } from "./gross-error-tests";
import { operatingPointFromVector } from "./operating-point-from-vector";
import { operatingPointVector } from "./operating-point-vector";
import type { GrossErrorTests } from "./types";

/**
 * The last step must change no value by more than this, relative, before the iteration stops. The iteration converges
 * linearly in x (about a factor 30 per step on plant data), so x is then within about 3e-8 of the optimum, far inside
 * the measurement uncertainty; g itself converges faster (about a factor 1000 per step).
 */
const STEP_TOLERANCE = 1e-6;

/** Input of {@link reconcileExchanger}. */
export interface ExchangerReconciliationInput {
  measured: OperatingPoint;
  /** Temperatures in K; flows as a fraction of reading (σ_m = fraction·measured flow). */
  uncertainties: InstrumentUncertainties;
  hotHeatCapacity: HeatCapacity;
  coldHeatCapacity: HeatCapacity;
  /** Significance level of the tests [0.05]. */
  alpha?: number;
  /** Stop when |g(x̂)| ≤ tolerance·Q̂ (and the last step changed no value by more than 1e-6 relative) [1e-12]. */
  tolerance?: number;
  /** [50] */
  maximumIterations?: number;
  /** Critical values for α, 1 constraint and 6 measurements, computed beforehand (criticalValuesFor(α, 1, 6)). */
  criticalValues?: CriticalValues;
}

/** Result of {@link reconcileExchanger}. Measurement tests are in the order hotIn, hotOut, coldIn, coldOut, hotFlow, coldFlow. */
export interface ExchangerReconciliation extends GrossErrorTests {
  reconciled: OperatingPoint;
  /** Measured minus reconciled. */
  adjustments: OperatingPoint;
  /** Standard deviations used (K, kg/s). */
  standardDeviations: OperatingPoint;
  /** Reconciled duty (hot = cold), W. */
  dutyW: number;
  /** g(y) = Q_hot − Q_cold of the measurements, W. */
  measuredResidualW: number;
  /** g(x̂) after reconciliation, W (zero to the tolerance). */
  reconciledResidualW: number;
  iterations: number;
}

/**
 * reconcileExchanger: weighted least-squares reconciliation of the six readings of an exchanger under its energy
 * balance, by successive linearisation, with the global and measurement tests.
 *
 * Formula: minimise Σ (y_i − x_i)²/σ_i² subject to g(x) = m_h∫cp_h dT − m_c∫cp_c dT = 0. Each iteration linearises g
 * at x_k and solves the linear problem in closed form: x_(k+1) = y − V·J_kᵀ·(g(x_k) + J_k·(y − x_k))/(J_k·V·J_kᵀ),
 * J_k = ∇g(x_k), V = diag(σ²); the flow σ is the relative uncertainty times the measured flow (fixed during the
 * iteration, so the objective is a fixed quadratic). γ = Σ a_i²/σ_i² at the solution ~ χ²(1); W = VJᵀJV/(JVJᵀ) with J
 * from the last linearisation (the one x̂ solves exactly).
 * Valid: small adjustments relative to the values (the linearisation converges in 2–4 iterations for plant data);
 * positive temperatures; single-phase streams without heat loss.
 * Source: successive linearisation, Knepper & Gorman (1980), AIChE J. 26(2):260–264; Britt & Luecke (1973),
 * Technometrics 15(2):233–247 (from memory); linear step Kuehn & Davidson (1961); tests Mah & Tamhane (1982).
 * Limit: with one constraint all measurement-test statistics are equal (z_i = |g|/√(JVJᵀ) for every measurement
 * with ∂g/∂x_i ≠ 0), so the test flags "a gross error somewhere" but cannot name the instrument; see lib/core/faults.
 *
 * @throws RangeError if the iteration does not converge; ThermalInputError for non-positive temperatures or cp.
 */
export function reconcileExchanger(input: ExchangerReconciliationInput): ExchangerReconciliation {
  const alpha = input.alpha ?? 0.05;
  const tolerance = input.tolerance ?? 1e-12;
  const maximumIterations = input.maximumIterations ?? 50;
  const y = operatingPointVector(input.measured);
  const u = input.uncertainties;
  const sigma = [u.hotIn, u.hotOut, u.coldIn, u.coldOut, u.hotFlow * Math.abs(y[4]), u.coldFlow * Math.abs(y[5])];
  const variance = sigma.map((value) => value * value);
  const { hotHeatCapacity, coldHeatCapacity } = input;
  const measuredBalance = exchangerBalance(input.measured, hotHeatCapacity, coldHeatCapacity);

  const x: number[] = [...y];
  let balance = measuredBalance;
  /** The gradient that produced the final step: x̂ is the exact solution of the problem linearised with it. */
  let lastGradient = measuredBalance.gradient;
  let iterations = 0;
  let converged = false;
  for (; iterations < maximumIterations; iterations += 1) {
    const gradient = balance.gradient;
    lastGradient = gradient;
    let jvj = 0;
    let linearised = balance.residualW;
    for (let i = 0; i < 6; i += 1) {
      jvj += (gradient[i] as number) ** 2 * (variance[i] as number);
      linearised += (gradient[i] as number) * ((y[i] as number) - (x[i] as number));
    }
    if (!(jvj > 0)) throw new RangeError("the energy balance does not depend on any uncertain reading");
    const multiplier = linearised / jvj;
    let change = 0;
    for (let i = 0; i < 6; i += 1) {
      const next = (y[i] as number) - (variance[i] as number) * (gradient[i] as number) * multiplier;
      change = Math.max(change, Math.abs(next - (x[i] as number)) / Math.max(Math.abs(next), 1e-300));
      x[i] = next;
    }
    balance = exchangerBalance(operatingPointFromVector(x), hotHeatCapacity, coldHeatCapacity);
    const scale = Math.max(Math.abs(balance.hotDutyW), Math.abs(balance.coldDutyW), 1e-300);
    if (Math.abs(balance.residualW) <= tolerance * scale && change <= STEP_TOLERANCE) {
      converged = true;
      iterations += 1;
      break;
    }
  }
  if (!converged) throw new RangeError(`energy-balance reconciliation did not converge in ${maximumIterations} iterations`);

  const adjustments = y.map((value, i) => value - (x[i] as number));
  const gradient = lastGradient;
  let jvj = 0;
  for (let i = 0; i < 6; i += 1) jvj += (gradient[i] as number) ** 2 * (variance[i] as number);
  const adjustmentVariances = gradient.map((value, i) => (value * (variance[i] as number)) ** 2 / jvj);
  const globalTest = adjustments.reduce((sum, value, i) => sum + ((variance[i] as number) > 0 ? (value * value) / (variance[i] as number) : 0), 0);
  return {
    reconciled: operatingPointFromVector(x),
    adjustments: operatingPointFromVector(adjustments),
    standardDeviations: operatingPointFromVector(sigma),
    dutyW: (balance.hotDutyW + balance.coldDutyW) / 2,
    measuredResidualW: measuredBalance.residualW,
    reconciledResidualW: balance.residualW,
    iterations,
    ...grossErrorTests({
      globalTest,
      adjustments,
      adjustmentVariances,
      degreesOfFreedom: 1,
      alpha,
      ...(input.criticalValues === undefined ? {} : { criticalValues: input.criticalValues }),
    }),
  };
}
