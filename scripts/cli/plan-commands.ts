// The cleaning planner: plan, what-if, bookings, calendar and exports.
import type { Command } from "commander";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import type { Actor } from "../../lib/data/record-audit";
import { getPrisma } from "../../lib/db";
import { acceptProposals, listBookings, moveBooking, releaseBooking } from "../../lib/planning/bookings";
import { exportPlan, PLAN_EXPORT_FORMATS, type PlanExportFormat } from "../../lib/planning/export-plan";
import { PlanningError } from "../../lib/planning/load-plan-input";
import { planDocument, type PlanDocument } from "../../lib/planning/plan-document";
import { latestPlanRun, runPlan } from "../../lib/planning/run-plan";
import { addCalendarWindow, getPlanSettings, listCalendarWindows, listExclusionGroups, removeCalendarWindow, setExclusionGroup, updatePlanSettings } from "../../lib/planning/site-calendar";
import { printJson, UsageError, withDatabase } from "./context";

const cliActor = (): Actor => ({ userId: null, name: `cli:${os.userInfo().username}` });

/** The site to plan: --site, or the only site in the database. */
async function resolveSite(code: string | undefined): Promise<string> {
  if (code) return code;
  const sites = await getPrisma().site.findMany({ select: { code: true } });
  if (sites.length === 1) return (sites[0] as { code: string }).code;
  throw new UsageError(sites.length === 0 ? "the database holds no site yet" : `several sites (${sites.map((site) => site.code).join(", ")}): choose one with --site`);
}

async function planning<T>(work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (error) {
    if (error instanceof PlanningError) throw new UsageError(error.message);
    throw error;
  }
}

const money = (value: number, currency: string) => `${Math.round(value).toLocaleString("en-GB")} ${currency}`;

function printPlan(document: PlanDocument): void {
  const { totals, solver } = document;
  console.log(`Plan ${document.id} (${document.kind}) of ${document.site.code}: ${document.horizon.start} to ${document.horizon.end}, ${document.horizon.weeks} weeks`);
  console.log(`Status ${document.status} (HiGHS: ${solver.status}), gap ${solver.gap === null ? "n/a" : `${(solver.gap * 100).toFixed(3)} %`}, ${solver.solveSeconds.toFixed(2)} s`);
  console.log(`Cost ${money(totals.planCost, totals.currency)} against ${money(totals.noCleaningCost, totals.currency)} without cleaning: saves ${money(totals.saving, totals.currency)}`);
  for (const cleaning of document.cleanings) {
    console.log(`  ${cleaning.start}  ${cleaning.tag.padEnd(10)} ${cleaning.state.padEnd(8)} ${cleaning.window.padEnd(14)} saves ${money(cleaning.savingVsNoCleaning, totals.currency)}`);
  }
  for (const violation of document.violations) console.log(`  ! ${violation.message}`);
  for (const excluded of document.excluded) console.log(`  - ${excluded.tag} not planned: ${excluded.reason}`);
  if (document.comparison) {
    const { comparison } = document;
    console.log(`Against plan ${comparison.previousRunId}: ${comparison.changes.length} asset(s) changed, cost ${comparison.costDifference >= 0 ? "+" : ""}${money(comparison.costDifference, totals.currency)}`);
    for (const change of comparison.changes) console.log(`  ${change.tag}: ${change.change} ${change.from.join(",") || "-"} -> ${change.to.join(",") || "-"} (${change.costDifference >= 0 ? "+" : ""}${money(change.costDifference, totals.currency)})`);
  }
  console.log(document.advisory);
}

const numberOption = (value: string | undefined, name: string): number | undefined => {
  if (value === undefined) return undefined;
  const parsed = Number(value);
  if (!Number.isFinite(parsed)) throw new UsageError(`${name} must be a number, got "${value}"`);
  return parsed;
};

