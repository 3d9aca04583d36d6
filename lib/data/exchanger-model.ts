// Builds the core's exchanger descriptions from an asset register row.
import type { Asset, Instrument } from "../../generated/prisma/client";
import type { ReferenceConditions } from "../core/forecast/types";
import type { ExchangerModel, InstrumentRole } from "../core/screening/types";
import type { HeatCapacity } from "../core/thermal";
import { arrangementFromColumns, heatCapacityFromColumns } from "./asset-columns";

const MEASUREMENT_ROLES: readonly InstrumentRole[] = ["hotIn", "hotOut", "coldIn", "coldOut", "hotFlow", "coldFlow"];

/** Uncertainty used when the register lists no instrument for a role (common practice: 0.5 K, 2 % of flow). */
const DEFAULT_TEMPERATURE_UNCERTAINTY_K = 0.5;
const DEFAULT_FLOW_UNCERTAINTY_FRACTION = 0.02;

export function assetHeatCapacities(asset: Asset): { hot: HeatCapacity; cold: HeatCapacity } {
  return {
    hot: heatCapacityFromColumns({ kind: asset.hotCpKind, intercept: asset.hotCpIntercept, slope: asset.hotCpSlope, pressurePa: asset.hotCpPressurePa }),
    cold: heatCapacityFromColumns({ kind: asset.coldCpKind, intercept: asset.coldCpIntercept, slope: asset.coldCpSlope, pressurePa: asset.coldCpPressurePa }),
  };
}

/** The asset's geometry, stream heat capacities and reference conditions (inlets and flows) from its register row. */
export function assetReferenceRating(asset: Asset): Omit<ReferenceConditions, "cleanResistanceM2KPerW"> {
  const capacities = assetHeatCapacities(asset);
  return {
    arrangement: arrangementFromColumns(asset),
    areaM2: asset.areaM2,
    hotHeatCapacity: capacities.hot,
    coldHeatCapacity: capacities.cold,
    reference: { hotInletK: asset.refHotInletK, coldInletK: asset.refColdInletK, hotFlowKgPerS: asset.refHotFlowKgPerS, coldFlowKgPerS: asset.refColdFlowKgPerS },
  };
}

/** The screening model of an asset; roles without a registered instrument get default uncertainties and a placeholder tag. */
export function exchangerModel(asset: Asset & { instruments: Instrument[] }): ExchangerModel {
  const { reference, ...rating } = assetReferenceRating(asset);
  return {
    ...rating,
    referenceFlows: { hotKgPerS: reference.hotFlowKgPerS, coldKgPerS: reference.coldFlowKgPerS },
    instruments: MEASUREMENT_ROLES.map((role) => {
      const registered = asset.instruments.find((instrument) => instrument.role === role);
      if (registered) return { role, tag: registered.tag, standardUncertainty: registered.standardUncertainty };
      const flow = role === "hotFlow" ? asset.refHotFlowKgPerS : role === "coldFlow" ? asset.refColdFlowKgPerS : null;
      return { role, tag: `${asset.tag}:${role}`, standardUncertainty: flow === null ? DEFAULT_TEMPERATURE_UNCERTAINTY_K : DEFAULT_FLOW_UNCERTAINTY_FRACTION * flow };
    }),
  };
}
