import type { FoulingModel } from "./types";

/**
 * foulingGrowth: fouling resistance grown within one cycle after elapsed time t.
 *
 * - linear: Rf = Rf0 + k·t (linear curve in Epstein's classification of fouling curves; FIELD-NOTES §4, [M])
 * - asymptotic: Rf = Rf_inf·(1 − e^(−t/θ)) (Kern & Seaton 1959, Brit. Chem. Eng. 4(5):258–262; FIELD-NOTES §4),
 *   computed with expm1 for accuracy at small t
 * - falling-rate: Rf = k·t^n with 0 < n < 1 (falling-rate power law; FIELD-NOTES §4)
 * Negative t is treated as 0 (the cycle has not started).
 *
 * @param model fouling model with non-negative parameters.
 * @param elapsedS time since the start of the cycle, s.
 * @returns Rf in m²·K/W.
 * @example foulingGrowth({ kind: "asymptotic", asymptoteM2KPerW: 1e-3, timeConstantS: 1 }, 1) // 0.00063212
 */
export function foulingGrowth(model: FoulingModel, elapsedS: number): number {
  const t = elapsedS > 0 ? elapsedS : 0;
  switch (model.kind) {
    case "linear":
      return model.initialM2KPerW + model.rateM2KPerWPerS * t;
    case "asymptotic":
      return -model.asymptoteM2KPerW * Math.expm1(-t / model.timeConstantS);
    case "falling-rate":
      return t === 0 ? 0 : model.coefficient * Math.pow(t, model.exponent);
  }
}

/**
 * validateFoulingModel: throws unless the model never decreases with time (non-negative parameters,
 * positive time constant, falling-rate exponent in (0, 1]).
 */
export function validateFoulingModel(model: FoulingModel): void {
  switch (model.kind) {
    case "linear":
      if (!(model.initialM2KPerW >= 0) || !(model.rateM2KPerWPerS >= 0)) {
        throw new Error("linear fouling model needs initialM2KPerW >= 0 and rateM2KPerWPerS >= 0");
      }
      return;
    case "asymptotic":
      if (!(model.asymptoteM2KPerW >= 0) || !(model.timeConstantS > 0)) {
        throw new Error("asymptotic fouling model needs asymptoteM2KPerW >= 0 and timeConstantS > 0");
      }
      return;
    case "falling-rate":
      if (!(model.coefficient >= 0) || !(model.exponent > 0 && model.exponent <= 1)) {
        throw new Error("falling-rate fouling model needs coefficient >= 0 and 0 < exponent <= 1");
      }
      return;
  }
}
