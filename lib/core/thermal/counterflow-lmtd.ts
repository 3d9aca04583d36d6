import { logMeanTemperatureDifference } from "./log-mean-temperature-difference";
import { checkTerminalTemperatures } from "./terminal-temperature-checks";
import type { TerminalTemperatures } from "./types";

/**
 * Counterflow log-mean temperature difference of four terminal temperatures.
 *
 * Formula: LMTD_cf = LMTD(T_hi − t_co, T_ho − t_ci).
 * Valid: hot stream cooling, cold stream heating, both end differences positive.
 * Source: Incropera et al. (2007), 6th ed., Sect. 11.3.2, Eqs. 11.15 and 11.17 (from memory).
 *
 * @returns LMTD, K
 * @throws ThermalInputError "not-finite", "non-positive" or "wrong-direction" (see checkTerminalTemperatures)
 * @example counterflowLMTD({ hotInK: 400, hotOutK: 350, coldInK: 300, coldOutK: 340 }) // LMTD(60, 50) ≈ 54.85
 */
export function counterflowLMTD(t: TerminalTemperatures): number {
  checkTerminalTemperatures(t);
  return logMeanTemperatureDifference(t.hotInK - t.coldOutK, t.hotOutK - t.coldInK);
}
