import type { InstrumentRole } from "../screening/types";

/** A single-instrument fault hypothesis for the GLR: a temperature offset (K) or a flow span error (fraction). */
export interface FaultCandidate {
  role: InstrumentRole;
  /** "bias": reading = true + b (K); "scale": reading = true·(1 + b). */
  kind: "bias" | "scale";
  /** Position in the operating-point vector (hotIn, hotOut, coldIn, coldOut, hotFlow, coldFlow). */
  index: number;
}

/** The six candidates, in vector order: offsets on the four thermometers, span errors on the two flow meters. */
export const FAULT_CANDIDATES: readonly FaultCandidate[] = [
  { role: "hotIn", kind: "bias", index: 0 },
  { role: "hotOut", kind: "bias", index: 1 },
  { role: "coldIn", kind: "bias", index: 2 },
  { role: "coldOut", kind: "bias", index: 3 },
  { role: "hotFlow", kind: "scale", index: 4 },
  { role: "coldFlow", kind: "scale", index: 5 },
];
