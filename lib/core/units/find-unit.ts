import { QUANTITY_NAME, type Quantity, type UnitOf } from "./quantities";
import { UnitError } from "./unit-error";
import { UNIT_TABLE, type UnitDefinition } from "./unit-table";

/** Looks up a unit by its exact id; throws UnitError (listing the ids) for anything else. */
export function findUnit<Q extends Quantity>(quantity: Q, unit: UnitOf<Q>): UnitDefinition<UnitOf<Q>> {
  const units: readonly UnitDefinition<UnitOf<Q>>[] = UNIT_TABLE[quantity];
  if (units === undefined) {
    throw new TypeError(`unknown quantity ${JSON.stringify(quantity)}`);
  }
  const found = units.find((definition) => definition.id === unit);
  if (found === undefined) {
    const allowed = units.map((definition) => definition.id);
    throw new UnitError(
      quantity,
      String(unit),
      allowed,
      `unknown ${QUANTITY_NAME[quantity]} unit id "${String(unit)}"; allowed: ${allowed.join(", ")}`,
    );
  }
  return found;
}
