// An asset's register entry in the asset-file format (docs/asset-file.md), so
// it can be saved, edited and loaded back with `asset update`.
import type { PrismaClient } from "../../generated/prisma/client";
import { fromSI } from "../core/units";
import type { AssetFileDocument, HeatCapacityDocument } from "../validation/asset-document";
import { arrangementFromColumns } from "./asset-columns";

const round = (value: number, digits = 10) => Number(value.toPrecision(digits));
const celsius = (kelvin: number) => ({ value: round(fromSI("temperature", kelvin, "degC")), unit: "degC" });
const money = (value: number | null) => (value === null ? undefined : value / 100);

export async function exportAssetFile(prisma: PrismaClient, tag: string): Promise<AssetFileDocument | null> {
  const asset = await prisma.asset.findUnique({ where: { tag }, include: { unit: { include: { site: true } }, instruments: { orderBy: { role: "asc" } } } });
  if (!asset) return null;
  const arrangement = arrangementFromColumns(asset);
  const heatCapacity = (kind: string, intercept: number, slope: number, pressurePa: number | null): HeatCapacityDocument =>
    kind === "water"
      ? { kind: "water", pressure: { value: round((pressurePa ?? 0) / 1e3), unit: "kPa" } }
      : kind === "linear"
        ? { kind: "linear", interceptJPerKgK: intercept, slopeJPerKgK2: slope }
        : { kind: "constant", value: { value: intercept, unit: "J/(kg.K)" } };
  const economics: Record<string, number> = Object.fromEntries(
    Object.entries({
      fuelPricePerGJ: money(asset.fuelPriceCentsPerGJ),
      furnaceEfficiency: asset.furnaceEfficiency ?? undefined,
      co2KgPerGJ: asset.co2KgPerGJ ?? undefined,
      co2PricePerTonne: money(asset.co2PriceCentsPerTonne),
      cleaningCost: money(asset.cleaningCostCents),
      cleaningOutageDays: asset.cleaningOutageDays ?? undefined,
      lostProductionPerDay: money(asset.lostProductionCentsPerDay),
    }).filter((entry): entry is [string, number] => entry[1] !== undefined),
  );
  return {
    tag: asset.tag,
    name: asset.name,
    site: { code: asset.unit.site.code, name: asset.unit.site.name, timeZone: asset.unit.site.timeZone },
    unit: { code: asset.unit.code, name: asset.unit.name },
    service: asset.service,
    arrangement:
      arrangement.kind === "shell-and-tube"
        ? { kind: "shell-and-tube", shells: arrangement.shells, tubePasses: asset.tubePasses }
        : arrangement.kind === "counterflow" || arrangement.kind === "parallel"
          ? { kind: arrangement.kind, tubePasses: asset.tubePasses }
          : arrangement,
    area: { value: asset.areaM2, unit: "m2" },
    hotStream: { name: asset.hotStreamName, heatCapacity: heatCapacity(asset.hotCpKind, asset.hotCpIntercept, asset.hotCpSlope, asset.hotCpPressurePa) },
    coldStream: { name: asset.coldStreamName, heatCapacity: heatCapacity(asset.coldCpKind, asset.coldCpIntercept, asset.coldCpSlope, asset.coldCpPressurePa) },
    designDuty: { value: round(asset.designDutyW / 1e3), unit: "kW" },
    designU: { value: asset.designUWPerM2K, unit: "W/(m2.K)" },
    designFouling: { value: asset.designFoulingM2KPerW, unit: "m2.K/W" },
    reference: {
      hotInlet: celsius(asset.refHotInletK),
      coldInlet: celsius(asset.refColdInletK),
      hotFlow: { value: asset.refHotFlowKgPerS, unit: "kg/s" },
      coldFlow: { value: asset.refColdFlowKgPerS, unit: "kg/s" },
    },
    dutyThreshold: { value: round(asset.dutyThresholdW / 1e3), unit: "kW" },
    ...(asset.minimumOutletK !== null && (asset.minimumOutletStream === "hot" || asset.minimumOutletStream === "cold")
      ? { minimumOutlet: { stream: asset.minimumOutletStream, temperature: celsius(asset.minimumOutletK) } }
      : {}),
    instruments: asset.instruments.map((instrument) => ({
      role: instrument.role,
      tag: instrument.tag,
      uncertainty: instrument.standardUncertainty,
    })),
    economics,
    notes: asset.notes,
  };
}
