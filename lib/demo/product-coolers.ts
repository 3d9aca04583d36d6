import type { DemoAssetDefinition } from "./demo-asset-definition";
import { DEMO_HEAT_CAPACITY as CP } from "./demo-streams";

const ONE_SHELL = { kind: "shell-and-tube", shells: 1 } as const;
const TWO_SHELLS = { kind: "shell-and-tube", shells: 2 } as const;
const COOLING_WATER = { name: "cooling water", heatCapacity: CP.coolingWater };
/** Cooling-water supply at reference: 25 °C. */
const COOLING_WATER_SUPPLY_K = 298.15;

/**
 * Unit RDC-3 product rundown coolers on cooling-tower water (tube side, cold). Total design fouling
 * 0.00035–0.0005 m²·K/W: treated cooling-tower water 0.000176–0.000352 (TEMA RGP-T-2.4, FIELD-NOTES §3 [V])
 * plus the product side. Cooling-water fouling is mostly falling-rate or asymptotic.
 */
export const PRODUCT_COOLERS: DemoAssetDefinition[] = [
  {
    tag: "E-3101", name: "Naphtha product trim cooler", unitCode: "RDC-3", service: "product cooler",
    arrangement: ONE_SHELL, tubePasses: 2, areaM2: 100,
    hotStream: { name: "naphtha product", heatCapacity: CP.naphtha }, coldStream: COOLING_WATER,
    reference: { hotInletK: 328.15, coldInletK: COOLING_WATER_SUPPLY_K, hotFlowKgPerS: 20, coldFlowKgPerS: 30 },
    designDutyW: 880_000, designUWPerM2K: 620, designFoulingM2KPerW: 0.00035,
    hotFilmShare: 0.5, coldFilmShare: 0.35, thresholdFraction: 0.83,
    temperatureUncertaintyK: 0.3, flowUncertaintyFraction: 0.015, hotInletPattern: "process", coldInletPattern: "cooling-water",
    fouling: { shape: { kind: "falling-rate", exponent: 0.5 }, serviceStart: "2023-10-02T06:00:00Z", initialFraction: 0,
      cycleMultipliers: [1], target: { crossing: "2027-10-01T00:00:00Z" } },
    cleanings: [],
    faults: [], notes: "Falling-rate cooling-water fouling, never cleaned in the data; crosses about ten months after the data end.",
  },
  {
    tag: "E-3102", name: "Kerosene rundown cooler", unitCode: "RDC-3", service: "product cooler",
    arrangement: ONE_SHELL, tubePasses: 2, areaM2: 80,
    hotStream: { name: "kerosene product", heatCapacity: CP.kerosene }, coldStream: COOLING_WATER,
    reference: { hotInletK: 345.15, coldInletK: COOLING_WATER_SUPPLY_K, hotFlowKgPerS: 13, coldFlowKgPerS: 25 },
    designDutyW: 894_000, designUWPerM2K: 520, designFoulingM2KPerW: 0.00035,
    hotFilmShare: 0.55, coldFilmShare: 0.3, thresholdFraction: 0.83,
    temperatureUncertaintyK: 0.3, flowUncertaintyFraction: 0.015, hotInletPattern: "process", coldInletPattern: "cooling-water",
    fouling: { shape: { kind: "asymptotic", timeConstantDays: 300 }, serviceStart: "2024-06-10T06:00:00Z", initialFraction: 0,
      cycleMultipliers: [1.1, 1], target: { crossing: "2028-05-01T00:00:00Z" } },
    cleanings: [{ start: "2025-07-14T06:00:00Z", durationDays: 3, effectiveness: 0.9, method: "hydroblast tube side" }],
    faults: [], notes: "Slow asymptotic fouling; crosses about seventeen months after the data end.",
  },
  {
    tag: "E-3103", name: "Diesel rundown cooler", unitCode: "RDC-3", service: "product cooler",
    arrangement: ONE_SHELL, tubePasses: 4, areaM2: 110,
    hotStream: { name: "diesel product", heatCapacity: CP.lightGasOil }, coldStream: COOLING_WATER,
    reference: { hotInletK: 353.15, coldInletK: COOLING_WATER_SUPPLY_K, hotFlowKgPerS: 15, coldFlowKgPerS: 30 },
    designDutyW: 1_210_000, designUWPerM2K: 480, designFoulingM2KPerW: 0.00044,
    hotFilmShare: 0.55, coldFilmShare: 0.3, thresholdFraction: 0.83,
    temperatureUncertaintyK: 0.3, flowUncertaintyFraction: 0.015, hotInletPattern: "process", coldInletPattern: "cooling-water",
    fouling: { shape: { kind: "falling-rate", exponent: 0.6 }, serviceStart: "2024-03-11T06:00:00Z", initialFraction: 0.02,
      cycleMultipliers: [1.1, 1], target: { crossing: "2027-04-15T00:00:00Z" } },
    cleanings: [{ start: "2025-04-07T06:00:00Z", durationDays: 3, effectiveness: 0.95, method: "hydroblast tube side" }],
    faults: [], notes: "Falling-rate fouling, one cleaning; crosses about four and a half months after the data end.",
  },
  {
    tag: "E-3104", name: "Heavy gas oil rundown cooler", unitCode: "RDC-3", service: "product cooler",
    arrangement: ONE_SHELL, tubePasses: 2, areaM2: 90,
    hotStream: { name: "heavy gas oil product", heatCapacity: CP.heavyGasOil }, coldStream: COOLING_WATER,
    reference: { hotInletK: 383.15, coldInletK: COOLING_WATER_SUPPLY_K, hotFlowKgPerS: 10, coldFlowKgPerS: 22 },
    designDutyW: 1_250_000, designUWPerM2K: 380, designFoulingM2KPerW: 0.00053,
    hotFilmShare: 0.6, coldFilmShare: 0.25, thresholdFraction: 0.82,
    temperatureUncertaintyK: 0.4, flowUncertaintyFraction: 0.015, hotInletPattern: "process", coldInletPattern: "cooling-water",
    fouling: { shape: { kind: "asymptotic", timeConstantDays: 180 }, serviceStart: "2024-04-15T06:00:00Z", initialFraction: 0.03,
      cycleMultipliers: [1, 1.1, 1], target: { crossing: "2026-12-20T00:00:00Z" } },
    cleanings: [
      { start: "2025-02-10T06:00:00Z", durationDays: 3, effectiveness: 0.9, method: "hydroblast tube side" },
      { start: "2026-02-16T06:00:00Z", durationDays: 3, effectiveness: 0.85, method: "hydroblast tube side" },
    ],
    faults: [
      { role: "coldFlow", kind: "stuck", start: "2026-07-06T08:00:00Z", end: "2026-08-24T12:00:00Z", size: 0,
        description: "Cooling-water flow meter frozen at its last reading for seven weeks until repaired." },
    ],
    notes: "Nearly due (three weeks after the data end); its cooling-water flow meter was stuck for seven weeks in summer.",
  },
  {
    tag: "E-3105", name: "Atmospheric residue rundown cooler", unitCode: "RDC-3", service: "product cooler",
    arrangement: ONE_SHELL, tubePasses: 2, areaM2: 80,
    hotStream: { name: "atmospheric residue", heatCapacity: CP.atmosphericResidue }, coldStream: COOLING_WATER,
    reference: { hotInletK: 433.15, coldInletK: COOLING_WATER_SUPPLY_K, hotFlowKgPerS: 18, coldFlowKgPerS: 40 },
    designDutyW: 2_010_000, designUWPerM2K: 260, designFoulingM2KPerW: 0.0005,
    hotFilmShare: 0.7, coldFilmShare: 0.2, thresholdFraction: 0.82,
    temperatureUncertaintyK: 0.4, flowUncertaintyFraction: 0.02, hotInletPattern: "process", coldInletPattern: "cooling-water",
    fouling: { shape: { kind: "falling-rate", exponent: 0.7 }, serviceStart: "2024-08-05T06:00:00Z", initialFraction: 0.02,
      cycleMultipliers: [1.2, 1], target: { crossing: "2027-12-01T00:00:00Z" } },
    cleanings: [{ start: "2025-10-06T06:00:00Z", durationDays: 4, effectiveness: 0.75, method: "hydroblast tube side" }],
    faults: [], notes: "Viscous residue cooler, partial cleaning; crosses about a year after the data end.",
  },
  {
    tag: "E-3106", name: "LPG product cooler", unitCode: "RDC-3", service: "product cooler",
    arrangement: ONE_SHELL, tubePasses: 2, areaM2: 45,
    hotStream: { name: "LPG product", heatCapacity: CP.liquefiedPetroleumGas }, coldStream: COOLING_WATER,
    reference: { hotInletK: 323.15, coldInletK: COOLING_WATER_SUPPLY_K, hotFlowKgPerS: 8, coldFlowKgPerS: 14 },
    designDutyW: 356_000, designUWPerM2K: 700, designFoulingM2KPerW: 0.00035,
    hotFilmShare: 0.4, coldFilmShare: 0.45, thresholdFraction: 0.85,
    temperatureUncertaintyK: 0.3, flowUncertaintyFraction: 0.015, hotInletPattern: "process", coldInletPattern: "cooling-water",
    fouling: { shape: { kind: "asymptotic", timeConstantDays: 90 }, serviceStart: "2024-05-06T06:00:00Z", initialFraction: 0,
      cycleMultipliers: [1], target: { ultimateFraction: 0.6 } },
    cleanings: [],
    faults: [], notes: "Clean service: fouling levels off at 60 % of the critical resistance, so it never crosses.",
  },
  {
    tag: "E-3107", name: "Vacuum gas oil rundown coolers E-3107 A/B", unitCode: "RDC-3", service: "product cooler",
    arrangement: TWO_SHELLS, tubePasses: 2, areaM2: 240,
    hotStream: { name: "vacuum gas oil", heatCapacity: CP.vacuumGasOil }, coldStream: COOLING_WATER,
    reference: { hotInletK: 403.15, coldInletK: COOLING_WATER_SUPPLY_K, hotFlowKgPerS: 25, coldFlowKgPerS: 60 },
    designDutyW: 4_310_000, designUWPerM2K: 420, designFoulingM2KPerW: 0.0005,
    hotFilmShare: 0.6, coldFilmShare: 0.25, thresholdFraction: 0.82,
    temperatureUncertaintyK: 0.4, flowUncertaintyFraction: 0.015, hotInletPattern: "process", coldInletPattern: "cooling-water",
    fouling: { shape: { kind: "falling-rate", exponent: 0.5 }, serviceStart: "2024-01-22T06:00:00Z", initialFraction: 0.02,
      cycleMultipliers: [1.2, 1], target: { crossing: "2028-03-01T00:00:00Z" } },
    cleanings: [{ start: "2024-12-09T06:00:00Z", durationDays: 5, effectiveness: 1, method: "bundle pull and hydroblast (both shells)" }],
    faults: [], notes: "Two shells in series, fully cleaned once; crosses about fifteen months after the data end.",
  },
  {
    tag: "E-3108", name: "Stripped sour water cooler", unitCode: "RDC-3", service: "water cooler",
    arrangement: ONE_SHELL, tubePasses: 2, areaM2: 60,
    hotStream: { name: "stripped sour water", heatCapacity: CP.hotWater }, coldStream: COOLING_WATER,
    reference: { hotInletK: 368.15, coldInletK: COOLING_WATER_SUPPLY_K, hotFlowKgPerS: 12, coldFlowKgPerS: 20 },
    designDutyW: 1_900_000, designUWPerM2K: 900, designFoulingM2KPerW: 0.00035,
    hotFilmShare: 0.4, coldFilmShare: 0.4, thresholdFraction: 0.85,
    temperatureUncertaintyK: 0.3, flowUncertaintyFraction: 0.015, hotInletPattern: "process", coldInletPattern: "cooling-water",
    fouling: { shape: { kind: "linear" }, serviceStart: "2024-06-17T06:00:00Z", initialFraction: 0,
      cycleMultipliers: [0.85, 0.9, 1], target: { crossing: "2027-05-20T00:00:00Z" } },
    cleanings: [
      { start: "2025-06-16T06:00:00Z", durationDays: 2, effectiveness: 0.9, method: "acid clean" },
      { start: "2026-06-15T06:00:00Z", durationDays: 2, effectiveness: 0.9, method: "acid clean" },
    ],
    faults: [], notes: "Linear scaling on the water side, acid-cleaned every June; crosses about six months after the data end.",
  },
];
