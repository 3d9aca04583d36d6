import { crossflowUnmixedEffectiveness } from "./crossflow-unmixed-effectiveness";
import { checkFlowKind, type CheckedFlowKind } from "./flow-kind-checks";
import { requireCapacityRatio, requireNonNegative } from "./input-checks";
import {
  counterflowEffectiveness,
  oneShellEffectiveness,
  seriesShellsEffectiveness,
} from "./effectiveness-relations";
import { maximumEffectiveness } from "./maximum-effectiveness";
import { expm1OverX } from "./stable-functions";
import type { FlowKind } from "./types";

/**
 * Thermal effectiveness ε = Q/(Cmin·(T_hot,in − T_cold,in)) from the number of transfer units.
 *
 * Formula (NTU = UA/Cmin, Cr = Cmin/Cmax):
 * - counterflow: ε = [1 − e^(−NTU(1−Cr))]/[1 − Cr·e^(−NTU(1−Cr))]; Cr = 1: ε = NTU/(1 + NTU)
 * - parallel: ε = [1 − e^(−NTU(1+Cr))]/(1 + Cr)
 * - 1 shell, 2n tube passes: ε₁ = 2/{1 + Cr + √(1+Cr²)·[1 + e^(−NTU₁√(1+Cr²))]/[1 − e^(−NTU₁√(1+Cr²))]}
 * - N shells (each NTU₁ = NTU/N): ε = [((1 − ε₁Cr)/(1 − ε₁))^N − 1]/[((1 − ε₁Cr)/(1 − ε₁))^N − Cr]
 * - crossflow, both unmixed: exact series of Mason (1954), see crossflowUnmixedEffectiveness
 * - crossflow, Cmax mixed: ε = (1/Cr)·(1 − exp{−Cr·[1 − e^(−NTU)]})
 * - crossflow, Cmin mixed: ε = 1 − exp{−(1/Cr)·[1 − e^(−Cr·NTU)]}
 * - Cr = 0, any kind: ε = 1 − e^(−NTU)
 * Valid: NTU ≥ 0, 0 ≤ Cr ≤ 1 (NTU ≤ 1e8 for unmixed crossflow). Each form is evaluated through expm1/log1p/tanh
 * rearrangements that are algebraically identical and continuous at Cr = 0, Cr = 1 and NTU = 0.
 * Source: Incropera, DeWitt, Bergman & Lavine (2007), Fundamentals of Heat and Mass Transfer, 6th ed., Table 11.3;
 * Kays & London (1984), Compact Heat Exchangers, 3rd ed. (verified via the docstring and code of CalebBell/ht
 * hx.py effectiveness_from_NTU).
 *
 * @param ntu number of transfer units, ≥ 0
 * @param capacityRatio Cmin/Cmax, 0 … 1
 * @param flow flow kind relative to Cmin
 * @returns effectiveness, 0 … maximumEffectiveness(capacityRatio, flow)
 * @throws ThermalInputError "not-finite", "negative", "out-of-range"
 * @example effectivenessFromNTU(5, 0.7, "counterflow") // 0.920670368605…
 */
export function effectivenessFromNTU(ntu: number, capacityRatio: number, flow: FlowKind): number {
  requireNonNegative(ntu, "NTU", "");
  requireCapacityRatio(capacityRatio);
  const checked = checkFlowKind(flow);
  // Rounding can put ε an ulp above its NTU → ∞ limit at very large NTU; the exact value is always below it.
  return Math.min(evaluate(ntu, capacityRatio, checked), maximumEffectiveness(capacityRatio, flow));
}

function evaluate(ntu: number, capacityRatio: number, checked: CheckedFlowKind): number {
  switch (checked.kind) {
    case "counterflow":
      return counterflowEffectiveness(ntu, capacityRatio);
    case "parallel": {
      const sum = 1 + capacityRatio;
      return (-Math.expm1(-ntu * sum)) / sum;
    }
    case "shells":
      return seriesShellsEffectiveness(
        oneShellEffectiveness(ntu / checked.shells, capacityRatio),
        capacityRatio,
        checked.shells,
      );
    case "crossflow-unmixed":
      return crossflowUnmixedEffectiveness(ntu, capacityRatio);
    case "crossflow-cmax-mixed": {
      // unmixedPart = 1 − e^(−NTU); ε = (1 − e^(−Cr·unmixedPart))/Cr = unmixedPart·(1 − e^(−x))/x, x = Cr·unmixedPart
      const unmixedPart = -Math.expm1(-ntu);
      return unmixedPart * expm1OverX(-capacityRatio * unmixedPart);
    }
    case "crossflow-cmin-mixed": {
      // mixedPart = (1 − e^(−Cr·NTU))/Cr = NTU·(1 − e^(−x))/x, x = Cr·NTU; ε = 1 − e^(−mixedPart)
      const mixedPart = ntu * expm1OverX(-capacityRatio * ntu);
      return -Math.expm1(-mixedPart);
    }
  }
}
