// The column mapping of an asset's operating-data files: which column holds which measurement, in which unit,
// and how to read timestamps and numbers. Saved per asset (ColumnMapping.mapping) after a successful import.
import { z } from "zod";
import { MEASUREMENT_ROLES, ROLE_DEFINITIONS, type MeasurementRole, type RoleQuantity } from "../import/measurement-roles";
import { lookUpRoleUnit } from "../import/role-units";
import { TIMESTAMP_FORMATS } from "../import/timestamp-formats";
import { isValidTimeZone } from "../import/zone-offset";

/** Marks an issue as an unknown unit, so the import can refuse with the "unknown-unit" code. */
export const UNKNOWN_UNIT_ISSUE = "unknown-unit";

function columnSchemaFor(role: MeasurementRole, quantity: RoleQuantity) {
  return z
    .object({
      column: z.string().trim().min(1, `give the column of the ${ROLE_DEFINITIONS[role].label}`),
      unit: z.string().trim().min(1, `give the unit of the ${ROLE_DEFINITIONS[role].label}`),
    })
    .strict()
    .transform((value, context) => {
      const found = lookUpRoleUnit(quantity, value.unit);
      if (!found.ok) {
        context.addIssue({ code: "custom", message: `${role}: ${found.message}`, path: ["unit"], params: { kind: UNKNOWN_UNIT_ISSUE } });
        return z.NEVER;
      }
      return { column: value.column, unit: found.unit };
    });
}

const columnsSchema = z
  .object({
    hotIn: columnSchemaFor("hotIn", "temperature"),
    hotOut: columnSchemaFor("hotOut", "temperature"),
    coldIn: columnSchemaFor("coldIn", "temperature"),
    coldOut: columnSchemaFor("coldOut", "temperature"),
    hotFlow: columnSchemaFor("hotFlow", "massFlow"),
    coldFlow: columnSchemaFor("coldFlow", "massFlow"),
    hotPressureDrop: columnSchemaFor("hotPressureDrop", "pressureDrop").optional(),
    coldPressureDrop: columnSchemaFor("coldPressureDrop", "pressureDrop").optional(),
  })
  .strict();

/**
 * A column mapping as users write it (JSON file, form, saved mapping). Units are unit ids or common spellings
 * ("degC", "°C", "C"; "t/h"; "kPa") and come out as unit ids. Defaults: timestamp format "auto", delimiter
 * "auto", decimal mark "auto"; no time zone means the site's. Two roles cannot share a column, and the timestamp
 * column cannot be a measurement.
 */
export const columnMappingSchema = z
  .object({
    timestamp: z
      .object({
        column: z.string().trim().min(1, "give the timestamp column"),
        format: z.enum(TIMESTAMP_FORMATS).default("auto"),
      })
      .strict(),
    timeZone: z
      .string()
      .trim()
      .refine(isValidTimeZone, { message: "unknown time zone; give an IANA name such as Europe/Amsterdam or UTC" })
      .optional(),
    delimiter: z.enum(["auto", ",", ";", "\t"]).default("auto"),
    decimalMark: z.enum(["auto", ".", ","]).default("auto"),
    columns: columnsSchema,
  })
  .strict()
  .superRefine((mapping, context) => {
    const usedBy = new Map<string, string>([[mapping.timestamp.column.toLowerCase(), "timestamp"]]);
    for (const role of MEASUREMENT_ROLES) {
      const entry = mapping.columns[role];
      if (!entry) continue;
      const key = entry.column.toLowerCase();
      const other = usedBy.get(key);
      if (other !== undefined) {
        context.addIssue({ code: "custom", message: `column "${entry.column}" is mapped to both ${other} and ${role}`, path: ["columns", role, "column"] });
      }
      usedBy.set(key, role);
    }
  });

/** What users write (defaults optional, unit spellings). */
export type ColumnMappingInput = z.input<typeof columnMappingSchema>;
/** A validated mapping: defaults filled in, units as unit ids. */
export type ColumnMapping = z.output<typeof columnMappingSchema>;

/** One line per problem, "path: message", for refusals and form errors. */
export function describeMappingIssues(error: z.ZodError): string {
  return error.issues.map((issue) => (issue.path.length ? `${issue.path.join(".")}: ${issue.message}` : issue.message)).join("; ");
}

/** True when one of the issues is an unknown unit. */
export function hasUnknownUnitIssue(error: z.ZodError): boolean {
  return error.issues.some((issue) => issue.code === "custom" && (issue as { params?: { kind?: string } }).params?.kind === UNKNOWN_UNIT_ISSUE);
}
