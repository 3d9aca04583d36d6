import type { OverallCoefficientModel } from "./types";

const DAY_MS = 86_400_000;

/**
 * predictOverallCoefficient: U from the flow- and time-dependent coefficient model, W/(m²·K).
 *
 * Formula: 1/U = c₀ + c_h·m_h^(−n) + c_c·m_c^(−n) + c_t·(t − t_ref)/day (film resistances scaling with flow^(−n),
 * n = 0.8 from Dittus–Boelter, a constant wall resistance and a fouling resistance changing linearly).
 * Valid: flows inside the fitted range; times within days of the fit window. Source: series resistances and
 * Dittus–Boelter scaling, FIELD-NOTES §4 (Wilson-plot form, Wilson 1915); linear fouling over a short window.
 *
 * @returns U in W/(m²·K); NaN if the model gives a non-positive resistance.
 */
export function predictOverallCoefficient(model: OverallCoefficientModel, hotFlowKgPerS: number, coldFlowKgPerS: number, timeMs: number): number {
  const resistance =
    model.intercept +
    model.hotCoefficient * Math.pow(hotFlowKgPerS, -model.exponent) +
    model.coldCoefficient * Math.pow(coldFlowKgPerS, -model.exponent) +
    (model.timeCoefficient * (timeMs - model.referenceTimeMs)) / DAY_MS;
  return resistance > 0 ? 1 / resistance : Number.NaN;
}
