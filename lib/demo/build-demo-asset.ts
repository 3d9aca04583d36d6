import {
  cycleResistance,
  foulingHistory,
  INSTRUMENT_ROLES,
  isFlowRole,
  referenceDuty,
  type CleanCoefficientParameters,
  type ExchangerSpec,
  type FoulingCycle,
  type FoulingModel,
  type InstrumentRole,
  type PlannedCleaning,
  type SimulationPlan,
} from "../core/simulate";
import { criticalFouling } from "./critical-fouling";
import type { DemoAssetDefinition, DemoFoulingShape } from "./demo-asset-definition";
import { DEMO_NOISE, demoOperatingPlan } from "./demo-operating-patterns";

/** One asset of the demo fleet: what the plant knows (spec) and the hidden truth (plan). */
export interface DemoAsset {
  spec: ExchangerSpec;
  plan: SimulationPlan;
  /** What the asset is meant to show in the demo. */
  notes: string;
}

const MS_PER_DAY = 86_400_000;
const SECONDS_PER_YEAR = 365.25 * 86_400;
/** Dittus–Boelter film-coefficient exponent on flow (FIELD-NOTES §4). */
const FILM_EXPONENT = 0.8;

const INSTRUMENT_TAGS: Record<InstrumentRole, { prefix: string; suffix: string }> = {
  hotIn: { prefix: "TI", suffix: "A" },
  hotOut: { prefix: "TI", suffix: "B" },
  coldIn: { prefix: "TI", suffix: "C" },
  coldOut: { prefix: "TI", suffix: "D" },
  hotFlow: { prefix: "FI", suffix: "A" },
  coldFlow: { prefix: "FI", suffix: "B" },
};

/**
 * A fouling model with the demo's unit scale: Rf after one year of a multiplier-1 cycle is 1 (arbitrary units),
 * then multiplied by `scale` (m²·K/W) to give the true model.
 */
function scaledModel(shape: DemoFoulingShape, multiplier: number, scale: number): FoulingModel {
  const size = multiplier * scale;
  switch (shape.kind) {
    case "linear":
      return { kind: "linear", initialM2KPerW: 0, rateM2KPerWPerS: size / SECONDS_PER_YEAR };
    case "asymptotic":
      return { kind: "asymptotic", asymptoteM2KPerW: size, timeConstantS: shape.timeConstantDays * 86_400 };
    case "falling-rate":
      return { kind: "falling-rate", coefficient: size / Math.pow(SECONDS_PER_YEAR, shape.exponent), exponent: shape.exponent };
  }
}

/**
 * buildDemoAsset: the spec and simulation plan of one demo asset from its definition row.
 *
 * - Clean U at reference flows: 1/U_clean = 1/U_design − Rf_design (service U includes the design fouling
 *   allowance; standard data-sheet practice), split into hot film, cold film and wall by the row's shares;
 *   both film exponents 0.8 (Dittus–Boelter, FIELD-NOTES §4).
 * - Threshold: thresholdFraction × clean duty at reference conditions, rounded to 1 kW.
 * - Fouling: every quantity of the history (initial fouling, linear rates, asymptotes, power-law coefficients,
 *   and so the residuals after cleanings) is proportional to one scale, so Rf(t) = scale·g(t). The scale is
 *   solved in closed form so that the current cycle reaches the critical fouling (duty at reference = threshold)
 *   exactly at the target date, or levels off at the stated fraction of it.
 *
 * @throws if the row is inconsistent (shares, multipliers, an ultimate target on a non-asymptotic cycle).
 */
