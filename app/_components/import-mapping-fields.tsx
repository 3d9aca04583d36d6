"use client";

import { MEASUREMENT_ROLES, ROLE_DEFINITIONS, type MeasurementRole, type RoleQuantity } from "@/lib/import/measurement-roles";
import { unitChoicesFor } from "@/lib/import/role-units";
import { TIMESTAMP_FORMAT_DESCRIPTIONS, TIMESTAMP_FORMATS, type TimestampFormat } from "@/lib/import/timestamp-formats";
import type { ColumnMapping, ColumnMappingInput } from "@/lib/validation/column-mapping";

/** The mapping form's values; "" as a column means "not in the file" (allowed for pressure drops only). */
export interface MappingFormState {
  timestampColumn: string;
  timestampFormat: TimestampFormat;
  timeZone: string;
  delimiter: "auto" | "," | ";" | "\t";
  decimalMark: "auto" | "." | ",";
  columns: Record<MeasurementRole, { column: string; unit: string }>;
}

const DEFAULT_UNITS: { readonly [Q in RoleQuantity]: string } = { temperature: "degC", massFlow: "kg/s", pressureDrop: "kPa" };

export function emptyMappingState(timeZone: string): MappingFormState {
  const columns = {} as Record<MeasurementRole, { column: string; unit: string }>;
  for (const role of MEASUREMENT_ROLES) columns[role] = { column: "", unit: DEFAULT_UNITS[ROLE_DEFINITIONS[role].quantity] };
  return { timestampColumn: "", timestampFormat: "auto", timeZone, delimiter: "auto", decimalMark: "auto", columns };
}

/** Form values from a validated mapping (saved, or implied by canonical headers). */
export function mappingToState(mapping: ColumnMapping, siteTimeZone: string): MappingFormState {
  const state = emptyMappingState(mapping.timeZone ?? siteTimeZone);
  for (const role of MEASUREMENT_ROLES) {
    const entry = mapping.columns[role];
    if (entry) state.columns[role] = { column: entry.column, unit: entry.unit };
  }
  return { ...state, timestampColumn: mapping.timestamp.column, timestampFormat: mapping.timestamp.format, delimiter: mapping.delimiter, decimalMark: mapping.decimalMark };
}

/**
 * The mapping to send (validated by columnMappingSchema on both sides). A time zone equal to the site's is left out,
 * so the saved mapping follows the site's zone.
 */
export function stateToMapping(state: MappingFormState, siteTimeZone: string): ColumnMappingInput {
  const column = (role: MeasurementRole) => state.columns[role];
  const optional = (role: MeasurementRole) => (state.columns[role].column === "" ? {} : { [role]: state.columns[role] });
  return {
    timestamp: { column: state.timestampColumn, format: state.timestampFormat },
    timeZone: state.timeZone.trim() === "" || state.timeZone.trim() === siteTimeZone ? undefined : state.timeZone.trim(),
    delimiter: state.delimiter,
    decimalMark: state.decimalMark,
    columns: {
      hotIn: column("hotIn"),
      hotOut: column("hotOut"),
      coldIn: column("coldIn"),
      coldOut: column("coldOut"),
      hotFlow: column("hotFlow"),
      coldFlow: column("coldFlow"),
      ...optional("hotPressureDrop"),
      ...optional("coldPressureDrop"),
    },
  };
}

