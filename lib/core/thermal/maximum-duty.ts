import { onSide, requirePositive } from "./input-checks";
import { specificHeat } from "./specific-heat";
import { ThermalInputError } from "./errors";
import type { StreamInlet } from "./types";

/**
 * The largest duty any exchanger could transfer between two inlet streams.
 *
 * Formula: Q_max = C_min·(T_h,in − T_c,in), C = m·cp, with each stream's cp taken at its own inlet temperature.
 * Valid: single-phase streams; with temperature-dependent cp the value is approximate (a bound to a few per cent),
 * so callers comparing against it should allow a margin.
 * Source: Incropera et al. (2007), Fundamentals of Heat and Mass Transfer, 6th ed., Eq. 11.21 (from memory).
 *
 * @returns W
 * @throws ThermalInputError for non-positive flows or cp, and "non-positive" when the hot inlet is not above the cold inlet
 */
export function maximumDuty(input: { hot: StreamInlet; cold: StreamInlet }): number {
  const hotRate = onSide("hot", () => requirePositive(input.hot.massFlowKgPerS, "mass flow", "kg/s") * specificHeat(input.hot.heatCapacity, input.hot.inletK));
  const coldRate = onSide("cold", () => requirePositive(input.cold.massFlowKgPerS, "mass flow", "kg/s") * specificHeat(input.cold.heatCapacity, input.cold.inletK));
  const difference = input.hot.inletK - input.cold.inletK;
  if (!(difference > 0)) {
    throw new ThermalInputError("inlet temperature difference", difference, "non-positive", `hot inlet must be above cold inlet, got a difference of ${difference} K`);
  }
  return Math.min(hotRate, coldRate) * difference;
}
