import { requireShellCount } from "./input-checks";
import type { FlowKind } from "./types";

/** Normalised flow kind: the string kinds, or "shells" with a checked shell count. */
export type CheckedFlowKind =
  | { kind: "counterflow" | "parallel" | "crossflow-unmixed" | "crossflow-cmin-mixed" | "crossflow-cmax-mixed" }
  | { kind: "shells"; shells: number };

const STRING_KINDS = new Set([
  "counterflow",
  "parallel",
  "crossflow-unmixed",
  "crossflow-cmin-mixed",
  "crossflow-cmax-mixed",
]);

/** Checks a FlowKind at run time (callers from plain JavaScript or parsed JSON) and normalises it. */
export function checkFlowKind(flow: FlowKind): CheckedFlowKind {
  if (typeof flow === "string") {
    if (!STRING_KINDS.has(flow)) {
      throw new TypeError(`unknown flow kind "${String(flow)}"`);
    }
    return { kind: flow };
  }
  if (typeof flow === "object" && flow !== null && "shells" in flow) {
    return { kind: "shells", shells: requireShellCount(flow.shells) };
  }
  throw new TypeError(`unknown flow kind ${JSON.stringify(flow)}`);
}

/** Human-readable flow kind for messages: "counterflow", "2 shells". */
export function describeFlowKind(flow: CheckedFlowKind): string {
  if (flow.kind === "shells") {
    return flow.shells === 1 ? "1 shell" : `${flow.shells} shells`;
  }
  return flow.kind;
}
