// The asset register entry, as written in a JSON asset file (docs/asset-file.md)
// or sent by the web form: validated here and converted to SI.
import { z } from "zod";
import { temaDesignFouling, TEMA_DESIGN_FOULING } from "../core/fouling-allowance";
import { maximumDuty, ThermalInputError, type HeatCapacity } from "../core/thermal";
import { quantitySchema } from "./quantity";
import { parseUnit, toSI, type Quantity } from "../core/units";

export const INSTRUMENT_ROLES = ["hotIn", "hotOut", "coldIn", "coldOut", "hotFlow", "coldFlow", "hotPressureDrop", "coldPressureDrop"] as const;
export type InstrumentRoleName = (typeof INSTRUMENT_ROLES)[number];
const MEASUREMENT_ROLES = new Set<InstrumentRoleName>(["hotIn", "hotOut", "coldIn", "coldOut", "hotFlow", "coldFlow"]);

const text = (label: string, max = 200) =>
  z.string({ error: `${label} must be text` }).trim().min(1, `${label} must not be empty`).max(max, `${label} must be at most ${max} characters`);

const tagSchema = z
  .string({ error: "tag must be text" })
  .trim()
  .regex(/^[A-Za-z0-9][A-Za-z0-9._\-/ ]{0,39}$/, "tag must be 1-40 letters, digits, spaces or . _ - /, starting with a letter or digit");

const siteSchema = z.union([
  text("site code", 20),
  z.object({
    code: text("site code", 20),
    name: text("site name"),
    timeZone: z.string().refine(isTimeZone, { message: "time zone must be an IANA zone such as Europe/Amsterdam" }),
  }).strict(),
]);

const unitSchema = z.union([
  text("unit code", 20),
  z.object({ code: text("unit code", 20), name: text("unit name") }).strict(),
]);

const arrangementSchema = z.discriminatedUnion(
  "kind",
  [
    z.object({ kind: z.literal("counterflow"), tubePasses: z.number().int().min(1).max(16).optional() }).strict(),
    z.object({ kind: z.literal("parallel"), tubePasses: z.number().int().min(1).max(16).optional() }).strict(),
    z.object({
      kind: z.literal("shell-and-tube"),
      shells: z.number({ error: "shells must be a whole number" }).int("shells must be a whole number").min(1, "shells must be at least 1").max(12, "shells must be at most 12"),
      tubePasses: z.number({ error: "tubePasses must be a whole number" }).int().min(2, "tubePasses must be an even number ≥ 2 for an E shell").max(16).refine((value) => value % 2 === 0, "tubePasses must be even for an E shell (1 shell pass, 2N tube passes)"),
    }).strict(),
    z.object({ kind: z.literal("crossflow-unmixed") }).strict(),
    z.object({ kind: z.literal("crossflow-mixed"), mixedStream: z.enum(["hot", "cold"], { error: 'mixedStream must be "hot" or "cold"' }) }).strict(),
  ],
  { error: 'arrangement.kind must be one of "counterflow", "parallel", "shell-and-tube", "crossflow-unmixed", "crossflow-mixed"' },
);

const heatCapacitySchema = z.discriminatedUnion(
  "kind",
  [
    z.object({ kind: z.literal("constant"), value: quantitySchema("specificHeat").refine((v) => v > 0, "specific heat must be positive") }).strict(),
    z.object({
      kind: z.literal("linear"),
      // cp(T) = intercept + slope·T with T in kelvin; intercept J/(kg·K), slope J/(kg·K²)
      interceptJPerKgK: z.number({ error: "interceptJPerKgK must be a number (J/(kg·K))" }),
      slopeJPerKgK2: z.number({ error: "slopeJPerKgK2 must be a number (J/(kg·K²))" }),
    }).strict(),
    z.object({ kind: z.literal("water"), pressure: quantitySchema("pressure").refine((v) => v > 0, "pressure must be positive").optional() }).strict(),
  ],
  { error: 'heatCapacity.kind must be "constant", "linear" or "water"' },
);

const streamSchema = z.object({ name: text("stream name"), heatCapacity: heatCapacitySchema }).strict();

const positive = (label: string) => (value: number) => value > 0 || `${label} must be positive`;