export function registerPlanCommands(program: Command): void {
  program
    .command("plan")
    .description("propose cleaning dates for a site (mixed-integer programme, HiGHS); stores the run and compares it with the previous plan")
    .option("--site <code>", "site code (default: the only site)")
    .option("--fuel-factor <x>", "what-if: multiply fuel prices, e.g. 1.3")
    .option("--co2-factor <x>", "what-if: multiply CO2 prices")
    .option("--crew-delta <n>", "what-if: add (or remove, negative) crews in every week")
    .option("--show", "print the latest stored plan instead of planning again")
    .option("--json", "print the plan as JSON")
    .action(async (options: { site?: string; fuelFactor?: string; co2Factor?: string; crewDelta?: string; show?: boolean; json?: boolean }) => {
      const fuelPriceFactor = numberOption(options.fuelFactor, "--fuel-factor");
      const co2PriceFactor = numberOption(options.co2Factor, "--co2-factor");
      const crewCapacityDelta = numberOption(options.crewDelta, "--crew-delta");
      if (crewCapacityDelta !== undefined && !Number.isInteger(crewCapacityDelta)) throw new UsageError("--crew-delta must be a whole number");
      const whatIf = fuelPriceFactor !== undefined || co2PriceFactor !== undefined || crewCapacityDelta !== undefined;
      await withDatabase(async () =>
        planning(async () => {
          const siteCode = await resolveSite(options.site);
          let document: PlanDocument;
          if (options.show) {
            const run = await latestPlanRun(getPrisma(), siteCode);
            if (!run) throw new UsageError(`site ${siteCode} has no plan yet: run "plan" first`);
            document = planDocument(run);
          } else {
            const scenario = whatIf
              ? { ...(fuelPriceFactor !== undefined ? { fuelPriceFactor } : {}), ...(co2PriceFactor !== undefined ? { co2PriceFactor } : {}), ...(crewCapacityDelta !== undefined ? { crewCapacityDelta } : {}) }
              : undefined;
            document = await runPlan(getPrisma(), { siteCode, actor: cliActor(), ...(scenario ? { scenario } : {}) });
          }
          if (options.json) printJson(document);
          else printPlan(document);
        }),
      );
    });

  program
    .command("plan-export")
    .description("write the latest plan (or --run ID) as iCalendar, CSV or XLSX")
    .requiredOption("--format <format>", `one of ${PLAN_EXPORT_FORMATS.join(", ")}`)
    .option("--site <code>", "site code (default: the only site)")
    .option("--run <id>", "plan run id (default: the latest plan)")
    .option("--out <file>", "output file (default: standard output for ics and csv)")
    .action(async (options: { format: string; site?: string; run?: string; out?: string }) => {
      if (!PLAN_EXPORT_FORMATS.includes(options.format as PlanExportFormat)) throw new UsageError(`--format must be one of ${PLAN_EXPORT_FORMATS.join(", ")}, got "${options.format}"`);
      const format = options.format as PlanExportFormat;
      if (format === "xlsx" && !options.out) throw new UsageError("--out <file> is needed for xlsx");
      await withDatabase(async () =>
        planning(async () => {
          const siteCode = await resolveSite(options.site);
          const runId = numberOption(options.run, "--run");
          const run = runId === undefined ? await latestPlanRun(getPrisma(), siteCode) : await getPrisma().planRun.findFirst({ where: { id: runId, site: { code: siteCode } } });
          if (!run) throw new UsageError(runId === undefined ? `site ${siteCode} has no plan yet` : `no plan run ${runId} at ${siteCode}`);
          const file = await exportPlan(run, format, Date.now());
          if (options.out) {
            fs.writeFileSync(path.resolve(options.out), file.body);
            console.error(`Wrote ${file.body.length} bytes to ${options.out}`);
          } else process.stdout.write(file.body);
        }),
      );
    });

  const booking = program.command("booking").description("cleaning weeks fixed by the planner (kept by every re-plan)");
  booking
    .command("list")
    .option("--site <code>", "site code")
    .option("--json", "print JSON")
    .action(async (options: { site?: string; json?: boolean }) => {
      await withDatabase(async () =>
        planning(async () => {
          const rows = await listBookings(getPrisma(), await resolveSite(options.site));
          if (options.json) return printJson(rows);
          for (const row of rows) console.log(`${row.weekStart}  ${row.tag.padEnd(10)} ${row.origin}${row.note ? `  ${row.note}` : ""}`);
        }),
      );
    });
  booking
    .command("accept")
    .description("book the weeks the latest plan proposes (for --asset, or for every asset with --all)")
    .option("--site <code>", "site code")
    .option("--asset <tags...>", "asset tags")
    .option("--all", "every proposed cleaning")
    .action(async (options: { site?: string; asset?: string[]; all?: boolean }) => {
      if (!options.all && !options.asset?.length) throw new UsageError("name --asset <tag...> or --all");
      await withDatabase(async () =>
        planning(async () => {
          const made = await acceptProposals(getPrisma(), await resolveSite(options.site), options.all ? [] : (options.asset ?? []), cliActor());
          console.log(made.length ? made.map((entry) => `Booked ${entry.tag} for the week of ${entry.weekStart}`).join("\n") : "Nothing to book.");
        }),
      );
    });
  booking
    .command("move")
    .description("book an asset's cleaning for the week containing --week (replaces its future bookings)")
    .requiredOption("--asset <tag>", "asset tag")
    .requiredOption("--week <date>", "a date in the wanted week, YYYY-MM-DD")
    .option("--note <text>", "why", "")
    .action(async (options: { asset: string; week: string; note: string }) => {
      await withDatabase(async () =>
        planning(async () => {
          const result = await moveBooking(getPrisma(), options.asset, options.week, cliActor(), { note: options.note });
          console.log(`Booked ${result.tag} for the week of ${result.weekStart}${result.replaced.length ? ` (was ${result.replaced.join(", ")})` : ""}. Run "plan" to re-plan around it.`);
        }),
      );
    });
  booking
    .command("release")
    .description("remove an asset's future bookings so the planner chooses again")
    .requiredOption("--asset <tag>", "asset tag")
    .action(async (options: { asset: string }) => {
      await withDatabase(async () =>
        planning(async () => {
          const result = await releaseBooking(getPrisma(), options.asset, cliActor());
          console.log(`Released ${options.asset}: ${result.released.join(", ")}`);
        }),
      );
    });

  const calendar = program.command("calendar").description("planning settings, turnaround and blackout windows, exclusion groups");
  calendar
    .command("show")
    .option("--site <code>", "site code")
    .option("--json", "print JSON")
    .action(async (options: { site?: string; json?: boolean }) => {
      await withDatabase(async () =>
        planning(async () => {
          const siteCode = await resolveSite(options.site);
          const result = { settings: await getPlanSettings(getPrisma(), siteCode), windows: await listCalendarWindows(getPrisma(), siteCode), groups: await listExclusionGroups(getPrisma(), siteCode) };
          if (options.json) return printJson(result);
          const s = result.settings;
          console.log(`Crews ${s.crewCapacity}, horizon ${s.horizonWeeks} weeks, deadline ${s.deadlineQuantile.toUpperCase()}, at least ${s.minimumDaysBetweenCleanings} days between cleanings, solver limit ${s.timeLimitSeconds} s`);
          for (const window of result.windows) console.log(`  [${window.id}] ${window.kind.padEnd(10)} ${window.startDate} to ${window.endDate}  ${window.name}`);
          for (const group of result.groups) console.log(`  group ${group.name}: ${group.tags.join(", ")}`);
        }),
      );
    });
  calendar
    .command("settings")
    .option("--site <code>", "site code")
    .option("--crews <n>", "cleanings at once")
    .option("--horizon-weeks <n>", "planning horizon, weeks (1..105)")
    .option("--quantile <q>", "deadline quantile p10 | p50 | p90")
    .option("--min-days <n>", "days in service before the next cleaning")
    .option("--time-limit <s>", "solver time limit, seconds")
    .action(async (options: { site?: string; crews?: string; horizonWeeks?: string; quantile?: string; minDays?: string; timeLimit?: string }) => {
      const input: Record<string, unknown> = {};
      if (options.crews !== undefined) input.crewCapacity = numberOption(options.crews, "--crews");
      if (options.horizonWeeks !== undefined) input.horizonWeeks = numberOption(options.horizonWeeks, "--horizon-weeks");
      if (options.quantile !== undefined) input.deadlineQuantile = options.quantile;
      if (options.minDays !== undefined) input.minimumDaysBetweenCleanings = numberOption(options.minDays, "--min-days");
      if (options.timeLimit !== undefined) input.timeLimitSeconds = numberOption(options.timeLimit, "--time-limit");
      await withDatabase(async () =>
        planning(async () => {
          const after = await updatePlanSettings(getPrisma(), await resolveSite(options.site), input, cliActor());
          console.log(`Crews ${after.crewCapacity}, horizon ${after.horizonWeeks} weeks, deadline ${after.deadlineQuantile.toUpperCase()}, ${after.minimumDaysBetweenCleanings} days between cleanings, limit ${after.timeLimitSeconds} s`);
        }),
      );
    });
  calendar
    .command("add")
    .description("add a turnaround window (cleanings inside cost no extra outage) or a blackout (no cleaning)")
    .option("--site <code>", "site code")
    .requiredOption("--kind <kind>", "turnaround | blackout")
    .requiredOption("--name <text>", "name")
    .requiredOption("--from <date>", "first day, YYYY-MM-DD")
    .requiredOption("--to <date>", "last day, YYYY-MM-DD")
    .action(async (options: { site?: string; kind: string; name: string; from: string; to: string }) => {
      await withDatabase(async () =>
        planning(async () => {
          const row = await addCalendarWindow(getPrisma(), await resolveSite(options.site), { kind: options.kind, name: options.name, startDate: options.from, endDate: options.to }, cliActor());
          console.log(`Added ${row.kind} [${row.id}] ${row.name}: ${row.startDate} to ${row.endDate}`);
        }),
      );
    });
  calendar
    .command("remove")
    .option("--site <code>", "site code")
    .requiredOption("--id <id>", "window id (see calendar show)")
    .action(async (options: { site?: string; id: string }) => {
      const id = numberOption(options.id, "--id") as number;
      await withDatabase(async () =>
        planning(async () => {
          await removeCalendarWindow(getPrisma(), await resolveSite(options.site), id, cliActor());
          console.log(`Removed window ${id}.`);
        }),
      );
    });
  calendar
    .command("group")
    .description("exchangers that must never be out together (no tags: delete the group)")
    .option("--site <code>", "site code")
    .requiredOption("--name <text>", "group name")
    .option("--assets <tags...>", "asset tags", [])
    .action(async (options: { site?: string; name: string; assets: string[] }) => {
      await withDatabase(async () =>
        planning(async () => {
          await setExclusionGroup(getPrisma(), await resolveSite(options.site), options.name, options.assets, cliActor());
          console.log(options.assets.length ? `Group ${options.name}: ${options.assets.join(", ")}` : `Removed group ${options.name}.`);
        }),
      );
    });
}
