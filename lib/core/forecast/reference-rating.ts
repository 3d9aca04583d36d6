import { rate, type Rating } from "../thermal";
import type { ReferenceConditions } from "./types";

/**
 * referenceRating: the exchanger rated at its reference conditions with a given fouling resistance.
 *
 * Formula: U_ref = 1/(1/U_clean,ref + Rf); duty and outlets by the thermal core's ε–NTU `rate`.
 * Valid: Rf ≥ −1/U_clean,ref (U positive); single-phase streams as the thermal core.
 * Source: Kern (1950), Process Heat Transfer, Ch. 6 (dirt factor in series); Incropera et al. (2007), 6th ed.,
 * Sect. 11.4 (ε–NTU rating), via lib/core/thermal.
 *
 * @param conditions area, arrangement, heat capacities, reference inlets and flows, clean resistance
 * @param foulingM2KPerW Rf, m²·K/W
 * @returns the thermal core's Rating (duty W, outlets K, ε, NTU)
 * @throws ThermalInputError from the thermal core (e.g. a non-positive U)
 */
export function referenceRating(conditions: ReferenceConditions, foulingM2KPerW: number): Rating {
  const { reference } = conditions;
  return rate({
    uWPerM2K: 1 / (conditions.cleanResistanceM2KPerW + foulingM2KPerW),
    areaM2: conditions.areaM2,
    arrangement: conditions.arrangement,
    hot: { massFlowKgPerS: reference.hotFlowKgPerS, heatCapacity: conditions.hotHeatCapacity, inletK: reference.hotInletK },
    cold: { massFlowKgPerS: reference.coldFlowKgPerS, heatCapacity: conditions.coldHeatCapacity, inletK: reference.coldInletK },
  });
}
