import { checkArrangement } from "./arrangement-checks";
import type { Arrangement, FlowKind, StreamSide } from "./types";

/**
 * The effectiveness–NTU flow kind of an arrangement, given which stream has the smaller capacity rate.
 * Only mixed crossflow depends on it: the mixed stream is either Cmin ("crossflow-cmin-mixed") or Cmax
 * ("crossflow-cmax-mixed"); the other arrangements are symmetric in the two streams.
 * Source: Incropera et al. (2007), 6th ed., Table 11.3 (naming of the crossflow cases).
 *
 * @example flowKindFor({ kind: "crossflow-mixed", mixedStream: "hot" }, "cold") // "crossflow-cmax-mixed"
 */
export function flowKindFor(arrangement: Arrangement, cminStream: StreamSide): FlowKind {
  const checked = checkArrangement(arrangement);
  switch (checked.kind) {
    case "counterflow":
      return "counterflow";
    case "parallel":
      return "parallel";
    case "shell-and-tube":
      return { shells: checked.shells };
    case "crossflow-unmixed":
      return "crossflow-unmixed";
    case "crossflow-mixed":
      return checked.mixedStream === cminStream ? "crossflow-cmin-mixed" : "crossflow-cmax-mixed";
  }
}
