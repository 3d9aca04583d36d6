import { fromSI } from "./from-si";
import type { Quantity, UnitOf } from "./quantities";
import { toSI } from "./to-si";

/**
 * Converts a value between two units of the same quantity, through SI.
 *
 * @example convertUnit("temperature", -40, "degC", "degF") // -40
 */
export function convertUnit<Q extends Quantity>(quantity: Q, value: number, from: UnitOf<Q>, to: UnitOf<Q>): number {
  if (from === to) {
    return value;
  }
  return fromSI(quantity, toSI(quantity, value, from), to);
}
