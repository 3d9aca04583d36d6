// The asset file as Foulcast writes it (export): every quantity as { value, unit }.
// A document always parses with assetFileSchema.

export interface Measure {
  value: number;
  unit: string;
}

export type HeatCapacityDocument =
  | { kind: "constant"; value: Measure }
  | { kind: "linear"; interceptJPerKgK: number; slopeJPerKgK2: number }
  | { kind: "water"; pressure: Measure };

export type ArrangementDocument =
  | { kind: "shell-and-tube"; shells: number; tubePasses: number }
  | { kind: "counterflow" | "parallel"; tubePasses: number }
  | { kind: "crossflow-unmixed" }
  | { kind: "crossflow-mixed"; mixedStream: "hot" | "cold" };

export interface AssetFileDocument {
  tag: string;
  name: string;
  site: { code: string; name: string; timeZone: string };
  unit: { code: string; name: string };
  service: string;
  arrangement: ArrangementDocument;
  area: Measure;
  hotStream: { name: string; heatCapacity: HeatCapacityDocument };
  coldStream: { name: string; heatCapacity: HeatCapacityDocument };
  designDuty: Measure;
  designU: Measure;
  designFouling: Measure;
  reference: { hotInlet: Measure; coldInlet: Measure; hotFlow: Measure; coldFlow: Measure };
  dutyThreshold: Measure;
  minimumOutlet?: { stream: "hot" | "cold"; temperature: Measure };
  instruments: { role: string; tag: string; uncertainty: number }[];
  economics: Record<string, number>;
  notes: string;
}
