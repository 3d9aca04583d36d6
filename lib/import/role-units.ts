// Units of the measured columns: temperatures and mass flows through lib/core/units, pressure drops through
// ./pressure-units (a subset of the pressure units of lib/core/units).
import { parseUnit, toSI, UNIT_TABLE, UnitError, type MassFlowUnit, type TemperatureUnit } from "../core/units";
import type { RoleQuantity } from "./measurement-roles";
import { findPressureUnit, PRESSURE_UNITS, pressureToPascal, type PressureUnit } from "./pressure-units";

export type RoleUnit = TemperatureUnit | MassFlowUnit | PressureUnit;

export interface UnitChoice {
  readonly id: string;
  readonly label: string;
  readonly name: string;
}

/** The units a column of this quantity may be in, SI first (for unit selects and error messages). */
export function unitChoicesFor(quantity: RoleQuantity): readonly UnitChoice[] {
  if (quantity === "pressureDrop") return PRESSURE_UNITS;
  return UNIT_TABLE[quantity];
}

/** SI unit label of the quantity: K, kg/s, Pa. */
export function siUnitLabel(quantity: RoleQuantity): string {
  return quantity === "temperature" ? "K" : quantity === "massFlow" ? "kg/s" : "Pa";
}

export type UnitLookup = { ok: true; unit: RoleUnit } | { ok: false; message: string };

/**
 * Reads a unit written by a person ("degC", "°C", "C", "t/h", "kPa", "psi") for a column of `quantity`.
 * Temperatures and flows go through parseUnit of lib/core/units; pressure drops through findPressureUnit.
 */
export function lookUpRoleUnit(quantity: RoleQuantity, text: string): UnitLookup {
  if (quantity === "pressureDrop") {
    const found = findPressureUnit(text);
    return found
      ? { ok: true, unit: found.id }
      : { ok: false, message: `unknown pressure unit "${text}"; allowed: ${PRESSURE_UNITS.map((unit) => unit.id).join(", ")}` };
  }
  try {
    return { ok: true, unit: parseUnit(quantity, text) };
  } catch (error) {
    if (error instanceof UnitError) return { ok: false, message: error.message };
    throw error;
  }
}

/** Display label of a unit id ("°C" for "degC"). */
export function unitLabel(quantity: RoleQuantity, unit: RoleUnit): string {
  return unitChoicesFor(quantity).find((choice) => choice.id === unit)?.label ?? unit;
}

/**
 * Converts one value to SI (K, kg/s, Pa). Temperatures and flows: toSI of lib/core/units (NIST SP 811 (2008)
 * B.8/B.9); pressure drops: pressureToPascal (NIST SP 811 (2008) B.8).
 */
export function roleValueToSI(quantity: RoleQuantity, value: number, unit: RoleUnit): number {
  if (quantity === "pressureDrop") return pressureToPascal(value, unit as PressureUnit);
  if (quantity === "temperature") return toSI("temperature", value, unit as TemperatureUnit);
  return toSI("massFlow", value, unit as MassFlowUnit);
}
