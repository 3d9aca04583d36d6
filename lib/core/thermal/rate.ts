import { checkArrangement } from "./arrangement-checks";
import { effectivenessFromNTU } from "./effectiveness-from-ntu";
import { ThermalInputError } from "./errors";
import { flowKindFor } from "./flow-kind-for";
import { onSide, requirePositive } from "./input-checks";
import { meanSpecificHeat } from "./mean-specific-heat";
import { specificHeat } from "./specific-heat";
import { streamDuty } from "./stream-duty";
import type { Rating, RatingInput, StreamInlet, StreamSide } from "./types";

/** Outlet temperatures of successive iterations must agree to this, K. */
export const RATING_TEMPERATURE_TOLERANCE_K = 1e-9;
/**
 * Iteration cap for temperature-dependent cp. The fixed-point map contracts by roughly |slope|·ΔT/(2·c̄p) per step
 * (well below 1 for realistic fits), so the cap is only reached by fits whose cp changes by its own size over the range.
 */
export const RATING_MAXIMUM_ITERATIONS = 200;

function checkInlet(stream: StreamInlet): void {
  requirePositive(stream.massFlowKgPerS, "mass flow", "kg/s");
  requirePositive(stream.inletK, "inlet temperature", "K");
  specificHeat(stream.heatCapacity, stream.inletK);
}

/**
 * Rates an exchanger: outlet temperatures and duty from U, A, arrangement and the two inlets (ε–NTU method).
 *
 * Formula: Q = ε(NTU, Cr)·Cmin·(T_hi − t_ci), C = m·c̄p, NTU = U·A/Cmin, Cr = Cmin/Cmax, T_ho = T_hi − Q/C_hot, t_co = t_ci + Q/C_cold,
 * with ε from effectivenessFromNTU for flowKindFor(arrangement, Cmin side).
 * With a linear cp, each stream's c̄p is its integral mean between inlet and current outlet estimate (for a linear
 * cp that is cp at the mean stream temperature); the estimate is iterated from the inlets until both outlets change
 * by at most 1e-9 K. The returned duty is streamDuty() of the hot side at the final outlet, so that the hot and
 * cold enthalpy changes agree to the iteration tolerance.
 * Valid: U, A, flows positive; T_hi > t_ci; cp positive over the streams' ranges; the constant-cp ε–NTU
 * relations (single phase, uniform U) with capacity rates evaluated at mean stream temperatures.
 * Source: Incropera et al. (2007), Fundamentals of Heat and Mass Transfer, 6th ed., Sect. 11.4 (ε–NTU method) and
 * Table 11.3; evaluating cp at the mean stream temperature is common practice.
 * Ties: when C_hot = C_cold the cold stream is reported as Cmin (the relations coincide at Cr = 1).
 *
 * @returns duty W, outlet temperatures K, ε, NTU, Cr and which stream is Cmin
 * @throws ThermalInputError: "non-positive"/"not-finite" for U, area, flows, temperatures or cp (naming the side);
 *   "non-positive" when the hot inlet is not above the cold inlet ("inlet temperature difference");
 *   "out-of-range" if the cp iteration does not converge
 */
export function rate(input: RatingInput): Rating {
  const u = requirePositive(input.uWPerM2K, "overall heat-transfer coefficient U", "W/(m²·K)");
  const area = requirePositive(input.areaM2, "heat-transfer area", "m²");
  const arrangement = checkArrangement(input.arrangement);
  const { hot, cold } = input;
  onSide("hot", () => checkInlet(hot));
  onSide("cold", () => checkInlet(cold));
  const inletDifference = hot.inletK - cold.inletK;
  if (!(inletDifference > 0)) {
    throw new ThermalInputError(
      "inlet temperature difference",
      inletDifference,
      "non-positive",
      `hot inlet must be above cold inlet: inlet temperature difference (hot inlet minus cold inlet) must be positive, got ${inletDifference} K`,
    );
  }
  const conductance = u * area;
  const bothConstant = hot.heatCapacity.kind === "constant" && cold.heatCapacity.kind === "constant";

  let hotOutletK = hot.inletK;
  let coldOutletK = cold.inletK;
  let converged = false;
  let result: Omit<Rating, "hotOutletK" | "coldOutletK"> | undefined;
  for (let iteration = 0; iteration < RATING_MAXIMUM_ITERATIONS; iteration += 1) {
    const currentHotOutletK = hotOutletK;
    const currentColdOutletK = coldOutletK;
    const hotRate =
      hot.massFlowKgPerS * onSide("hot", () => meanSpecificHeat(hot.heatCapacity, hot.inletK, currentHotOutletK));
    const coldRate =
      cold.massFlowKgPerS * onSide("cold", () => meanSpecificHeat(cold.heatCapacity, cold.inletK, currentColdOutletK));
    const cminStream: StreamSide = coldRate <= hotRate ? "cold" : "hot";
    const minimumRate = Math.min(hotRate, coldRate);
    const capacityRatio = minimumRate / Math.max(hotRate, coldRate);
    const ntu = conductance / minimumRate;
    const effectiveness = effectivenessFromNTU(ntu, capacityRatio, flowKindFor(arrangement, cminStream));
    const dutyW = effectiveness * minimumRate * inletDifference;
    hotOutletK = hot.inletK - dutyW / hotRate;
    coldOutletK = cold.inletK + dutyW / coldRate;
    result = { dutyW, effectiveness, ntu, capacityRatio, cminStream };
    const change = Math.max(Math.abs(hotOutletK - currentHotOutletK), Math.abs(coldOutletK - currentColdOutletK));
    if (bothConstant || change <= RATING_TEMPERATURE_TOLERANCE_K) {
      converged = true;
      break;
    }
  }
  if (!converged || result === undefined) {
    throw new ThermalInputError(
      "outlet temperature iteration",
      RATING_MAXIMUM_ITERATIONS,
      "out-of-range",
      `outlet temperatures did not converge to ${RATING_TEMPERATURE_TOLERANCE_K} K within ${RATING_MAXIMUM_ITERATIONS} iterations; the specific heat varies too strongly over the streams' temperature ranges`,
    );
  }
  const finalHotOutletK = hotOutletK;
  const dutyW = bothConstant
    ? result.dutyW
    : onSide("hot", () =>
        streamDuty({
          massFlowKgPerS: hot.massFlowKgPerS,
          heatCapacity: hot.heatCapacity,
          inletK: hot.inletK,
          outletK: finalHotOutletK,
        }),
      );
  return {
    dutyW,
    hotOutletK,
    coldOutletK,
    effectiveness: result.effectiveness,
    ntu: result.ntu,
    capacityRatio: result.capacityRatio,
    cminStream: result.cminStream,
  };
}
