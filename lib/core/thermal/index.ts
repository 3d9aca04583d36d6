/**
 * Thermal rating core: pure functions, SI units (K, kg/s, J/(kg·K), W, m², W/(m²·K), m²·K/W).
 */
export type {
  Arrangement,
  FlowKind,
  HeatBalance,
  HeatCapacity,
  MeanTemperatureDifference,
  ObservedU,
  ObservedUInput,
  Rating,
  RatingInput,
  StreamEnds,
  StreamInlet,
  StreamSide,
  TerminalTemperatures,
} from "./types";
export { ThermalInputError, type ThermalErrorReason } from "./errors";
export { specificHeat } from "./specific-heat";
export { meanSpecificHeat } from "./mean-specific-heat";
export { streamDuty } from "./stream-duty";
export { heatBalance } from "./heat-balance";
export { logMeanTemperatureDifference } from "./log-mean-temperature-difference";
export { counterflowLMTD } from "./counterflow-lmtd";
export { parallelFlowLMTD } from "./parallel-flow-lmtd";
export { shellAndTubeCorrectionFactor } from "./shell-and-tube-correction-factor";
export { thermalEffectivenessP } from "./thermal-effectiveness-p";
export { capacityRatioR } from "./capacity-ratio-r";
export { correctionFactor } from "./correction-factor";
export { meanTemperatureDifference } from "./mean-temperature-difference";
export { effectivenessFromNTU } from "./effectiveness-from-ntu";
export { ntuFromEffectiveness } from "./ntu-from-effectiveness";
export { maximumEffectiveness } from "./maximum-effectiveness";
export { flowKindFor } from "./flow-kind-for";
export { rate } from "./rate";
export { observedU } from "./observed-u";
export { foulingResistance } from "./fouling-resistance";
export { maximumDuty } from "./maximum-duty";
