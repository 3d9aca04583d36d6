import { onSide } from "./input-checks";
import { streamDuty } from "./stream-duty";
import type { HeatBalance, StreamEnds } from "./types";

/**
 * Hot-side and cold-side duties of an exchanger and how well they close.
 *
 * Formula: Q_hot = m_h·|∫cp_h dT|, Q_cold = m_c·|∫cp_c dT|, imbalance = Q_hot − Q_cold, closure = imbalance/((Q_hot + Q_cold)/2).
 * Valid: positive flows and temperatures, cp > 0 over each stream's range. Closure is 0 when both duties are 0.
 * Source: steady-flow energy balance, Incropera et al. (2007), 6th ed., Sect. 11.3 (from memory).
 *
 * @returns duties in W and the dimensionless closure
 * @throws ThermalInputError naming the side, e.g. "hot mass flow must be positive, got -2 kg/s"
 */
export function heatBalance(input: { hot: StreamEnds; cold: StreamEnds }): HeatBalance {
  const hotDutyW = onSide("hot", () => streamDuty(input.hot));
  const coldDutyW = onSide("cold", () => streamDuty(input.cold));
  const meanDutyW = (hotDutyW + coldDutyW) / 2;
  const imbalanceW = hotDutyW - coldDutyW;
  const closure = meanDutyW === 0 ? 0 : imbalanceW / meanDutyW;
  return { hotDutyW, coldDutyW, meanDutyW, imbalanceW, closure };
}
