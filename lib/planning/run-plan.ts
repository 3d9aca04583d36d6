// Solves a site's cleaning plan (or a what-if scenario), stores the run and compares it with the previous plan.
import type { Prisma, PrismaClient } from "../../generated/prisma/client";
import { comparePlans, planCleanings, whatIfPlan, type CleaningPlan, type WhatIfScenario } from "../core/plan";
import { recordAudit, type Actor } from "../data/record-audit";
import { getHighs } from "./highs-solver";
import { loadPlanInput, type LoadedPlanInput } from "./load-plan-input";
import { comparisonDocument, planDocument, type PlanDocument, type PlanRunInputs } from "./plan-document";

export interface RunPlanOptions {
  siteCode: string;
  actor: Actor;
  /** "Now": the horizon starts on the first Monday on or after it (site time zone); default the clock. */
  nowMs?: number;
  /** A what-if scenario: stored as a what-if run compared with a fresh baseline, never the site's current plan. */
  scenario?: Pick<WhatIfScenario, "fuelPriceFactor" | "co2PriceFactor" | "crewCapacityDelta">;
}

function runInputs(loaded: LoadedPlanInput, scenario?: RunPlanOptions["scenario"]): PlanRunInputs {
  const { crewCapacity } = loaded.input.site;
  return {
    site: loaded.site,
    settings: loaded.settings,
    calendar: loaded.calendar,
    excluded: loaded.excluded,
    turnarounds: [...(loaded.input.site.turnarounds ?? [])],
    blackoutWeeks: [...(loaded.input.site.blackoutWeeks ?? [])],
    crewCapacity: typeof crewCapacity === "number" ? Array.from({ length: loaded.input.horizon.weeks }, () => crewCapacity) : [...crewCapacity],
    ...(scenario ? { scenario } : {}),
  };
}

async function storeRun(
  prisma: PrismaClient,
  loaded: LoadedPlanInput,
  plan: CleaningPlan,
  kind: "plan" | "what-if",
  actor: Actor,
  inputs: PlanRunInputs,
  previous: { id: number; plan: CleaningPlan } | null,
) {
  let comparison: Prisma.InputJsonValue | undefined;
  if (previous && previous.plan.horizon.startMs === plan.horizon.startMs && previous.plan.horizon.weeks === plan.horizon.weeks) {
    comparison = comparisonDocument(plan, comparePlans(previous.plan, plan)) as unknown as Prisma.InputJsonValue;
  }
  return prisma.$transaction(async (tx) => {
    const run = await tx.planRun.create({
      data: {
        siteId: loaded.site.id,
        createdBy: actor.name,
        kind,
        horizonStart: new Date(plan.horizon.startMs),
        weeks: plan.horizon.weeks,
        inputs: inputs as unknown as Prisma.InputJsonValue,
        status: plan.status,
        solverStatus: plan.solver.status,
        gap: plan.solver.gap,
        solveSeconds: plan.solver.solveSeconds,
        planCost: plan.totals.planCost,
        noCleaningCost: plan.totals.noCleaningCost,
        saving: plan.totals.saving,
        result: plan as unknown as Prisma.InputJsonValue,
        previousRunId: comparison ? (previous?.id ?? null) : null,
        ...(comparison ? { comparison } : {}),
      },
    });
    await recordAudit(tx, {
      userId: actor.userId,
      actor: actor.name,
      action: kind === "plan" ? "plan.run" : "plan.what-if",
      entity: "plan",
      entityId: String(run.id),
      summary: `${kind === "plan" ? "Planned" : "What-if for"} ${loaded.site.code}: ${plan.cleanings.length} cleanings, status ${plan.status}, gap ${plan.solver.gap === null ? "n/a" : `${(plan.solver.gap * 100).toFixed(2)} %`}`,
      details: { weeks: plan.horizon.weeks, saving: plan.totals.saving, ...(inputs.scenario ? { scenario: inputs.scenario } : {}) },
    });
    return run;
  });
}

/** The latest stored plan (not what-if) of a site, or null. */
export async function latestPlanRun(prisma: PrismaClient, siteCode: string) {
  return prisma.planRun.findFirst({ where: { site: { code: siteCode }, kind: "plan" }, orderBy: { id: "desc" } });
}

/**
 * runPlan: plans the site (loadPlanInput → planCleanings with HiGHS), stores the run with its comparison to the
 * previous plan (what moved, cost difference) and an audit event, and returns the run as a PlanDocument. With a
 * scenario, plans the baseline and the scenario (whatIfPlan) and stores the scenario as a what-if run compared with
 * that baseline.
 *
 * @throws PlanningError for an unknown site or bad settings; PlanInputError from the core for inconsistent input
 */
export async function runPlan(prisma: PrismaClient, options: RunPlanOptions): Promise<PlanDocument> {
  const loaded = await loadPlanInput(prisma, options.siteCode, { nowMs: options.nowMs ?? Date.now() });
  const highs = await getHighs();
  if (options.scenario) {
    const result = whatIfPlan(highs, loaded.input, options.scenario, loaded.options);
    const baselineRun = await storeRun(prisma, loaded, result.baseline, "plan", options.actor, runInputs(loaded), await previousOf(prisma, options.siteCode));
    const run = await storeRun(prisma, loaded, result.scenario, "what-if", options.actor, runInputs(loaded, options.scenario), { id: baselineRun.id, plan: result.baseline });
    return planDocument(run);
  }
  const plan = planCleanings(highs, loaded.input, loaded.options);
  const run = await storeRun(prisma, loaded, plan, "plan", options.actor, runInputs(loaded), await previousOf(prisma, options.siteCode));
  return planDocument(run);
}

async function previousOf(prisma: PrismaClient, siteCode: string): Promise<{ id: number; plan: CleaningPlan } | null> {
  const previous = await latestPlanRun(prisma, siteCode);
  return previous ? { id: previous.id, plan: previous.result as unknown as CleaningPlan } : null;
}
