// SI -> the user's display units (SI or US customary): one table, so every page, chart and CSV agrees.
import { fromSI, JOULES_PER_BTU_IT } from "../core/units";
import { formatSignificant } from "./format";

export type UnitSystem = "si" | "us";

/** The quantities the web app shows. Duty is a power; cost and time are not converted. */
export type DisplayQuantity = "temperature" | "temperatureDifference" | "duty" | "u" | "foulingResistance" | "area" | "massFlow" | "energy";

export interface DisplayUnit {
  /** Short label for axes, column headers and values, e.g. "kW", "Btu/(h·ft²·°F)". */
  label: string;
  /** Plain-ASCII label for CSV headers (no superscripts or middle dots, which some spreadsheets mangle). */
  ascii: string;
  /** SI value -> display value. */
  fromSI: (valueSI: number) => number;
}

/** 1 MMBtu = 10⁶ Btu (trade usage: M = thousand, MM = million). */
const BTU_PER_MMBTU = 1e6;
/** 1 GJ = 10⁹ J; energies shown in GJ (SI) or MMBtu (US). */
const JOULES_PER_GJ = 1e9;

/**
 * The display units of each system. Factors come from lib/core/units (exact definitions agreeing with NIST SP 811
 * (2008) Appendix B.8/B.9); only the decimal prefixes (kW, GJ) and MMBtu's 10⁶ are added here.
 */
export const DISPLAY_UNITS: Record<UnitSystem, Record<DisplayQuantity, DisplayUnit>> = {
  si: {
    temperature: { label: "°C", ascii: "degC", fromSI: (k) => fromSI("temperature", k, "degC") },
    temperatureDifference: { label: "K", ascii: "K", fromSI: (k) => k },
    duty: { label: "kW", ascii: "kW", fromSI: (w) => fromSI("power", w, "kW") },
    u: { label: "W/(m²·K)", ascii: "W/(m2.K)", fromSI: (u) => u },
    foulingResistance: { label: "m²·K/W", ascii: "m2.K/W", fromSI: (rf) => rf },
    area: { label: "m²", ascii: "m2", fromSI: (a) => a },
    massFlow: { label: "kg/s", ascii: "kg/s", fromSI: (m) => m },
    energy: { label: "GJ", ascii: "GJ", fromSI: (j) => j / JOULES_PER_GJ },
  },
  us: {
    temperature: { label: "°F", ascii: "degF", fromSI: (k) => fromSI("temperature", k, "degF") },
    temperatureDifference: { label: "°F", ascii: "delta degF", fromSI: (k) => fromSI("temperatureDifference", k, "degF") },
    duty: { label: "MMBtu/h", ascii: "MMBtu/h", fromSI: (w) => fromSI("power", w, "Btu/h") / BTU_PER_MMBTU },
    u: { label: "Btu/(h·ft²·°F)", ascii: "Btu/(h.ft2.degF)", fromSI: (u) => fromSI("heatTransferCoefficient", u, "Btu/(h.ft2.degF)") },
    foulingResistance: { label: "h·ft²·°F/Btu", ascii: "h.ft2.degF/Btu", fromSI: (rf) => fromSI("foulingResistance", rf, "h.ft2.degF/Btu") },
    area: { label: "ft²", ascii: "ft2", fromSI: (a) => fromSI("area", a, "ft2") },
    massFlow: { label: "lb/h", ascii: "lb/h", fromSI: (m) => fromSI("massFlow", m, "lb/h") },
    energy: { label: "MMBtu", ascii: "MMBtu", fromSI: (j) => j / JOULES_PER_BTU_IT / BTU_PER_MMBTU },
  },
};

export function isUnitSystem(value: unknown): value is UnitSystem {
  return value === "si" || value === "us";
}

export const UNIT_SYSTEM_LABELS: Record<UnitSystem, string> = {
  si: "SI (°C, kW, W/(m²·K), m²·K/W, m², kg/s)",
  us: "US customary (°F, MMBtu/h, Btu/(h·ft²·°F), h·ft²·°F/Btu, ft², lb/h)",
};

/** The display unit of a quantity in a unit system. */
export function displayUnit(system: UnitSystem, quantity: DisplayQuantity): DisplayUnit {
  return DISPLAY_UNITS[system][quantity];
}

/** An SI value converted to the system's unit, or null for null/non-finite input. */
export function toDisplay(system: UnitSystem, quantity: DisplayQuantity, valueSI: number | null): number | null {
  if (valueSI === null || !Number.isFinite(valueSI)) return null;
  return DISPLAY_UNITS[system][quantity].fromSI(valueSI);
}

/**
 * formatQuantity: an SI value in the system's unit with `digits` significant figures and its label, e.g.
 * formatQuantity("us", "duty", 1e6, 3) // "3.41 MMBtu/h"; "—" for null.
 */
export function formatQuantity(system: UnitSystem, quantity: DisplayQuantity, valueSI: number | null, digits = 3): string {
  const value = toDisplay(system, quantity, valueSI);
  return value === null ? "—" : `${formatSignificant(value, digits)} ${DISPLAY_UNITS[system][quantity].label}`;
}

/** formatDisplayNumber: as formatQuantity without the unit label (for table cells whose header names the unit). */
export function formatDisplayNumber(system: UnitSystem, quantity: DisplayQuantity, valueSI: number | null, digits = 3): string {
  const value = toDisplay(system, quantity, valueSI);
  return value === null ? "—" : formatSignificant(value, digits);
}
