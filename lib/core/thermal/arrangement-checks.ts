import { requireShellCount } from "./input-checks";
import type { Arrangement } from "./types";

/** Checks an Arrangement at run time (shell count, mixed stream) and returns it unchanged. */
export function checkArrangement(arrangement: Arrangement): Arrangement {
  switch (arrangement.kind) {
    case "counterflow":
    case "parallel":
    case "crossflow-unmixed":
      return arrangement;
    case "shell-and-tube":
      requireShellCount(arrangement.shells);
      return arrangement;
    case "crossflow-mixed":
      if (arrangement.mixedStream !== "hot" && arrangement.mixedStream !== "cold") {
        throw new TypeError(`mixed stream must be "hot" or "cold", got ${JSON.stringify(arrangement.mixedStream)}`);
      }
      return arrangement;
    default:
      throw new TypeError(`unknown arrangement ${JSON.stringify(arrangement)}`);
  }
}
