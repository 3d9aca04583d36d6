import { requirePositive } from "./input-checks";
import { meanSpecificHeat } from "./mean-specific-heat";
import type { StreamEnds } from "./types";

/**
 * Heat duty of one stream from its flow and end temperatures (magnitude; direction is not checked here).
 *
 * Formula: Q = m·|∫ cp dT from T_in to T_out| = m·c̄·|T_out − T_in|.
 * Valid: m > 0, temperatures > 0 K, cp > 0 over the range; single-phase sensible heat only.
 * Source: steady-flow energy balance, Incropera, DeWitt, Bergman & Lavine (2007), Fundamentals of Heat and
 * Mass Transfer, 6th ed., Sect. 11.3, Eqs. 11.6b–11.7b (from memory).
 *
 * @param stream mass flow kg/s, heat capacity, inlet and outlet temperature K
 * @returns duty, W, never negative
 * @throws ThermalInputError for non-finite or non-positive flow or temperature, or cp ≤ 0
 * @example streamDuty({ massFlowKgPerS: 2, heatCapacity: { kind: "constant", jPerKgK: 4180 }, inletK: 300, outletK: 310 }) // 83600
 */
export function streamDuty(stream: StreamEnds): number {
  requirePositive(stream.massFlowKgPerS, "mass flow", "kg/s");
  const meanCp = meanSpecificHeat(stream.heatCapacity, stream.inletK, stream.outletK);
  return stream.massFlowKgPerS * meanCp * Math.abs(stream.outletK - stream.inletK);
}
