import { correctionFactor, ThermalInputError } from "../thermal";
import type { InstrumentUncertainties } from "./instrument-uncertainties";
import type { Arrangement } from "../thermal";
import type { ReadingColumns } from "./types";

/** Why a sample is physically impossible; index = code − 1 in PlausibilityFlags.code. */
export const IMPOSSIBLE_CHECKS = [
  "non-positive flow or temperature",
  "hot outlet above hot inlet",
  "cold outlet below cold inlet",
  "hot inlet not above cold inlet",
  "temperature cross for the arrangement",
] as const;

/** Options of {@link plausibilityFlags}; defaults in brackets. */
export interface PlausibilityOptions {
  /** Tolerance in combined standard uncertainties [3]. */
  coverage?: number;
}

/** Result of {@link plausibilityFlags}. */
export interface PlausibilityFlags {
  /** 1 where the sample is physically impossible. */
  impossible: Uint8Array;
  /** 0 where plausible or not judged (a value missing), else 1 + index into IMPOSSIBLE_CHECKS of the first failed check. */
  code: Uint8Array;
}

/**
 * plausibilityFlags: marks samples whose readings cannot all be true, given the instruments' uncertainties.
 *
 * Checks, in order (the first failure is recorded):
 * 1. a flow ≤ 0 kg/s or a temperature ≤ 0 K;
 * 2. T_ho − T_hi > c·√(σ_hi² + σ_ho²) (the hot stream heats up);
 * 3. t_ci − t_co > c·√(σ_ci² + σ_co²) (the cold stream cools down);
 * 4. T_hi ≤ t_ci (no driving force at the inlets);
 * 5. the thermal core rejects the terminals for the arrangement (correctionFactor throws ThermalInputError: an end
 *    difference ≤ 0, parallel flow with t_co ≥ T_ho, shell-and-tube P at or past its limit, crossflow past its
 *    infinite-area limit), even after every temperature is moved c·σ towards feasibility (hot ones up, cold ones
 *    down, which widens every end difference and lowers P) and a within-tolerance wrong direction is set level.
 * Valid: single-phase two-stream exchangers. Source: second law and the terminal checks of the thermal core
 * (Incropera et al. 2007, Sect. 11.3; Bowman, Mueller & Nagle 1940 for the shell-and-tube limit); the c = 3
 * coverage is common practice (GUM, JCGM 100:2008, Sect. 6.3: k = 3 gives about 99.7 % for normal errors).
 * Samples with a missing value are not judged (they are "missing").
 *
 * @param columns readings; not modified.
 * @param arrangement flow arrangement.
 * @param uncertainties standard uncertainties (temperatures in K; flows unused here).
 * @param options coverage factor c > 0.
 */
export function plausibilityFlags(
  columns: ReadingColumns,
  arrangement: Arrangement,
  uncertainties: InstrumentUncertainties,
  options: PlausibilityOptions = {},
): PlausibilityFlags {
  const coverage = options.coverage ?? 3;
  if (!(coverage > 0)) throw new RangeError(`coverage must be positive, got ${coverage}`);
  const count = columns.timeMs.length;
  const impossible = new Uint8Array(count);
  const code = new Uint8Array(count);
  const hotTolerance = coverage * Math.hypot(uncertainties.hotIn, uncertainties.hotOut);
  const coldTolerance = coverage * Math.hypot(uncertainties.coldIn, uncertainties.coldOut);
  const shift = {
    hotIn: coverage * uncertainties.hotIn,
    hotOut: coverage * uncertainties.hotOut,
    coldIn: coverage * uncertainties.coldIn,
    coldOut: coverage * uncertainties.coldOut,
  };
  // One mutable object for the relaxed terminals (correctionFactor only reads it), to spare an allocation per sample.
  const relaxed = { hotInK: 0, hotOutK: 0, coldInK: 0, coldOutK: 0 };
  for (let index = 0; index < count; index += 1) {
    const hotIn = columns.hotInK[index] as number;
    const hotOut = columns.hotOutK[index] as number;
    const coldIn = columns.coldInK[index] as number;
    const coldOut = columns.coldOutK[index] as number;
    const hotFlow = columns.hotFlowKgPerS[index] as number;
    const coldFlow = columns.coldFlowKgPerS[index] as number;
    if (
      !Number.isFinite(hotIn) || !Number.isFinite(hotOut) || !Number.isFinite(coldIn) ||
      !Number.isFinite(coldOut) || !Number.isFinite(hotFlow) || !Number.isFinite(coldFlow)
    ) {
      continue;
    }
    let failed = 0;
    if (!(hotFlow > 0 && coldFlow > 0 && hotIn > 0 && hotOut > 0 && coldIn > 0 && coldOut > 0)) failed = 1;
    else if (hotOut - hotIn > hotTolerance) failed = 2;
    else if (coldIn - coldOut > coldTolerance) failed = 3;
    else if (!(hotIn > coldIn)) failed = 4;
    else {
      relaxed.hotInK = hotIn + shift.hotIn;
      relaxed.hotOutK = Math.min(hotOut + shift.hotOut, relaxed.hotInK);
      relaxed.coldInK = coldIn - shift.coldIn;
      relaxed.coldOutK = Math.max(coldOut - shift.coldOut, relaxed.coldInK);
      try {
        correctionFactor(relaxed, arrangement);
      } catch (error) {
        if (!(error instanceof ThermalInputError)) throw error;
        failed = 5;
      }
    }
    if (failed > 0) {
      impossible[index] = 1;
      code[index] = failed;
    }
  }
  return { impossible, code };
}
