import { checkArrangement } from "./arrangement-checks";
import { ThermalInputError } from "./errors";
import { counterflowNTU, ntuFromEffectiveness } from "./ntu-from-effectiveness";
import { flowKindFor } from "./flow-kind-for";
import { maximumEffectiveness } from "./maximum-effectiveness";
import { shellAndTubeCorrectionFactor } from "./shell-and-tube-correction-factor";
import {
  checkParallelFlowTemperatures,
  checkTerminalTemperatures,
} from "./terminal-temperature-checks";
import type { Arrangement, StreamSide, TerminalTemperatures } from "./types";

/**
 * LMTD correction factor F of an arrangement relative to the counterflow LMTD, from four terminal temperatures.
 *
 * Formula: counterflow F = 1; shell-and-tube F by Bowman–Mueller–Nagle / Fakheri (shellAndTubeCorrectionFactor);
 * parallel and crossflow F = NTU_counterflow(ε, Cr)/NTU_arrangement(ε, Cr) at the same (ε, Cr), because
 * Q = U·A·F·LMTD_cf and NTU = U·A/Cmin; with ε = P, Cr = R when R ≤ 1 (cold is Cmin), else ε = P·R, Cr = 1/R.
 * F = 1 when either stream is isothermal (Cr = 0: all arrangements coincide).
 * Valid: the terminal checks below; the arrangement must reach the terminals with finite area.
 * Source: identity F = NTU_cf/NTU, e.g. Shah & Sekulic (2003), Fundamentals of Heat Exchanger Design, Sect. 3.7
 * (from memory); ε–NTU relations Incropera et al. (2007), 6th ed., Tables 11.3 and 11.4.
 *
 * Decisions on invalid terminals (ThermalInputError reasons):
 * - "not-finite" / "non-positive": any temperature not finite or ≤ 0 K;
 * - "wrong-direction": hot outlet above hot inlet or cold outlet below cold inlet;
 * - "non-positive": hot inlet ≤ cold outlet or hot outlet ≤ cold inlet (impossible in every arrangement);
 * - "temperature-cross": parallel flow with cold outlet ≥ hot outlet; shell-and-tube with P at or above the
 *   limiting P for R and N; crossflow with ε at or above the arrangement's infinite-area limit.
 *
 * @example correctionFactor({ hotInK: 663.15, hotOutK: 473.15, coldInK: 373.15, coldOutK: 443.15 }, { kind: "shell-and-tube", shells: 1 }) // 0.8917 (Kern ex. 7.3)
 */
export function correctionFactor(t: TerminalTemperatures, arrangement: Arrangement): number {
  checkTerminalTemperatures(t);
  const checked = checkArrangement(arrangement);
  if (checked.kind === "parallel") {
    checkParallelFlowTemperatures(t);
  }
  if (checked.kind === "counterflow") {
    return 1;
  }
  const hotDrop = t.hotInK - t.hotOutK;
  const coldRise = t.coldOutK - t.coldInK;
  if (hotDrop === 0 || coldRise === 0) {
    return 1;
  }
  if (checked.kind === "shell-and-tube") {
    const P = (t.coldOutK - t.coldInK) / (t.hotInK - t.coldInK);
    const R = hotDrop / coldRise;
    return shellAndTubeCorrectionFactor({ P, R, shells: checked.shells });
  }
  const inletDifference = t.hotInK - t.coldInK;
  const coldIsCmin = coldRise >= hotDrop;
  const cminStream: StreamSide = coldIsCmin ? "cold" : "hot";
  const effectiveness = (coldIsCmin ? coldRise : hotDrop) / inletDifference;
  const capacityRatio = coldIsCmin ? hotDrop / coldRise : coldRise / hotDrop;
  const flow = flowKindFor(checked, cminStream);
  const limit = maximumEffectiveness(capacityRatio, flow);
  if (effectiveness >= limit) {
    throw new ThermalInputError(
      "effectiveness",
      effectiveness,
      "temperature-cross",
      `${checked.kind} effectiveness must be below ${limit} (the infinite-area limit at capacity ratio ${capacityRatio}), got ${effectiveness}`,
    );
  }
  return counterflowNTU(effectiveness, capacityRatio) / ntuFromEffectiveness(effectiveness, capacityRatio, flow);
}
