// Conversions between the register's domain values (SI, thermal-core types)
// and the Asset table's columns. Used by every read and write of assets.
import type { Arrangement, HeatCapacity } from "../core/thermal";

export interface HeatCapacityColumns {
  kind: string;
  intercept: number;
  slope: number;
  pressurePa: number | null;
}

export function heatCapacityToColumns(capacity: HeatCapacity): HeatCapacityColumns {
  switch (capacity.kind) {
    case "constant":
      return { kind: "constant", intercept: capacity.jPerKgK, slope: 0, pressurePa: null };
    case "linear":
      return { kind: "linear", intercept: capacity.interceptJPerKgK, slope: capacity.slopeJPerKgK2, pressurePa: null };
    case "water":
      return { kind: "water", intercept: 0, slope: 0, pressurePa: capacity.pressurePa };
  }
}

export function heatCapacityFromColumns(columns: HeatCapacityColumns): HeatCapacity {
  switch (columns.kind) {
    case "constant":
      return { kind: "constant", jPerKgK: columns.intercept };
    case "linear":
      return { kind: "linear", interceptJPerKgK: columns.intercept, slopeJPerKgK2: columns.slope };
    case "water":
      if (columns.pressurePa === null) throw new Error("a water heat capacity is stored without its pressure");
      return { kind: "water", pressurePa: columns.pressurePa };
    default:
      throw new Error(`unknown heat-capacity kind "${columns.kind}" in the asset register`);
  }
}

export interface ArrangementColumns {
  arrangementKind: string;
  shells: number;
  mixedStream: string | null;
}

export function arrangementToColumns(arrangement: Arrangement): ArrangementColumns {
  return {
    arrangementKind: arrangement.kind,
    shells: arrangement.kind === "shell-and-tube" ? arrangement.shells : 1,
    mixedStream: arrangement.kind === "crossflow-mixed" ? arrangement.mixedStream : null,
  };
}

export function arrangementFromColumns(columns: ArrangementColumns): Arrangement {
  switch (columns.arrangementKind) {
    case "counterflow":
    case "parallel":
    case "crossflow-unmixed":
      return { kind: columns.arrangementKind };
    case "shell-and-tube":
      return { kind: "shell-and-tube", shells: columns.shells };
    case "crossflow-mixed":
      if (columns.mixedStream !== "hot" && columns.mixedStream !== "cold") throw new Error("a crossflow-mixed asset is stored without its mixed stream");
      return { kind: "crossflow-mixed", mixedStream: columns.mixedStream };
    default:
      throw new Error(`unknown arrangement "${columns.arrangementKind}" in the asset register`);
  }
}
