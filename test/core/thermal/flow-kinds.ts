import type { FlowKind } from "../../../lib/core/thermal";

/**
 * Every flow kind the ε–NTU functions accept, with a readable name for test titles and the wording the
 * error messages use for it.
 */
export const FLOW_KINDS: readonly { name: string; flow: FlowKind; inMessages: string }[] = [
  { name: "counterflow", flow: "counterflow", inMessages: "counterflow" },
  { name: "parallel", flow: "parallel", inMessages: "parallel" },
  { name: "1 shell", flow: { shells: 1 }, inMessages: "1 shell" },
  { name: "2 shells", flow: { shells: 2 }, inMessages: "2 shells" },
  { name: "5 shells", flow: { shells: 5 }, inMessages: "5 shells" },
  { name: "crossflow both unmixed", flow: "crossflow-unmixed", inMessages: "crossflow-unmixed" },
  { name: "crossflow Cmin mixed", flow: "crossflow-cmin-mixed", inMessages: "crossflow-cmin-mixed" },
  { name: "crossflow Cmax mixed", flow: "crossflow-cmax-mixed", inMessages: "crossflow-cmax-mixed" },
];
