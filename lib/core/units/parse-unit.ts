import { QUANTITY_NAME, type Quantity, type UnitOf } from "./quantities";
import { UnitError } from "./unit-error";
import { UNIT_TABLE, type UnitDefinition } from "./unit-table";

/**
 * Reduces a unit spelling to a canonical key: compatibility characters folded (m² → m2), blanks, separators
 * (· ⋅ * × . -), brackets, carets and degree signs dropped, "hour"/"hr" → "h", "sec" → "s", "lbs"/"lbm" → "lb",
 * "degree(s)"/"deg" dropped and scale names shortened (celsius → c). Letter case is folded unless keepCase.
 */
export function normalizeUnitText(text: string, keepCase = false): string {
  let key = text.normalize("NFKC").trim();
  if (!keepCase) {
    key = key.toLowerCase();
  }
  key = key.replace(/[\s·⋅*×.\-()[\]^°º]/g, "");
  const words: readonly (readonly [RegExp, string])[] = [
    [/hours?/gi, "h"],
    [/hr/gi, "h"],
    [/sec/gi, "s"],
    [/lb[sm]/gi, "lb"],
    [/degrees?/gi, ""],
    [/deg/gi, ""],
    [/celsius|centigrade/gi, "c"],
    [/fahrenheit/gi, "f"],
    [/kelvin/gi, "k"],
    [/rankine/gi, "r"],
  ];
  for (const [pattern, replacement] of words) {
    key = key.replace(pattern, replacement);
  }
  return key;
}

function matches(definition: UnitDefinition, text: string): boolean {
  const folded = normalizeUnitText(text);
  if (definition.caseSensitive === true) {
    const kept = normalizeUnitText(text, true);
    if ([definition.id, definition.label].some((spelling) => normalizeUnitText(spelling, true) === kept)) {
      return true;
    }
    return definition.spellings.some((spelling) => normalizeUnitText(spelling) === folded);
  }
  return [definition.id, definition.label, ...definition.spellings].some(
    (spelling) => normalizeUnitText(spelling) === folded,
  );
}

/**
 * Reads a unit as people write it ("C", "°C", "degC", "t/h", "lb/hr", "Btu/hr", "kW", "W/m2K", "W/m²K",
 * "Btu/h-ft2-F") and returns the typed unit id. Matching ignores blanks, separators, brackets, degree signs and
 * letter case (except "MW", which must be upper case so that it cannot be confused with milliwatt).
 *
 * @throws UnitError naming the quantity, the text and the allowed units
 * @example parseUnit("massFlow", "lb/hr") // "lb/h"
 */
export function parseUnit<Q extends Quantity>(quantity: Q, text: string): UnitOf<Q> {
  const units: readonly UnitDefinition<UnitOf<Q>>[] = UNIT_TABLE[quantity];
  if (units === undefined) {
    throw new TypeError(`unknown quantity ${JSON.stringify(quantity)}`);
  }
  const found = units.find((definition) => matches(definition, text));
  if (found === undefined) {
    const allowed = units.map((definition) => definition.label);
    throw new UnitError(
      quantity,
      text,
      allowed,
      `unknown ${QUANTITY_NAME[quantity]} unit "${text}"; allowed: ${allowed.join(", ")}`,
    );
  }
  return found.id;
}
