import { logMeanTemperatureDifference } from "./log-mean-temperature-difference";
import {
  checkParallelFlowTemperatures,
  checkTerminalTemperatures,
} from "./terminal-temperature-checks";
import type { TerminalTemperatures } from "./types";

/**
 * Parallel-flow (co-current) log-mean temperature difference of four terminal temperatures.
 *
 * Formula: LMTD_pf = LMTD(T_hi − t_ci, T_ho − t_co).
 * Valid: as counterflowLMTD, and hot outlet above cold outlet.
 * Source: Incropera et al. (2007), 6th ed., Sect. 11.3.2, Eqs. 11.15 and 11.16 (from memory).
 *
 * @returns LMTD, K
 * @throws ThermalInputError as counterflowLMTD, and "temperature-cross" when cold outlet ≥ hot outlet
 */
export function parallelFlowLMTD(t: TerminalTemperatures): number {
  checkTerminalTemperatures(t);
  checkParallelFlowTemperatures(t);
  return logMeanTemperatureDifference(t.hotInK - t.coldInK, t.hotOutK - t.coldOutK);
}
