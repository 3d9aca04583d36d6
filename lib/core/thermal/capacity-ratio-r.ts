import { ThermalInputError } from "./errors";
import { checkTerminalTemperatures } from "./terminal-temperature-checks";
import type { TerminalTemperatures } from "./types";

/**
 * Capacity ratio R of the LMTD correction-factor method, equal to C_cold/C_hot.
 *
 * Formula: R = (T_hi − T_ho)/(t_co − t_ci).
 * Valid: as thermalEffectivenessP, and a cold-side temperature rise above zero (R is unbounded as the cold
 * stream becomes isothermal, e.g. boiling); R = 0 for an isothermal (condensing) hot stream.
 * Source: Bowman, Mueller & Nagle (1940), Trans. ASME 62:283–294 (from memory).
 *
 * @throws ThermalInputError "non-positive" for a zero cold-side temperature rise; otherwise as thermalEffectivenessP
 * @example capacityRatioR({ hotInK: 403.15, hotOutK: 383.15, coldInK: 288.15, coldOutK: 358.15 }) // 20/70
 */
export function capacityRatioR(t: TerminalTemperatures): number {
  checkTerminalTemperatures(t);
  const coldRise = t.coldOutK - t.coldInK;
  if (!(coldRise > 0)) {
    throw new ThermalInputError(
      "cold temperature rise",
      coldRise,
      "non-positive",
      `cold temperature rise must be positive for R to be defined, got ${coldRise} K`,
    );
  }
  return (t.hotInK - t.hotOutK) / coldRise;
}
