// One data row of a file -> a reading in SI units, or the reason it cannot be read.
import { formatInstant } from "./format-instant";
import { parseNumber, type DecimalMark } from "./parse-number";
import { parseTimestamp } from "./parse-timestamp";
import { PLAUSIBLE_RANGES } from "./plausible-ranges";
import { quoteCell } from "./quote-cell";
import type { ResolvedColumn, ResolvedColumns } from "./resolve-columns";
import { roleValueToSI } from "./role-units";
import type { ConcreteTimestampFormat } from "./timestamp-formats";

export type ConvertedRow =
  | { ok: true; timeMs: number; /** SI values in the order of columns.measurements; null = missing */ values: (number | null)[] }
  | { ok: false; reason: string };

export interface RowConverterSettings {
  columns: ResolvedColumns;
  timestampFormat: ConcreteTimestampFormat;
  timeZone: string;
  decimalMark: DecimalMark;
}

function shortNumber(value: number): string {
  return String(Number(value.toPrecision(6)));
}

/** Why a value (already in SI) is not a plausible reading of its quantity, or null. */
export function implausibility(column: ResolvedColumn, cell: string, valueSI: number): string | null {
  const shown = `${column.column} = ${cell.trim()}`;
  const range = PLAUSIBLE_RANGES[column.quantity];
  switch (column.quantity) {
    case "temperature":
      if (valueSI <= 0) return `${shown}: a temperature at or below absolute zero (0 K) is impossible`;
      if (valueSI < range.min || valueSI > range.max) {
        return `${shown} (${shortNumber(valueSI)} K): outside the plausible range ${range.min}–${range.max} K for a temperature`;
      }
      return null;
    case "massFlow":
      if (valueSI < 0) return `${shown}: a mass flow cannot be negative`;
      if (valueSI > range.max) return `${shown} (${shortNumber(valueSI)} kg/s): above the plausible maximum ${range.max} kg/s for a mass flow`;
      return null;
    case "pressureDrop":
      if (valueSI < 0) return `${shown}: a pressure drop cannot be negative`;
      if (valueSI > range.max) return `${shown} (${shortNumber(valueSI)} Pa): above the plausible maximum ${range.max} Pa for a pressure drop`;
      return null;
  }
}

/**
 * Converts the rows of one file in order. Keeps the last accepted row's time, because rows must come in strictly
 * increasing time: an equal time is a duplicate ("duplicate timestamp …, first at line N"), an earlier one is out
 * of order ("timestamp earlier than line N's; rows must be in time order"); both are rejected, not sorted.
 *
 * A local time in a repeated hour (clocks put back) takes the earlier of its two instants, unless the earlier one
 * is not after the previous accepted row while the later one is: then the later one, so that a file logged in
 * local time runs through the repeated hour in order.
 *
 * Every problem of a row is listed in its reason, separated by "; ". A row whose mapped cells are all missing is
 * rejected ("no measured values"); a row with some missing cells is kept with nulls.
 */
export class RowConverter {
  private readonly settings: RowConverterSettings;
  private lastAccepted: { ms: number; line: number } | null = null;

  constructor(settings: RowConverterSettings) {
    this.settings = settings;
  }

  convert(fields: readonly string[], line: number): ConvertedRow {
    const { columns, timestampFormat, timeZone, decimalMark } = this.settings;
    const expected = columns.headerCount;
    if (fields.length !== expected && (fields.length < expected || fields.slice(expected).some((field) => field.trim() !== ""))) {
      return { ok: false, reason: `expected ${expected} fields as in the header, found ${fields.length}` };
    }
    const problems: string[] = [];
    const timestamp = parseTimestamp(fields[columns.timestamp.index] ?? "", timestampFormat, timeZone);
    let timeMs: number | null = null;
    if (timestamp.kind === "invalid") problems.push(timestamp.reason);
    else if (timestamp.kind === "instant") timeMs = timestamp.ms;
    else {
      const last = this.lastAccepted?.ms;
      timeMs = last !== undefined && timestamp.earlierMs <= last && timestamp.laterMs > last ? timestamp.laterMs : timestamp.earlierMs;
    }
    if (timeMs !== null && this.lastAccepted) {
      if (timeMs === this.lastAccepted.ms) problems.push(`duplicate timestamp ${formatInstant(timeMs)}, first at line ${this.lastAccepted.line}`);
      else if (timeMs < this.lastAccepted.ms) problems.push(`timestamp earlier than line ${this.lastAccepted.line}'s; rows must be in time order`);
    }
    const values: (number | null)[] = [];
    let present = 0;
    for (const column of columns.measurements) {
      const cell = fields[column.index] ?? "";
      const parsed = parseNumber(cell, decimalMark);
      if (parsed.kind === "missing") {
        values.push(null);
        continue;
      }
      if (parsed.kind === "invalid") {
        const other: DecimalMark = decimalMark === "." ? "," : ".";
        const hint = parseNumber(cell, other).kind === "number" ? ` with the decimal mark "${decimalMark}"` : "";
        problems.push(`${column.column}: ${quoteCell(cell.trim())} is not a number${hint}`);
        values.push(null);
        continue;
      }
      const valueSI = roleValueToSI(column.quantity, parsed.value, column.unit);
      const problem = implausibility(column, cell, valueSI);
      if (problem) problems.push(problem);
      values.push(valueSI);
      present += 1;
    }
    if (present === 0 && problems.length === 0) problems.push("no measured values in the row (every mapped cell is empty or marks a missing value)");
    if (problems.length > 0 || timeMs === null) return { ok: false, reason: problems.join("; ") };
    this.lastAccepted = { ms: timeMs, line };
    return { ok: true, timeMs, values };
  }
}
