// Where each mapped column sits in a file's header.
import type { ColumnMapping } from "../validation/column-mapping";
import { describeColumns } from "./canonical-header";
import { MEASUREMENT_ROLES, ROLE_DEFINITIONS, type MeasurementRole, type RoleQuantity } from "./measurement-roles";
import type { RoleUnit } from "./role-units";

export interface ResolvedColumn {
  role: MeasurementRole;
  quantity: RoleQuantity;
  /** Header name as written in the file. */
  column: string;
  /** Field index (0-based). */
  index: number;
  unit: RoleUnit;
}

export interface ResolvedColumns {
  timestamp: { column: string; index: number };
  measurements: ResolvedColumn[];
  /** Named columns that no role uses (reported, otherwise ignored). */
  ignoredColumns: string[];
  headerCount: number;
}

export type ResolveColumnsResult =
  | { ok: true; columns: ResolvedColumns }
  | { ok: false; code: "missing-columns" | "duplicate-columns"; message: string };

/**
 * Finds the field index of every column the mapping names: an exact match of the trimmed header name first, then
 * a match ignoring letter case. A name found twice is refused (which one is meant?), and so is a name not found.
 */
export function resolveColumns(headers: readonly string[], mapping: ColumnMapping): ResolveColumnsResult {
  const trimmed = headers.map((header) => header.trim());
  const locate = (name: string): number | "missing" | "duplicate" => {
    const exact = trimmed.flatMap((header, index) => (header === name ? [index] : []));
    const matches = exact.length > 0 ? exact : trimmed.flatMap((header, index) => (header.toLowerCase() === name.toLowerCase() ? [index] : []));
    if (matches.length === 0) return "missing";
    if (matches.length > 1) return "duplicate";
    return matches[0] as number;
  };
  const missing: string[] = [];
  const duplicate: string[] = [];
  const timestampIndex = locate(mapping.timestamp.column);
  if (timestampIndex === "missing") missing.push(`"${mapping.timestamp.column}" (timestamp)`);
  if (timestampIndex === "duplicate") duplicate.push(mapping.timestamp.column);
  const measurements: ResolvedColumn[] = [];
  for (const role of MEASUREMENT_ROLES) {
    const entry = mapping.columns[role];
    if (!entry) continue;
    const index = locate(entry.column);
    if (index === "missing") missing.push(`"${entry.column}" (${ROLE_DEFINITIONS[role].label}, ${role})`);
    else if (index === "duplicate") duplicate.push(entry.column);
    else measurements.push({ role, quantity: ROLE_DEFINITIONS[role].quantity, column: trimmed[index] ?? entry.column, index, unit: entry.unit });
  }
  if (duplicate.length > 0) {
    return { ok: false, code: "duplicate-columns", message: `the header has more than one column named ${duplicate.map((name) => `"${name}"`).join(", ")}; rename them so each name is unique` };
  }
  if (missing.length > 0 || typeof timestampIndex !== "number") {
    return {
      ok: false,
      code: "missing-columns",
      message: `no column ${missing.join(", ")} in the file; columns found: ${describeColumns(headers)}`,
    };
  }
  const used = new Set([timestampIndex, ...measurements.map((measurement) => measurement.index)]);
  const ignoredColumns = trimmed.flatMap((header, index) => (used.has(index) || header === "" ? [] : [header]));
  return {
    ok: true,
    columns: { timestamp: { column: trimmed[timestampIndex] ?? mapping.timestamp.column, index: timestampIndex }, measurements, ignoredColumns, headerCount: headers.length },
  };
}
