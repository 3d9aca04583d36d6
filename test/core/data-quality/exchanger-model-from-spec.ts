import type { ExchangerModel } from "../../../lib/core/screening";
import type { ExchangerSpec } from "../../../lib/core/simulate";

/** Test helper: what the asset register would hand the core for a simulator spec (tags, uncertainties, reference flows). */
export function exchangerModelFromSpec(spec: ExchangerSpec): ExchangerModel {
  return {
    arrangement: spec.arrangement,
    areaM2: spec.areaM2,
    hotHeatCapacity: spec.hotStream.heatCapacity,
    coldHeatCapacity: spec.coldStream.heatCapacity,
    instruments: spec.instruments.map((instrument) => ({ ...instrument })),
    referenceFlows: { hotKgPerS: spec.reference.hotFlowKgPerS, coldKgPerS: spec.reference.coldFlowKgPerS },
  };
}
