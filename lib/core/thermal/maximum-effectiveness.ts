import { checkFlowKind } from "./flow-kind-checks";
import { requireCapacityRatio } from "./input-checks";
import { expm1OverX } from "./stable-functions";
import { seriesShellsEffectiveness } from "./effectiveness-relations";
import type { FlowKind } from "./types";

/**
 * The effectiveness reached as NTU → ∞ (infinite area) for a flow kind and capacity ratio.
 *
 * Formula: counterflow 1 (for every Cr ≤ 1; at Cr = 1 as NTU/(1+NTU) → 1); parallel 1/(1 + Cr);
 * 1 shell 2/(1 + Cr + √(1 + Cr²)); N shells the series formula applied to that 1-shell limit;
 * crossflow both unmixed 1; Cmax mixed (1 − e^(−Cr))/Cr; Cmin mixed 1 − e^(−1/Cr); Cr = 0: 1 for all.
 * Valid: 0 ≤ Cr ≤ 1.
 * Source: limits NTU → ∞ of the relations of Incropera et al. (2007), 6th ed., Table 11.3 (derived).
 *
 * @returns the limiting effectiveness, 0.5 … 1
 * @throws ThermalInputError for Cr outside 0 … 1 or non-finite
 * @example maximumEffectiveness(1, "parallel") // 0.5
 */
export function maximumEffectiveness(capacityRatio: number, flow: FlowKind): number {
  requireCapacityRatio(capacityRatio);
  const checked = checkFlowKind(flow);
  switch (checked.kind) {
    case "counterflow":
    case "crossflow-unmixed":
      return 1;
    case "parallel":
      return 1 / (1 + capacityRatio);
    case "shells": {
      const oneShell = 2 / (1 + capacityRatio + Math.sqrt(1 + capacityRatio * capacityRatio));
      return seriesShellsEffectiveness(oneShell, capacityRatio, checked.shells);
    }
    case "crossflow-cmax-mixed":
      return expm1OverX(-capacityRatio);
    case "crossflow-cmin-mixed":
      return capacityRatio === 0 ? 1 : -Math.expm1(-1 / capacityRatio);
  }
}
