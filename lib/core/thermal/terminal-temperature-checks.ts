import { ThermalInputError } from "./errors";
import { requirePositive } from "./input-checks";
import type { TerminalTemperatures } from "./types";

/**
 * Checks that hold for every arrangement (decisions documented here once):
 * 1. each terminal temperature finite ("not-finite") and above 0 K ("non-positive");
 * 2. the hot stream does not heat up (hot outlet ≤ hot inlet) and the cold stream does not cool down
 *    (cold outlet ≥ cold inlet), else "wrong-direction"; an isothermal side (condensing, boiling) is allowed;
 * 3. both counterflow terminal differences positive: hot inlet − cold outlet > 0 and hot outlet − cold inlet > 0,
 *    else "non-positive" (the second law forbids either end reaching or crossing, in any arrangement).
 * Arrangement-specific limits (parallel flow, shell-and-tube, crossflow) are checked where F is computed.
 */
export function checkTerminalTemperatures(t: TerminalTemperatures): void {
  requirePositive(t.hotInK, "hot inlet temperature", "K");
  requirePositive(t.hotOutK, "hot outlet temperature", "K");
  requirePositive(t.coldInK, "cold inlet temperature", "K");
  requirePositive(t.coldOutK, "cold outlet temperature", "K");
  if (t.hotOutK > t.hotInK) {
    throw new ThermalInputError(
      "hot outlet temperature",
      t.hotOutK,
      "wrong-direction",
      `hot outlet temperature must not exceed the hot inlet ${t.hotInK} K (the hot stream must cool), got ${t.hotOutK} K`,
    );
  }
  if (t.coldOutK < t.coldInK) {
    throw new ThermalInputError(
      "cold outlet temperature",
      t.coldOutK,
      "wrong-direction",
      `cold outlet temperature must not be below the cold inlet ${t.coldInK} K (the cold stream must heat), got ${t.coldOutK} K`,
    );
  }
  const hotInletEnd = t.hotInK - t.coldOutK;
  if (!(hotInletEnd > 0)) {
    throw new ThermalInputError(
      "hot inlet minus cold outlet temperature difference",
      hotInletEnd,
      "non-positive",
      `hot inlet minus cold outlet temperature difference must be positive, got ${hotInletEnd} K`,
    );
  }
  const hotOutletEnd = t.hotOutK - t.coldInK;
  if (!(hotOutletEnd > 0)) {
    throw new ThermalInputError(
      "hot outlet minus cold inlet temperature difference",
      hotOutletEnd,
      "non-positive",
      `hot outlet minus cold inlet temperature difference must be positive, got ${hotOutletEnd} K`,
    );
  }
}

/**
 * Parallel flow: both streams leave at the same end, so the cold outlet can never reach the hot outlet.
 * Hot outlet − cold outlet ≤ 0 → "temperature-cross".
 */
export function checkParallelFlowTemperatures(t: TerminalTemperatures): void {
  const outletEnd = t.hotOutK - t.coldOutK;
  if (!(outletEnd > 0)) {
    throw new ThermalInputError(
      "hot outlet minus cold outlet temperature difference",
      outletEnd,
      "temperature-cross",
      `parallel flow needs the hot outlet above the cold outlet; hot outlet minus cold outlet temperature difference must be positive, got ${outletEnd} K`,
    );
  }
}
