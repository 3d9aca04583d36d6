// The measurements an operating-data file can hold, in the order of the Reading columns.
import type { Quantity } from "../core/units";

/** Roles of the measured columns (the same names as Instrument.role). */
export const MEASUREMENT_ROLES = [
  "hotIn",
  "hotOut",
  "coldIn",
  "coldOut",
  "hotFlow",
  "coldFlow",
  "hotPressureDrop",
  "coldPressureDrop",
] as const;

export type MeasurementRole = (typeof MEASUREMENT_ROLES)[number];

/** "pressureDrop" units for imports are the subset in lib/import/pressure-units.ts (factors from lib/core/units). */
export type RoleQuantity = Extract<Quantity, "temperature" | "massFlow"> | "pressureDrop";

export interface RoleDefinition {
  readonly role: MeasurementRole;
  readonly quantity: RoleQuantity;
  /** Plain name for messages and labels, e.g. "hot inlet temperature". */
  readonly label: string;
  /** Role part of a canonical header (`<role>_<unit>`), e.g. "hot_in". */
  readonly headerRole: string;
  /** Column of "Reading" that stores the SI value. */
  readonly readingColumn: string;
  /** Whether an import needs this column. */
  readonly required: boolean;
}

export const ROLE_DEFINITIONS: { readonly [R in MeasurementRole]: RoleDefinition & { readonly role: R } } = {
  hotIn: { role: "hotIn", quantity: "temperature", label: "hot inlet temperature", headerRole: "hot_in", readingColumn: "hotInK", required: true },
  hotOut: { role: "hotOut", quantity: "temperature", label: "hot outlet temperature", headerRole: "hot_out", readingColumn: "hotOutK", required: true },
  coldIn: { role: "coldIn", quantity: "temperature", label: "cold inlet temperature", headerRole: "cold_in", readingColumn: "coldInK", required: true },
  coldOut: { role: "coldOut", quantity: "temperature", label: "cold outlet temperature", headerRole: "cold_out", readingColumn: "coldOutK", required: true },
  hotFlow: { role: "hotFlow", quantity: "massFlow", label: "hot mass flow", headerRole: "hot_flow", readingColumn: "hotFlowKgPerS", required: true },
  coldFlow: { role: "coldFlow", quantity: "massFlow", label: "cold mass flow", headerRole: "cold_flow", readingColumn: "coldFlowKgPerS", required: true },
  hotPressureDrop: { role: "hotPressureDrop", quantity: "pressureDrop", label: "hot-side pressure drop", headerRole: "hot_dp", readingColumn: "hotPressureDropPa", required: false },
  coldPressureDrop: { role: "coldPressureDrop", quantity: "pressureDrop", label: "cold-side pressure drop", headerRole: "cold_dp", readingColumn: "coldPressureDropPa", required: false },
};

export const REQUIRED_ROLES: readonly MeasurementRole[] = MEASUREMENT_ROLES.filter((role) => ROLE_DEFINITIONS[role].required);

export function isMeasurementRole(value: string): value is MeasurementRole {
  return (MEASUREMENT_ROLES as readonly string[]).includes(value);
}
