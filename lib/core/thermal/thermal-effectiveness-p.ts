import { checkTerminalTemperatures } from "./terminal-temperature-checks";
import type { TerminalTemperatures } from "./types";

/**
 * Cold-side thermal effectiveness (temperature efficiency) P.
 *
 * Formula: P = (t_co − t_ci)/(T_hi − t_ci).
 * Valid: hot stream cooling, cold stream heating, both counterflow end differences positive; then 0 ≤ P < 1.
 * Source: Bowman, Mueller & Nagle (1940), Trans. ASME 62:283–294 (notation as in TEMA and Kern 1950, Process
 * Heat Transfer, Ch. 7; from memory).
 *
 * @throws ThermalInputError as counterflowLMTD (see checkTerminalTemperatures)
 * @example thermalEffectivenessP({ hotInK: 403.15, hotOutK: 383.15, coldInK: 288.15, coldOutK: 358.15 }) // 70/115
 */
export function thermalEffectivenessP(t: TerminalTemperatures): number {
  checkTerminalTemperatures(t);
  return (t.coldOutK - t.coldInK) / (t.hotInK - t.coldInK);
}
