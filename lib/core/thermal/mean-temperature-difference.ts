import { correctionFactor } from "./correction-factor";
import { counterflowLMTD } from "./counterflow-lmtd";
import type { Arrangement, MeanTemperatureDifference, TerminalTemperatures } from "./types";

/**
 * Effective mean temperature difference of an arrangement, so that Q = U·A·meanK.
 *
 * Formula: ΔT_m = F·LMTD_cf, with LMTD_cf = LMTD(T_hi − t_co, T_ho − t_ci) (for parallel flow F·LMTD_cf equals
 * the parallel-flow LMTD).
 * Valid: as correctionFactor.
 * Source: Incropera et al. (2007), 6th ed., Sect. 11.3.4, Eq. 11.18 (ΔT_lm = F·ΔT_lm,CF; from memory).
 *
 * @returns lmtdK (counterflow LMTD, K), correctionFactor F, meanK = F·lmtdK (K)
 * @throws ThermalInputError as correctionFactor
 */
export function meanTemperatureDifference(
  t: TerminalTemperatures,
  arrangement: Arrangement,
): MeanTemperatureDifference {
  const lmtdK = counterflowLMTD(t);
  const factor = correctionFactor(t, arrangement);
  return { lmtdK, correctionFactor: factor, meanK: factor * lmtdK };
}
