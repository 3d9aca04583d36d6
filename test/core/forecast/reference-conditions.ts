import type { ReferenceConditions } from "../../../lib/core/forecast";

/** Counterflow, constant cp: hot 10 kg/s × 2000 J/(kg·K) = 20 kW/K, cold 8 kg/s × 4000 = 32 kW/K, 400 → 300 K inlets. */
export const CONDITIONS: ReferenceConditions = {
  arrangement: { kind: "counterflow" },
  areaM2: 100,
  hotHeatCapacity: { kind: "constant", jPerKgK: 2000 },
  coldHeatCapacity: { kind: "constant", jPerKgK: 4000 },
  reference: { hotInletK: 400, coldInletK: 300, hotFlowKgPerS: 10, coldFlowKgPerS: 8 },
  cleanResistanceM2KPerW: 2e-3,
};
export const CMIN = 20_000;
export const CR = 20_000 / 32_000;

/** Counterflow Rf for a given effectiveness: NTU = ln((1 − εCr)/(1 − ε))/(1 − Cr), Rf = A/(NTU·Cmin) − R0. */
export function counterflowFouling(effectiveness: number): number {
  const ntu = Math.log((1 - effectiveness * CR) / (1 - effectiveness)) / (1 - CR);
  return CONDITIONS.areaM2 / (ntu * CMIN) - CONDITIONS.cleanResistanceM2KPerW;
}
