// A physical quantity in an asset file or form: a plain number in SI units, or
// { "value": v, "unit": "<unit>" } in any unit lib/core/units knows.
import { z } from "zod";
import { parseUnit, toSI, type Quantity, UNIT_TABLE, SI_UNIT } from "../core/units";

export function quantitySchema(quantity: Quantity) {
  const allowed = UNIT_TABLE[quantity].map((unit) => unit.label).join(", ");
  return z
    .union([
      z.number({ error: `must be a number in ${SI_UNIT[quantity]} or { "value": number, "unit": one of ${allowed} }` }),
      z.object({ value: z.number({ error: "value must be a number" }), unit: z.string({ error: "unit must be a string" }) }, { error: `must be a number in ${SI_UNIT[quantity]} or { "value": number, "unit": one of ${allowed} }` }).strict(),
    ])
    .transform((input, context) => {
      if (typeof input === "number") return input;
      try {
        return toSI(quantity, input.value, parseUnit(quantity, input.unit));
      } catch (error) {
        context.addIssue({ code: "custom", message: (error as Error).message });
        return z.NEVER;
      }
    })
    .refine((value) => Number.isFinite(value), { message: "must be a finite number" });
}
