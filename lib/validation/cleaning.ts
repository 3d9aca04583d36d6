import { z } from "zod";

/** A cleaning record as entered in the web form or the CLI. Dates are ISO-8601 (a date alone means 00:00 UTC). */
export const cleaningSchema = z
  .object({
    tag: z.string().trim().min(1, "asset tag is required"),
    date: z.coerce.date({ error: "date must be an ISO-8601 date, e.g. 2026-05-12" }),
    endDate: z.coerce.date({ error: "endDate must be an ISO-8601 date" }).optional(),
    method: z.string().trim().min(1, "method is required (e.g. hydroblast, chemical clean, bundle pull)").max(100),
    cost: z.number({ error: "cost must be a number in the site currency" }).nonnegative("cost must not be negative").optional(),
    notes: z.string().max(2000).default(""),
  })
  .strict()
  .refine((value) => value.endDate === undefined || value.endDate >= value.date, { path: ["endDate"], message: "endDate (return to service) must not be before date" })
  .refine((value) => value.date.getTime() <= Date.now() + 86_400_000, { path: ["date"], message: "a cleaning record must not be in the future (plan future cleanings in the planner)" });

export type CleaningInput = z.input<typeof cleaningSchema>;