function capitalised(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

interface Props {
  state: MappingFormState;
  header: readonly string[];
  detected: { delimiter: string; decimalMark: string; timestampFormat: string | null };
  timeZones: readonly string[];
  disabled: boolean;
  onChange: (state: MappingFormState) => void;
}

/** Row headers of the mapping table stay in place (the sheet makes header cells sticky for long tables). */
const ROW_HEADER = { position: "static", background: "none" } as const;

const DELIMITER_LABELS: Record<MappingFormState["delimiter"], string> = { auto: "detect", ",": "comma (,)", ";": "semicolon (;)", "\t": "tab" };

/** Per role a column select and a unit select; timestamp column, format and time zone; delimiter and decimal mark. */
export function ImportMappingFields({ state, header, detected, timeZones, disabled, onChange }: Props) {
  const names = header.map((name) => name.trim()).filter((name) => name !== "");
  const update = (change: Partial<MappingFormState>) => onChange({ ...state, ...change });
  const updateRole = (role: MeasurementRole, change: Partial<{ column: string; unit: string }>) =>
    onChange({ ...state, columns: { ...state.columns, [role]: { ...state.columns[role], ...change } } });
  const detectedDelimiter = DELIMITER_LABELS[detected.delimiter as MappingFormState["delimiter"]] ?? detected.delimiter;
  return (
    <fieldset disabled={disabled} style={{ border: 0, padding: 0, margin: 0 }}>
      <legend className="subtle">Map the file&apos;s columns to measurements. Values are converted to SI (K, kg/s, Pa) on import.</legend>
      <table className="grid">
        <thead>
          <tr><th scope="col">Measurement</th><th scope="col">Column in the file</th><th scope="col">Unit</th></tr>
        </thead>
        <tbody>
          <tr>
            <th scope="row" style={ROW_HEADER}><label htmlFor="map-timestamp">Timestamp</label></th>
            <td>
              <select id="map-timestamp" value={state.timestampColumn} required onChange={(event) => update({ timestampColumn: event.target.value })}>
                <option value="">— choose a column —</option>
                {names.map((name) => <option key={name} value={name}>{name}</option>)}
              </select>
            </td>
            <td>
              <label htmlFor="map-timestamp-format" className="subtle">Format </label>
              <select id="map-timestamp-format" value={state.timestampFormat} onChange={(event) => update({ timestampFormat: event.target.value as TimestampFormat })}>
                {TIMESTAMP_FORMATS.map((format) => (
                  <option key={format} value={format}>
                    {format === "auto" ? `detect${detected.timestampFormat ? ` (${detected.timestampFormat})` : ""}` : `${format} — ${TIMESTAMP_FORMAT_DESCRIPTIONS[format]}`}
                  </option>
                ))}
              </select>
            </td>
          </tr>
          {MEASUREMENT_ROLES.map((role) => {
            const definition = ROLE_DEFINITIONS[role];
            const entry = state.columns[role];
            return (
              <tr key={role}>
                <th scope="row" style={ROW_HEADER}><label htmlFor={`map-${role}`}>{capitalised(definition.label)}{definition.required ? "" : " (optional)"}</label></th>
                <td>
                  <select id={`map-${role}`} value={entry.column} required={definition.required} onChange={(event) => updateRole(role, { column: event.target.value })}>
                    <option value="">{definition.required ? "— choose a column —" : "— not in the file —"}</option>
                    {names.map((name) => <option key={name} value={name}>{name}</option>)}
                  </select>
                </td>
                <td>
                  <label htmlFor={`unit-${role}`} className="subtle">Unit </label>
                  <select id={`unit-${role}`} value={entry.unit} onChange={(event) => updateRole(role, { unit: event.target.value })}>
                    {unitChoicesFor(definition.quantity).map((unit) => <option key={unit.id} value={unit.id}>{unit.label} — {unit.name}</option>)}
                  </select>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <div className="columns" style={{ marginTop: "0.8rem" }}>
        <p>
          <label htmlFor="map-time-zone">Time zone of local timestamps</label><br />
          <input id="map-time-zone" list="time-zone-names" value={state.timeZone} onChange={(event) => update({ timeZone: event.target.value })} aria-describedby="map-time-zone-help" />
          <datalist id="time-zone-names">{timeZones.map((zone) => <option key={zone} value={zone} />)}</datalist>
          <br /><span id="map-time-zone-help" className="subtle">IANA name. Ignored for times with an offset (Z, +01:00) and epoch times.</span>
        </p>
        <p>
          <label htmlFor="map-delimiter">Delimiter</label><br />
          <select id="map-delimiter" value={state.delimiter} onChange={(event) => update({ delimiter: event.target.value as MappingFormState["delimiter"] })}>
            {(Object.keys(DELIMITER_LABELS) as MappingFormState["delimiter"][]).map((key) => (
              <option key={key} value={key}>{key === "auto" ? `detect (${detectedDelimiter})` : DELIMITER_LABELS[key]}</option>
            ))}
          </select>
        </p>
        <p>
          <label htmlFor="map-decimal">Decimal mark</label><br />
          <select id="map-decimal" value={state.decimalMark} onChange={(event) => update({ decimalMark: event.target.value as MappingFormState["decimalMark"] })}>
            <option value="auto">detect (“{detected.decimalMark}”)</option>
            <option value=".">point (12.5)</option>
            <option value=",">comma (12,5)</option>
          </select>
        </p>
      </div>
    </fieldset>
  );
}
