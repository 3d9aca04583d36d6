// Pressure (pressure-drop) units accepted for imported columns: the pressure units of lib/core/units that a
// historian export uses for a drop (MPa is left out), with the factor taken from there.
import { UNIT_TABLE } from "../core/units";

/**
 * 1 psi (pound-force per square inch) = 0.453 592 37 kg × 9.806 65 m/s² / (0.0254 m)² = 6894.757 293 168… Pa.
 * NIST SP 811 (2008) B.8 prints 6.894 757 E+03.
 */
export const PASCALS_PER_PSI = UNIT_TABLE.pressure.find((unit) => unit.id === "psi")?.scale ?? Number.NaN;

export type PressureUnit = "Pa" | "kPa" | "bar" | "psi";

export interface PressureUnitDefinition {
  readonly id: PressureUnit;
  readonly label: string;
  readonly name: string;
  /** Pa per unit. */
  readonly scale: number;
  /** Further spellings accepted (case-insensitive). */
  readonly spellings: readonly string[];
}

/**
 * Pressure-drop units, SI first. Sources: NIST SP 811 (2008) B.8: kPa = 1 E+03 Pa and bar = 1 E+05 Pa (exact);
 * psi 6.894 757 E+03 Pa (derived above from exact constants). Pressure drops are differences, so no gauge or
 * absolute offset applies ("psid" is accepted as psi).
 */
export const PRESSURE_UNITS: readonly PressureUnitDefinition[] = [
  { id: "Pa", label: "Pa", name: "pascal", scale: 1, spellings: ["pascal"] },
  { id: "kPa", label: "kPa", name: "kilopascal", scale: 1e3, spellings: ["kilopascal"] },
  { id: "bar", label: "bar", name: "bar", scale: 1e5, spellings: ["bard"] },
  { id: "psi", label: "psi", name: "pound-force per square inch", scale: PASCALS_PER_PSI, spellings: ["psid", "lbf/in2", "lbf/in^2"] },
];

/** The pressure unit written as `text` (id or spelling, any letter case), or null. */
export function findPressureUnit(text: string): PressureUnitDefinition | null {
  const key = text.trim().toLowerCase();
  return PRESSURE_UNITS.find((unit) => unit.id.toLowerCase() === key || unit.spellings.includes(key)) ?? null;
}

/** Converts a pressure (difference) in `unit` to Pa: value × scale (NIST SP 811 (2008) B.8). */
export function pressureToPascal(value: number, unit: PressureUnit): number {
  const definition = PRESSURE_UNITS.find((candidate) => candidate.id === unit);
  if (!definition) throw new TypeError(`unknown pressure unit id "${String(unit)}"`);
  return value * definition.scale;
}
