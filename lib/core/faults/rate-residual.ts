import { meanTemperatureDifference, ThermalInputError } from "../thermal";
import type { OperatingPoint } from "../screening/types";
import { exchangerBalance } from "../reconcile/exchanger-balance";
import { predictOverallCoefficient } from "./predict-overall-coefficient";
import type { RateEquationSetup } from "./types";

/** Result of {@link rateResidual}. */
export interface RateResidual {
  /** h = Q̂ − U·A·F·LMTD, W (NaN when the terminals are invalid for the arrangement). */
  residualW: number;
  /** Q̂ = w·Q_hot + (1 − w)·Q_cold, W. */
  dutyW: number;
  /** g = Q_hot − Q_cold, W. */
  balanceW: number;
}

/**
 * rateResidual: the heat-transfer rate equation residual of an operating point, with the energy balance beside it.
 *
 * Formula: h(x, t) = w·Q_hot(x) + (1 − w)·Q_cold(x) − U(m_h, m_c, t)·A·F(x)·LMTD(x), with U from the flow- and
 * time-dependent coefficient model fitted before the period examined, F·LMTD from the thermal core.
 * Why: a bias on an inlet and on an outlet temperature of the same stream have the same energy-balance signature (up
 * to sign), but move the terminal temperature differences, and so the LMTD, by different amounts (∂LMTD/∂ΔT₁ ≠
 * ∂LMTD/∂ΔT₂ unless ΔT₁ = ΔT₂), and flow-meter errors change Q̂ and U(m) differently on the two sides. With U
 * known from before the fault (fouling is slow), this second equation separates the candidates the balance cannot.
 * Valid: quasi-steady operation; the U model valid for the flows (fouling change since the fit small).
 * Source: rate equation Q = U·A·F·LMTD (Incropera et al. 2007, 6th ed., Eq. 11.14, 11.18; from memory); analytical
 * redundancy from a second model equation, cf. Narasimhan & Jordache (2000), ch. 8 (from memory).
 */
export function rateResidual(point: OperatingPoint, timeMs: number, setup: RateEquationSetup): RateResidual {
  const balance = exchangerBalance(point, setup.hotHeatCapacity, setup.coldHeatCapacity);
  const dutyW = setup.hotWeight * balance.hotDutyW + (1 - setup.hotWeight) * balance.coldDutyW;
  let residualW = Number.NaN;
  try {
    const difference = meanTemperatureDifference(point, setup.arrangement);
    const u = predictOverallCoefficient(setup.coefficient, point.hotFlowKgPerS, point.coldFlowKgPerS, timeMs);
    residualW = dutyW - u * setup.areaM2 * difference.meanK;
  } catch (error) {
    if (!(error instanceof ThermalInputError)) throw error;
  }
  return { residualW, dutyW, balanceW: balance.residualW };
}
