// Catching a wrong unit from the first rows, before anything is imported.
import { ROLE_DEFINITIONS } from "./measurement-roles";
import { PLAUSIBLE_MEDIANS } from "./plausible-ranges";
import type { ResolvedColumn } from "./resolve-columns";
import { roleValueToSI, siUnitLabel, unitChoicesFor, unitLabel, type RoleUnit } from "./role-units";

/** Median of the finite values (mean of the two middle values for an even count); null when there are none. */
export function median(values: readonly number[]): number | null {
  const sorted = values.filter(Number.isFinite).sort((a, b) => a - b);
  if (sorted.length === 0) return null;
  const middle = Math.floor(sorted.length / 2);
  const upper = sorted[middle] as number;
  return sorted.length % 2 === 1 ? upper : ((sorted[middle - 1] as number) + upper) / 2;
}

function shortNumber(value: number): string {
  return Number.isInteger(value) ? String(value) : String(Number(value.toPrecision(5)));
}

function listUnits(labels: readonly string[]): string {
  return labels.length <= 1 ? (labels[0] ?? "") : `${labels.slice(0, -1).join(", ")} or ${labels.at(-1) ?? ""}`;
}

/**
 * Checks that the median of each column's first values, read in the column's unit and converted to SI, lies in
 * PLAUSIBLE_MEDIANS for its quantity. The first column that does not is reported with the units in which its
 * median would be plausible: "values of hot_in (hot inlet temperature) look like °C or °F, not K (...)".
 * Returns null when every column with values is plausible.
 *
 * @param samples raw numbers of each column (in the column's unit), same order as `columns`
 */
export function checkUnitPlausibility(columns: readonly ResolvedColumn[], samples: readonly (readonly number[])[], rowCount: number): string | null {
  for (const [position, column] of columns.entries()) {
    const middle = median(samples[position] ?? []);
    if (middle === null) continue;
    const range = PLAUSIBLE_MEDIANS[column.quantity];
    const valueSI = roleValueToSI(column.quantity, middle, column.unit);
    if (valueSI >= range.min && valueSI <= range.max) continue;
    const si = siUnitLabel(column.quantity);
    const label = unitLabel(column.quantity, column.unit);
    const fitting = unitChoicesFor(column.quantity)
      .filter((choice) => choice.id !== column.unit)
      .filter((choice) => {
        const alternative = roleValueToSI(column.quantity, middle, choice.id as RoleUnit);
        return alternative >= range.min && alternative <= range.max;
      })
      .map((choice) => choice.label);
    const name = `"${column.column}" (${ROLE_DEFINITIONS[column.role].label})`;
    const evidence = `the median of its first ${rowCount} rows is ${shortNumber(middle)} ${label} = ${shortNumber(valueSI)} ${si}, outside the plausible ${shortNumber(range.min)}–${shortNumber(range.max)} ${si}`;
    if (fitting.length === 0) {
      return `values of ${name} are implausible in any unit: ${evidence}; check the column mapping`;
    }
    return `values of ${name} look like ${listUnits(fitting)}, not ${label}: ${evidence}. Correct the unit, or trust the units to import anyway`;
  }
  return null;
}