const instrumentSchema = z.object({
  role: z.enum(INSTRUMENT_ROLES, { error: `role must be one of ${INSTRUMENT_ROLES.join(", ")}` }),
  tag: text("instrument tag", 40),
  // standard uncertainty (one standard deviation): a number in SI (K for temperatures, kg/s for flows, Pa for
  // pressure drops), { value, unit }, or { percentOfReading } (taken at the reference flow)
  uncertainty: z.union(
    [
      z.number().positive("uncertainty must be positive"),
      z.object({ value: z.number().positive("uncertainty must be positive"), unit: z.string() }).strict(),
      z.object({ percentOfReading: z.number().positive("percentOfReading must be positive").max(50, "percentOfReading must be at most 50") }).strict(),
    ],
    { error: 'uncertainty must be a positive number in SI, { "value", "unit" } or { "percentOfReading" }' },
  ),
}).strict();

const economicsSchema = z.object({
  fuelPricePerGJ: z.number().nonnegative().optional(),
  furnaceEfficiency: z.number().gt(0, "furnaceEfficiency must be above 0").max(1, "furnaceEfficiency is a fraction, at most 1").optional(),
  co2KgPerGJ: z.number().nonnegative().optional(),
  co2PricePerTonne: z.number().nonnegative().optional(),
  cleaningCost: z.number().nonnegative().optional(),
  cleaningOutageDays: z.number().nonnegative().max(365).optional(),
  lostProductionPerDay: z.number().nonnegative().optional(),
}).strict();

const foulingQuantitySchema = quantitySchema("foulingResistance");

/** A fouling resistance, or { "tema": "<service id>" } for the TEMA table default of that service. */
const designFoulingSchema = z.unknown().transform((input, context): number => {
  if (input && typeof input === "object" && "tema" in input) {
    const id = (input as { tema: unknown }).tema;
    const found = typeof id === "string" ? temaDesignFouling(id) : undefined;
    if (!found) {
      context.addIssue({ code: "custom", message: `unknown TEMA service ${JSON.stringify(id)}; known: ${TEMA_DESIGN_FOULING.map((entry) => entry.id).join(", ")}` });
      return z.NEVER;
    }
    return found.m2KPerW;
  }
  const parsed = foulingQuantitySchema.safeParse(input);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) context.addIssue({ code: "custom", message: issue.message });
    return z.NEVER;
  }
  return parsed.data;
});

/** Default pressure of a water stream when the file gives none: 0.5 MPa, a typical cooling-water supply (common practice). */
export const DEFAULT_WATER_PRESSURE_PA = 5e5;

export const assetFileSchema = z
  .object({
    tag: tagSchema,
    name: text("name"),
    site: siteSchema,
    unit: unitSchema,
    service: text("service", 100),
    arrangement: arrangementSchema,
    area: quantitySchema("area").refine((v) => v > 0, "area must be positive"),
    hotStream: streamSchema,
    coldStream: streamSchema,
    designDuty: quantitySchema("power").refine((v) => v > 0, "designDuty must be positive"),
    designU: quantitySchema("heatTransferCoefficient").refine((v) => v > 0, "designU must be positive"),
    designFouling: designFoulingSchema.refine((v) => v >= 0, "designFouling must not be negative"),
    reference: z.object({
      hotInlet: quantitySchema("temperature").refine((v) => v > 0, "hotInlet must be above absolute zero"),
      coldInlet: quantitySchema("temperature").refine((v) => v > 0, "coldInlet must be above absolute zero"),
      hotFlow: quantitySchema("massFlow").refine(positive("hotFlow"), "hotFlow must be positive"),
      coldFlow: quantitySchema("massFlow").refine(positive("coldFlow"), "coldFlow must be positive"),
    }).strict(),
    dutyThreshold: quantitySchema("power").refine((v) => v > 0, "dutyThreshold must be positive"),
    minimumOutlet: z.object({ stream: z.enum(["hot", "cold"]), temperature: quantitySchema("temperature") }).strict().optional(),
    instruments: z.array(instrumentSchema).default([]),
    economics: economicsSchema.default({}),
    notes: z.string().max(4000).default(""),
  })
  .strict()
  .superRefine((asset, context) => {
    const roles = asset.instruments.map((instrument) => instrument.role);
    roles.forEach((role, index) => {
      if (roles.indexOf(role) !== index) context.addIssue({ code: "custom", path: ["instruments", index, "role"], message: `instrument role ${role} is listed twice` });
    });
    if (!(asset.reference.hotInlet > asset.reference.coldInlet)) {
      context.addIssue({ code: "custom", path: ["reference", "hotInlet"], message: `reference hot inlet (${(asset.reference.hotInlet - 273.15).toFixed(2)} °C) must be above the cold inlet (${(asset.reference.coldInlet - 273.15).toFixed(2)} °C)` });
      return;
    }
    // The thermodynamic limit Cmin·(T_hot,in − T_cold,in) bounds every duty at reference conditions.
    try {
      const limit = maximumDuty({
        hot: { massFlowKgPerS: asset.reference.hotFlow, heatCapacity: toHeatCapacity(asset.hotStream.heatCapacity), inletK: asset.reference.hotInlet },
        cold: { massFlowKgPerS: asset.reference.coldFlow, heatCapacity: toHeatCapacity(asset.coldStream.heatCapacity), inletK: asset.reference.coldInlet },
      });
      // 2 % margin: the limit takes cp at the inlet temperatures (see maximumDuty)
      if (asset.designDuty > limit * 1.02) {
        context.addIssue({ code: "custom", path: ["designDuty"], message: `designDuty ${(asset.designDuty / 1e6).toPrecision(4)} MW exceeds the most any exchanger could transfer at the reference conditions, ${(limit / 1e6).toPrecision(4)} MW (Cmin·(hot inlet − cold inlet))` });
      }
      if (asset.dutyThreshold > limit * 1.02) {
        context.addIssue({ code: "custom", path: ["dutyThreshold"], message: `dutyThreshold ${(asset.dutyThreshold / 1e6).toPrecision(4)} MW exceeds the thermodynamic limit at the reference conditions, ${(limit / 1e6).toPrecision(4)} MW` });
      }
    } catch (error) {
      if (error instanceof ThermalInputError) context.addIssue({ code: "custom", path: ["reference"], message: `reference conditions: ${error.message}` });
      else throw error;
    }
  });