export function buildDemoAsset(row: DemoAssetDefinition): DemoAsset {
  const wallShare = 1 - row.hotFilmShare - row.coldFilmShare;
  if (!(row.hotFilmShare > 0 && row.coldFilmShare > 0 && wallShare > 0)) {
    throw new Error(`buildDemoAsset: ${row.tag} film shares must be positive and leave a positive wall share`);
  }
  if (row.fouling.cycleMultipliers.length !== row.cleanings.length + 1) {
    throw new Error(`buildDemoAsset: ${row.tag} needs ${row.cleanings.length + 1} cycle multipliers`);
  }

  const cleanResistance = 1 / row.designUWPerM2K - row.designFoulingM2KPerW;
  const cleanCoefficient: CleanCoefficientParameters = {
    hotFilmResistanceRefM2KPerW: row.hotFilmShare * cleanResistance,
    coldFilmResistanceRefM2KPerW: row.coldFilmShare * cleanResistance,
    wallResistanceM2KPerW: wallShare * cleanResistance,
    exponentHot: FILM_EXPONENT,
    exponentCold: FILM_EXPONENT,
    hotFlowRefKgPerS: row.reference.hotFlowKgPerS,
    coldFlowRefKgPerS: row.reference.coldFlowKgPerS,
  };

  const number = row.tag.replace(/^E-/, "");
  const specWithoutThreshold: ExchangerSpec = {
    tag: row.tag,
    name: row.name,
    unitCode: row.unitCode,
    service: row.service,
    arrangement: row.arrangement,
    tubePasses: row.tubePasses,
    areaM2: row.areaM2,
    hotStream: row.hotStream,
    coldStream: row.coldStream,
    designDutyW: row.designDutyW,
    designUWPerM2K: row.designUWPerM2K,
    designFoulingM2KPerW: row.designFoulingM2KPerW,
    reference: row.reference,
    dutyThresholdW: 0,
    instruments: INSTRUMENT_ROLES.map((role) => ({
      role,
      tag: `${INSTRUMENT_TAGS[role].prefix}-${number}${INSTRUMENT_TAGS[role].suffix}`,
      standardUncertainty: isFlowRole(role)
        ? row.flowUncertaintyFraction * (role === "hotFlow" ? row.reference.hotFlowKgPerS : row.reference.coldFlowKgPerS)
        : row.temperatureUncertaintyK,
    })),
  };
  const cleanDuty = referenceDuty(specWithoutThreshold, cleanCoefficient, 0);
  const spec: ExchangerSpec = { ...specWithoutThreshold, dutyThresholdW: Math.round((row.thresholdFraction * cleanDuty) / 1000) * 1000 };

  const cleanings: PlannedCleaning[] = row.cleanings.map((cleaning) => {
    const startMs = Date.parse(cleaning.start);
    return { startMs, endMs: startMs + cleaning.durationDays * MS_PER_DAY, effectiveness: cleaning.effectiveness, method: cleaning.method };
  });
  const fouling = row.fouling;
  const foulingPlan = (scale: number) => ({
    serviceStartMs: Date.parse(fouling.serviceStart),
    initialResistanceM2KPerW: fouling.initialFraction * scale,
    cycles: fouling.cycleMultipliers.map((multiplier) => scaledModel(fouling.shape, multiplier, scale)),
  });

  const unitCycles = foulingHistory(foulingPlan(1), cleanings);
  const current = unitCycles[unitCycles.length - 1] as FoulingCycle;
  const critical = criticalFouling(spec, cleanCoefficient);
  let scale: number;
  if ("crossing" in fouling.target) {
    scale = critical / cycleResistance(current, Date.parse(fouling.target.crossing));
  } else {
    if (current.model.kind !== "asymptotic") {
      throw new Error(`buildDemoAsset: ${row.tag} an ultimate-fraction target needs an asymptotic current cycle`);
    }
    scale = (fouling.target.ultimateFraction * critical) / (current.residualM2KPerW + current.model.asymptoteM2KPerW);
  }

  const plan: SimulationPlan = {
    cleanCoefficient,
    fouling: foulingPlan(scale),
    cleanings,
    operation: demoOperatingPlan(row.unitCode, row.hotInletPattern, row.coldInletPattern),
    faults: row.faults.map((fault) => ({
      role: fault.role,
      kind: fault.kind,
      startMs: Date.parse(fault.start),
      endMs: fault.end === null ? null : Date.parse(fault.end),
      size: fault.size,
      ...(fault.rampDays === undefined ? {} : { rampMs: fault.rampDays * MS_PER_DAY }),
      description: fault.description,
    })),
    noise: DEMO_NOISE,
  };
  return { spec, plan, notes: row.notes };
}
