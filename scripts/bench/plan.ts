// Planner benchmark: a seeded 500-exchanger, 52-week fleet (6 crews a week, blackouts, one turnaround, 50 groups of
// 2–4) through buildPlanningInstance and solvePlanningInstance (HiGHS), printing times, size, status and gap.
// Run: node --import tsx scripts/bench/plan.ts [--assets 500] [--weeks 52] [--gap 0.01] [--time 10] [--seed 1]
//      [--two-cleaning-share 0] [--turnaround-crews 6] [--fouling-scale 1] [--warm]
// --warm solves once before measuring (a long-lived server has compiled the WebAssembly by then).
import highsLoader from "highs";
import { assemblePlan, buildPlanningInstance, solvePlanningInstance } from "../../lib/core/plan";
import { syntheticPlanInput } from "./plan-fleet";

function argument(name: string, fallback: number): number {
  const index = process.argv.indexOf(`--${name}`);
  return index > 0 ? Number(process.argv[index + 1]) : fallback;
}

const assets = argument("assets", 500);
const weeks = argument("weeks", 52);
const relativeGap = argument("gap", 0.01);
const timeLimitSeconds = argument("time", 10);
const seed = argument("seed", 1);
const twoCleaningShare = argument("two-cleaning-share", 0);
const turnaroundCrews = argument("turnaround-crews", 6);
const foulingScale = argument("fouling-scale", 1);
const warm = process.argv.includes("--warm");

const highs = await highsLoader();
const input = syntheticPlanInput(seed, { assets, weeks, crewCapacity: 6, groups: 50, twoCleaningShare, turnaroundCrews, foulingScale });

if (warm) {
  const small = syntheticPlanInput(seed + 1, { assets: 50, weeks, crewCapacity: 6, groups: 5 });
  solvePlanningInstance(highs, buildPlanningInstance(small), { relativeGap, timeLimitSeconds });
}

let started = performance.now();
const instance = buildPlanningInstance(input, { relativeGap, timeLimitSeconds });
const buildSeconds = (performance.now() - started) / 1000;

started = performance.now();
const solution = solvePlanningInstance(highs, instance, { relativeGap, timeLimitSeconds });
const solveWallSeconds = (performance.now() - started) / 1000;

started = performance.now();
const plan = assemblePlan(input, instance, solution);
const explainSeconds = (performance.now() - started) / 1000;

const violationsByKind = plan.violations.reduce<Record<string, number>>((counts, violation) => {
  counts[violation.kind] = (counts[violation.kind] ?? 0) + 1;
  return counts;
}, {});
const moved = plan.assets.filter((outcome) => outcome.bindingConstraints.length > 0).length;
const bindingKinds = plan.assets.reduce<Record<string, number>>((counts, outcome) => {
  for (const kind of new Set(outcome.bindingConstraints.map((constraint) => constraint.kind))) counts[kind] = (counts[kind] ?? 0) + 1;
  return counts;
}, {});
const deadlineBlockers = plan.violations.reduce<Record<string, number>>((counts, violation) => {
  for (const kind of new Set(violation.blockedBy.map((constraint) => constraint.kind))) counts[kind] = (counts[kind] ?? 0) + 1;
  return counts;
}, {});

console.log(
  JSON.stringify(
    {
      fleet: { assets, weeks, crews: 6, turnaroundCrews, foulingScale, twoCleaningShare, warm, groups: input.site.groups?.length, blackoutWeeks: input.site.blackoutWeeks, seed },
      timesSeconds: { buildCostTables: buildSeconds, solveWall: solveWallSeconds, highs: solution.solver.solveSeconds, explain: explainSeconds },
      phases: solution.solver.phases,
      status: solution.status,
      gap: solution.solver.gap,
      gapOnTotalCost: solution.solver.bestBound === null ? null : (solution.solver.objective - solution.solver.bestBound) / Math.abs(solution.solver.objective),
      planCost: plan.totals.planCost,
      noCleaningCost: plan.totals.noCleaningCost,
      saving: plan.totals.saving,
      cleanings: plan.cleanings.length,
      assetsMovedFromTheirBestWeek: moved,
      bindingConstraintsByKind: bindingKinds,
      violations: violationsByKind,
      missedDeadlinesBlockedBy: deadlineBlockers,
    },
    null,
    2,
  ),
);
