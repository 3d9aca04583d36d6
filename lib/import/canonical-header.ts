// Canonical headers: files whose columns are named `timestamp` and `<role>_<unit>` import with no mapping.
import type { ColumnMapping } from "../validation/column-mapping";
import { MEASUREMENT_ROLES, ROLE_DEFINITIONS, type MeasurementRole, type RoleQuantity } from "./measurement-roles";
import type { RoleUnit } from "./role-units";

/** Header name of the timestamp column (any letter case). */
export const CANONICAL_TIMESTAMP_HEADER = "timestamp";

/** Unit tokens of canonical headers, per quantity: token -> unit id (tokens match in any letter case). */
export const CANONICAL_UNIT_TOKENS: { readonly [Q in RoleQuantity]: Readonly<Record<string, RoleUnit>> } = {
  temperature: { C: "degC", F: "degF", K: "K", R: "degR" },
  massFlow: { kg_s: "kg/s", kg_h: "kg/h", t_h: "t/h", lb_h: "lb/h", lb_s: "lb/s" },
  pressureDrop: { Pa: "Pa", kPa: "kPa", bar: "bar", psi: "psi" },
};

export type CanonicalHeader =
  | { kind: "timestamp" }
  | { kind: "measurement"; role: MeasurementRole; unit: RoleUnit }
  | { kind: "unknown-unit"; role: MeasurementRole; message: string }
  | { kind: "other" };

/**
 * Reads one header name with the grammar `timestamp` | `<role>_<unit>`, role one of hot_in, hot_out, cold_in,
 * cold_out, hot_flow, cold_flow, hot_dp, cold_dp and unit one of CANONICAL_UNIT_TOKENS for the role's quantity,
 * all in any letter case. A known role with an unknown unit is reported; anything else is "other".
 *
 * @example readCanonicalHeader("Hot_In_C") // { kind: "measurement", role: "hotIn", unit: "degC" }
 */
export function readCanonicalHeader(name: string): CanonicalHeader {
  const text = name.trim().toLowerCase();
  if (text === CANONICAL_TIMESTAMP_HEADER) return { kind: "timestamp" };
  for (const role of MEASUREMENT_ROLES) {
    const { headerRole, quantity, label } = ROLE_DEFINITIONS[role];
    if (!text.startsWith(`${headerRole}_`)) continue;
    const token = text.slice(headerRole.length + 1);
    const tokens = CANONICAL_UNIT_TOKENS[quantity];
    const match = Object.entries(tokens).find(([candidate]) => candidate.toLowerCase() === token);
    if (match) return { kind: "measurement", role, unit: match[1] };
    return {
      kind: "unknown-unit",
      role,
      message: `column "${name.trim()}": unknown unit "${name.trim().slice(headerRole.length + 1)}" for the ${label}; allowed: ${Object.keys(tokens).join(", ")}`,
    };
  }
  return { kind: "other" };
}

export type CanonicalMappingResult =
  | { ok: true; mapping: ColumnMapping }
  | { ok: false; code: "missing-columns" | "duplicate-columns" | "unknown-unit"; message: string };

/** "timestamp, hot_in_C, ..." for messages; unnamed columns shown by position. */
export function describeColumns(headers: readonly string[]): string {
  return headers.map((header, index) => (header.trim() === "" ? `(column ${index + 1}, no name)` : header.trim())).join(", ");
}

/** "hot inlet temperature (hotIn) or cold outlet temperature (coldOut)". */
function listRoles(roles: readonly MeasurementRole[]): string {
  const names = roles.map((role) => `${ROLE_DEFINITIONS[role].label} (${role})`);
  return names.length <= 1 ? (names[0] ?? "") : `${names.slice(0, -1).join(", ")} or ${names.at(-1) ?? ""}`;
}

/**
 * Builds the mapping that canonical headers imply (timestamp format "auto", delimiter and decimal mark "auto").
 * Refuses when a required column is missing, when two columns name the same role, or when a canonical name has
 * an unknown unit.
 */
export function mappingFromCanonicalHeaders(headers: readonly string[]): CanonicalMappingResult {
  let timestampColumn: string | null = null;
  const found = new Map<MeasurementRole, { column: string; unit: RoleUnit }>();
  for (const header of headers) {
    const read = readCanonicalHeader(header);
    if (read.kind === "unknown-unit") return { ok: false, code: "unknown-unit", message: read.message };
    if (read.kind === "timestamp") {
      if (timestampColumn !== null) return { ok: false, code: "duplicate-columns", message: `two timestamp columns: "${timestampColumn}" and "${header.trim()}"` };
      timestampColumn = header.trim();
    }
    if (read.kind === "measurement") {
      const previous = found.get(read.role);
      if (previous) {
        return {
          ok: false,
          code: "duplicate-columns",
          message: `two columns for the ${ROLE_DEFINITIONS[read.role].label} (${read.role}): "${previous.column}" and "${header.trim()}"`,
        };
      }
      found.set(read.role, { column: header.trim(), unit: read.unit });
    }
  }
  const missingRoles = MEASUREMENT_ROLES.filter((role) => ROLE_DEFINITIONS[role].required && !found.has(role));
  const missing = [...(timestampColumn === null ? ["the timestamp"] : []), ...(missingRoles.length ? [listRoles(missingRoles)] : [])];
  if (missing.length > 0) {
    return {
      ok: false,
      code: "missing-columns",
      message: `no column for ${missing.join(" or ")}; columns found: ${describeColumns(headers)}. Name the columns timestamp, hot_in_C, hot_out_C, cold_in_C, cold_out_C, hot_flow_kg_s, cold_flow_kg_s (any units of the header grammar) or give a column mapping`,
    };
  }
  const column = (role: MeasurementRole) => found.get(role) as { column: string; unit: RoleUnit };
  const optional = (role: MeasurementRole) => found.get(role);
  const mapping = {
    timestamp: { column: timestampColumn as string, format: "auto" },
    delimiter: "auto",
    decimalMark: "auto",
    columns: {
      hotIn: column("hotIn"),
      hotOut: column("hotOut"),
      coldIn: column("coldIn"),
      coldOut: column("coldOut"),
      hotFlow: column("hotFlow"),
      coldFlow: column("coldFlow"),
      ...(optional("hotPressureDrop") ? { hotPressureDrop: optional("hotPressureDrop") } : {}),
      ...(optional("coldPressureDrop") ? { coldPressureDrop: optional("coldPressureDrop") } : {}),
    },
  } as ColumnMapping;
  return { ok: true, mapping };
}
