// A physical quantity in an asset file or form: a plain number in SI units, or
// { "value": v, "unit": "<unit>" } in any unit lib/core/units knows.
import { z } from "zod";
import { parseUnit, toSI, type Quantity, UNIT_TABLE, SI_UNIT } from "../core/units";

export function quantitySchema(quantity: Quantity) {
  const allowed = UNIT_TABLE[quantity].map((unit) => unit.id).join(", ");
  const shape = `a number in ${SI_UNIT[quantity]} or { "value": number, "unit": one of ${allowed} }`;
  return z.unknown().transform((input, context): number => {
    const fail = (message: string) => {
      context.addIssue({ code: "custom", message });
      return z.NEVER;
    };
    if (input === undefined || input === null) return fail(`a value is required (${shape})`);
    if (typeof input === "number") return Number.isFinite(input) ? input : fail("must be a finite number");
    if (typeof input !== "object" || Array.isArray(input)) return fail(`must be ${shape}`);
    const { value, unit, ...rest } = input as Record<string, unknown>;
    if (Object.keys(rest).length > 0) return fail(`unexpected key(s) ${Object.keys(rest).join(", ")}; expected ${shape}`);
    if (value === undefined || value === null) return fail("a value is required");
    if (typeof value !== "number" || !Number.isFinite(value)) return fail(`value must be a finite number, got ${JSON.stringify(value)}`);
    if (typeof unit !== "string") return fail(`unit must be one of ${allowed}`);
    let valueSI: number;
    try {
      valueSI = toSI(quantity, value, parseUnit(quantity, unit));
    } catch (error) {
      return fail((error as Error).message);
    }
    // a finite value can overflow in conversion (1e308 Btu/(lb·°F) × 4186.8 = Infinity J/(kg·K))
    return Number.isFinite(valueSI) ? valueSI : fail(`value ${value} ${unit} is out of range: it is not a finite number in ${SI_UNIT[quantity]}`);
  });
}
