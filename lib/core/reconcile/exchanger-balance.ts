import { meanSpecificHeat, specificHeat, type HeatCapacity } from "../thermal";
import type { OperatingPoint } from "../screening/types";

/** Result of {@link exchangerBalance}. */
export interface ExchangerBalance {
  /** g = Q_hot − Q_cold, W. */
  residualW: number;
  /** Q_hot = m_h·∫cp_h dT from T_ho to T_hi, W (positive when the hot stream cools). */
  hotDutyW: number;
  /** Q_cold = m_c·∫cp_c dT from t_ci to t_co, W (positive when the cold stream heats). */
  coldDutyW: number;
  /**
   * ∂g/∂x in the order hotIn, hotOut, coldIn, coldOut, hotFlow, coldFlow:
   * [m_h·cp_h(T_hi), −m_h·cp_h(T_ho), m_c·cp_c(t_ci), −m_c·cp_c(t_co), Q_hot/m_h, −Q_cold/m_c].
   */
  gradient: [number, number, number, number, number, number];
}

/**
 * exchangerBalance: the steady-state energy balance of a two-stream exchanger and its gradient.
 *
 * Formula: g(x) = m_h·∫_(T_ho)^(T_hi) cp_h dT − m_c·∫_(t_ci)^(t_co) cp_c dT, with ∫cp dT = c̄p·ΔT (meanSpecificHeat).
 * Valid: single-phase sensible heat, no heat loss; temperatures > 0 K, cp > 0 over each range (signed duties: a
 * stream running the wrong way gives a negative duty, which the reconciliation may need to pass through).
 * Source: steady-flow energy balance, Incropera et al. (2007), 6th ed., Sect. 11.3, Eqs. 11.6b–11.7b (from memory).
 *
 * @throws ThermalInputError for non-positive temperatures or cp.
 */
export function exchangerBalance(point: OperatingPoint, hotHeatCapacity: HeatCapacity, coldHeatCapacity: HeatCapacity): ExchangerBalance {
  const hotIntegral = meanSpecificHeat(hotHeatCapacity, point.hotOutK, point.hotInK) * (point.hotInK - point.hotOutK);
  const coldIntegral = meanSpecificHeat(coldHeatCapacity, point.coldInK, point.coldOutK) * (point.coldOutK - point.coldInK);
  const hotDutyW = point.hotFlowKgPerS * hotIntegral;
  const coldDutyW = point.coldFlowKgPerS * coldIntegral;
  return {
    residualW: hotDutyW - coldDutyW,
    hotDutyW,
    coldDutyW,
    gradient: [
      point.hotFlowKgPerS * specificHeat(hotHeatCapacity, point.hotInK),
      -point.hotFlowKgPerS * specificHeat(hotHeatCapacity, point.hotOutK),
      point.coldFlowKgPerS * specificHeat(coldHeatCapacity, point.coldInK),
      -point.coldFlowKgPerS * specificHeat(coldHeatCapacity, point.coldOutK),
      hotIntegral,
      -coldIntegral,
    ],
  };
}
