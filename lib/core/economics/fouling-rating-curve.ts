import { rate, type RatingInput } from "../thermal";
import { EconomicsInputError } from "./errors";

/**
 * foulingRatingCurve: duty at fixed reference conditions as a function of the fouling resistance.
 *
 * Formula: Q(Rf) = rate({ …clean, U = 1/(1/U_clean + Rf) }).dutyW, fouling resistance on the same area basis as U.
 * Validity: as the ε–NTU rating (single phase, uniform U); Rf >= 0.
 * Source: resistances in series, 1/U = 1/U_clean + Rf (FIELD-NOTES §4, standard form); rating by the ε–NTU method,
 * Incropera et al. (2007), Fundamentals of Heat and Mass Transfer, 6th ed., Sect. 11.4.
 *
 * @param clean rating input with the clean overall coefficient and the reference inlets and flows
 * @returns Rf (m²·K/W) → duty (W)
 * @throws EconomicsInputError for a negative or non-finite resistance (ThermalInputError for a bad rating input)
 */
export function foulingRatingCurve(clean: RatingInput): (resistanceM2KPerW: number) => number {
  const cleanResistance = 1 / clean.uWPerM2K;
  return (resistanceM2KPerW) => {
    if (!Number.isFinite(resistanceM2KPerW) || resistanceM2KPerW < 0) {
      throw new EconomicsInputError(
        "fouling resistance",
        `fouling resistance must be a finite number >= 0, got ${resistanceM2KPerW} m²·K/W`,
      );
    }
    return rate({ ...clean, uWPerM2K: 1 / (cleanResistance + resistanceM2KPerW) }).dutyW;
  };
}
