import { exchangerBalance } from "../reconcile/exchanger-balance";
import { operatingPointFromVector } from "../reconcile/operating-point-from-vector";
import { operatingPointVector } from "../reconcile/operating-point-vector";
import type { HeatCapacity } from "../thermal";
import type { OperatingPoint } from "../screening/types";
import { FAULT_CANDIDATES } from "./fault-candidates";
import { rateResidual } from "./rate-residual";
import type { RateEquationSetup } from "./types";

/** Central-difference steps for the rate residual's Jacobian: 0.01 K on temperatures, 1e-5 relative on flows. */
const TEMPERATURE_STEP_K = 1e-2;
const RELATIVE_FLOW_STEP = 1e-5;

/** How the residuals of one sample are centred and scaled. */
export interface EvidenceSettings {
  hotHeatCapacity: HeatCapacity;
  coldHeatCapacity: HeatCapacity;
  /** Rate equation, or null to use the energy balance alone. */
  rate: RateEquationSetup | null;
  /** In-control mean of g/σ_g (subtracted as μ·σ_g). */
  balanceOffset: number;
  /** In-control mean of h/Q̂ (subtracted as μ·Q̂). */
  rateOffset: number;
  /** Variance inflation of the propagated covariance (≥ 1). */
  inflation: number;
  /** Extra relative variance of h/Q̂ from the U model (τ²). */
  rateModelVariance: number;
}

/** What one sample says about each fault candidate. */
export interface SampleEvidence {
  /** Centred balance residual g − μ_g, W. */
  balance: number;
  /** Centred rate residual h − μ_h, W (NaN when unavailable). */
  rate: number;
  /** Σ⁻¹ entries [11, 12, 22] of the residual pair; [1/Σ11, 0, 0] when the rate residual is unavailable. */
  inverseCovariance: [number, number, number];
  /** Propagated standard deviation of g, W (before inflation). */
  balanceStandardDeviationW: number;
  /** Variance of g used for the balance-only forms, W² (after inflation). */
  balanceVariance: number;
  /** Signatures ∂(g, h)/∂b of the six candidates, flattened [g₀, h₀, g₁, h₁, …]. */
  signatures: Float64Array;
}

/**
 * sampleEvidence: residuals, their covariance and the fault signatures of one operating point.
 *
 * Formula: ρ = (g − μ_g, h − μ_h); Σ = κ·J·V·Jᵀ + diag(0, τ²·Q̂²) with J = ∂(g, h)/∂x (g analytic, h by central
 * differences) and V = diag(σ²); signature of a bias on x_i: J·e_i; of a span error on x_i: J·e_i·x_i.
 * Valid: signatures are first-order (a fault of a few K or a few % changes them by a small fraction).
 * Source: fault signature (directional) vectors of the GLR test, Narasimhan & Mah (1987), AIChE J. 33(9):1514–1521.
 *
 * @param point measured operating point.
 * @param timeMs its time (for the U model's fouling term).
 * @param sigma standard deviations in vector order (K, kg/s).
 * @param settings centring, scaling and the rate equation.
 */
export function sampleEvidence(point: OperatingPoint, timeMs: number, sigma: readonly number[], settings: EvidenceSettings): SampleEvidence {
  const x = operatingPointVector(point);
  const balance = exchangerBalance(point, settings.hotHeatCapacity, settings.coldHeatCapacity);
  const gradientG = balance.gradient;
  let varianceG = 0;
  for (let i = 0; i < 6; i += 1) varianceG += ((gradientG[i] as number) * (sigma[i] as number)) ** 2;
  const balanceStandardDeviationW = Math.sqrt(varianceG);
  const signatures = new Float64Array(12);
  const centredBalance = balance.residualW - settings.balanceOffset * balanceStandardDeviationW;

  let rate = Number.NaN;
  const gradientH = new Float64Array(6);
  if (settings.rate !== null) {
    const centre = rateResidual(point, timeMs, settings.rate);
    if (Number.isFinite(centre.residualW)) {
      let ok = true;
      for (let i = 0; i < 6 && ok; i += 1) {
        const step = i < 4 ? TEMPERATURE_STEP_K : RELATIVE_FLOW_STEP * Math.abs(x[i] as number);
        const up = [...x];
        const down = [...x];
        up[i] = (up[i] as number) + step;
        down[i] = (down[i] as number) - step;
        const above = rateResidual(operatingPointFromVector(up), timeMs, settings.rate).residualW;
        const below = rateResidual(operatingPointFromVector(down), timeMs, settings.rate).residualW;
        if (!Number.isFinite(above) || !Number.isFinite(below)) ok = false;
        gradientH[i] = (above - below) / (2 * step);
      }
      if (ok) rate = centre.residualW - settings.rateOffset * centre.dutyW;
      if (ok) {
        let s11 = 0;
        let s12 = 0;
        let s22 = 0;
        for (let i = 0; i < 6; i += 1) {
          const variance = (sigma[i] as number) ** 2;
          s11 += (gradientG[i] as number) ** 2 * variance;
          s12 += (gradientG[i] as number) * (gradientH[i] as number) * variance;
          s22 += (gradientH[i] as number) ** 2 * variance;
        }
        s11 *= settings.inflation;
        s12 *= settings.inflation;
        s22 = s22 * settings.inflation + settings.rateModelVariance * centre.dutyW * centre.dutyW;
        const determinant = s11 * s22 - s12 * s12;
        if (determinant > 0) {
          for (const candidate of FAULT_CANDIDATES) {
            const factor = candidate.kind === "scale" ? (x[candidate.index] as number) : 1;
            signatures[2 * candidate.index] = (gradientG[candidate.index] as number) * factor;
            signatures[2 * candidate.index + 1] = (gradientH[candidate.index] as number) * factor;
          }
          return {
            balance: centredBalance,
            rate,
            inverseCovariance: [s22 / determinant, -s12 / determinant, s11 / determinant],
            balanceStandardDeviationW,
            balanceVariance: varianceG * settings.inflation,
            signatures,
          };
        }
      }
    }
  }
  for (const candidate of FAULT_CANDIDATES) {
    const factor = candidate.kind === "scale" ? (x[candidate.index] as number) : 1;
    signatures[2 * candidate.index] = (gradientG[candidate.index] as number) * factor;
  }
  return {
    balance: centredBalance,
    rate: Number.NaN,
    inverseCovariance: [1 / (varianceG * settings.inflation), 0, 0],
    balanceStandardDeviationW,
    balanceVariance: varianceG * settings.inflation,
    signatures,
  };
}