export type AssetFileInput = z.input<typeof assetFileSchema>;
export type InstrumentInput = z.output<typeof instrumentSchema>;

const ROLE_QUANTITY = {
  hotIn: "temperatureDifference", hotOut: "temperatureDifference", coldIn: "temperatureDifference", coldOut: "temperatureDifference",
  hotFlow: "massFlow", coldFlow: "massFlow", hotPressureDrop: "pressure", coldPressureDrop: "pressure",
} as const satisfies Record<InstrumentRoleName, Quantity>;

/**
 * An instrument's standard uncertainty in SI: K, kg/s or Pa. A percentage of reading is taken at the
 * reference flow (flows) and refused for temperatures, whose percentage depends on the temperature scale.
 */
export function instrumentUncertaintySI(instrument: InstrumentInput, reference: { hotFlow: number; coldFlow: number }): number {
  const quantity = ROLE_QUANTITY[instrument.role];
  const given = instrument.uncertainty;
  if (typeof given === "number") return given;
  if ("percentOfReading" in given) {
    if (instrument.role === "hotFlow") return (given.percentOfReading / 100) * reference.hotFlow;
    if (instrument.role === "coldFlow") return (given.percentOfReading / 100) * reference.coldFlow;
    throw new AssetValidationError([`instrument ${instrument.tag}: percentOfReading applies to flow meters only; give ${instrument.role} in K or with a unit`]);
  }
  try {
    return toSI(quantity, given.value, parseUnit(quantity, given.unit));
  } catch (error) {
    throw new AssetValidationError([`instrument ${instrument.tag}: ${(error as Error).message}`]);
  }
}

/** Validation problems of an asset entry, one message per problem, each naming its field. */
export class AssetValidationError extends Error {
  constructor(readonly problems: string[]) {
    super(problems.join("; "));
    this.name = "AssetValidationError";
  }
}
export type AssetFileParsed = z.output<typeof assetFileSchema>;

export function toHeatCapacity(parsed: AssetFileParsed["hotStream"]["heatCapacity"]): HeatCapacity {
  switch (parsed.kind) {
    case "constant":
      return { kind: "constant", jPerKgK: parsed.value };
    case "linear":
      return { kind: "linear", interceptJPerKgK: parsed.interceptJPerKgK, slopeJPerKgK2: parsed.slopeJPerKgK2 };
    case "water":
      return { kind: "water", pressurePa: parsed.pressure ?? DEFAULT_WATER_PRESSURE_PA };
  }
}

function isTimeZone(zone: string): boolean {
  try {
    new Intl.DateTimeFormat("en-US", { timeZone: zone });
    return true;
  } catch {
    return false;
  }
}

/** "hotStream.heatCapacity.value: specific heat must be positive" — one line per problem. */
export function describeIssues(error: z.ZodError, prefix = ""): string[] {
  return error.issues.map((issue) => `${prefix}${issue.path.length ? `${issue.path.join(".")}: ` : ""}${issue.message}`);
}

export { MEASUREMENT_ROLES };
