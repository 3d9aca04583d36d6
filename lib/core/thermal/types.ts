/**
 * Shared types of the thermal rating core. Everything is SI: absolute temperatures in kelvin,
 * mass flow in kg/s, specific heat in J/(kg·K), duty in W, area in m², U in W/(m²·K).
 */

/**
 * Specific heat of a stream: constant; linear in absolute temperature,
 * cp(T) = interceptJPerKgK + slopeJPerKgK2 · T, with T in kelvin; or liquid water at a stated
 * pressure (IAPWS-IF97 Region 1, see lib/core/fluids).
 */
export type HeatCapacity =
  | { kind: "constant"; jPerKgK: number }
  | { kind: "linear"; interceptJPerKgK: number; slopeJPerKgK2: number }
  | { kind: "water"; pressurePa: number };

/**
 * Flow arrangement of an exchanger.
 * - "shell-and-tube": N shells in series, each one shell pass with an even number of tube passes (TEMA E shell).
 * - "crossflow-unmixed": single-pass crossflow, both streams unmixed.
 * - "crossflow-mixed": single-pass crossflow, the named stream mixed and the other unmixed.
 */
export type Arrangement =
  | { kind: "counterflow" }
  | { kind: "parallel" }
  | { kind: "shell-and-tube"; shells: number }
  | { kind: "crossflow-unmixed" }
  | { kind: "crossflow-mixed"; mixedStream: "hot" | "cold" };

/** The four terminal temperatures of a two-stream exchanger, kelvin. */
export interface TerminalTemperatures {
  hotInK: number;
  hotOutK: number;
  coldInK: number;
  coldOutK: number;
}

/** A stream entering an exchanger being rated. */
export interface StreamInlet {
  massFlowKgPerS: number;
  heatCapacity: HeatCapacity;
  inletK: number;
}

/** A stream with both ends known (measured or rated). */
export interface StreamEnds {
  massFlowKgPerS: number;
  heatCapacity: HeatCapacity;
  inletK: number;
  outletK: number;
}

/** Which stream has the smaller heat capacity rate m·cp. */
export type StreamSide = "hot" | "cold";

/**
 * Flow kind as seen by the effectiveness–NTU relations, which are written for the stream with the smaller
 * capacity rate (Cmin). For mixed crossflow it matters whether Cmin or Cmax is the mixed stream.
 * `{ shells: N }` is N TEMA E shells in series, each with an even number of tube passes.
 */
export type FlowKind =
  | "counterflow"
  | "parallel"
  | "crossflow-unmixed"
  | "crossflow-cmin-mixed"
  | "crossflow-cmax-mixed"
  | { shells: number };

/** Result of {@link heatBalance}. */
export interface HeatBalance {
  /** Hot-side duty, W. */
  hotDutyW: number;
  /** Cold-side duty, W. */
  coldDutyW: number;
  /** Mean of the two duties, W. */
  meanDutyW: number;
  /** Hot duty minus cold duty, W. */
  imbalanceW: number;
  /** Imbalance divided by the mean duty, dimensionless (0 when both duties are 0). */
  closure: number;
}

/** Result of {@link meanTemperatureDifference}. */
export interface MeanTemperatureDifference {
  /** Counterflow log-mean temperature difference of the four terminals, K. */
  lmtdK: number;
  /** Correction factor F relative to the counterflow LMTD, dimensionless. */
  correctionFactor: number;
  /** Effective mean temperature difference F·LMTD, K. */
  meanK: number;
}

/** Input of {@link rate}. */
export interface RatingInput {
  uWPerM2K: number;
  areaM2: number;
  arrangement: Arrangement;
  hot: StreamInlet;
  cold: StreamInlet;
}

/** Result of {@link rate}. */
export interface Rating {
  dutyW: number;
  hotOutletK: number;
  coldOutletK: number;
  effectiveness: number;
  ntu: number;
  capacityRatio: number;
  cminStream: StreamSide;
}

/** Input of {@link observedU}. */
export interface ObservedUInput {
  dutyW: number;
  areaM2: number;
  arrangement: Arrangement;
  temperatures: TerminalTemperatures;
}

/** Result of {@link observedU}. */
export interface ObservedU {
  uWPerM2K: number;
  meanTemperatureDifferenceK: number;
  correctionFactor: number;
  lmtdK: number;
}
