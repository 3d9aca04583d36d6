// Cleaning records.
import type { Command } from "commander";
import os from "node:os";
import { CleaningRecordError, recordCleaning } from "../../lib/data/record-cleaning";
import { getPrisma } from "../../lib/db";
import { printJson, UsageError, withDatabase } from "./context";

export function registerCleaningCommands(program: Command): void {
  const cleaning = program.command("cleaning").description("cleaning records (each starts a new fouling cycle)");
  cleaning
    .command("add")
    .description("record a cleaning; the asset is reassessed (queued for the workers when FOULCAST_QUEUE=on)")
    .requiredOption("--asset <tag>", "asset tag")
    .requiredOption("--date <date>", "out of service, ISO-8601 (e.g. 2026-05-12 or 2026-05-12T06:00Z)")
    .option("--end <date>", "returned to service, ISO-8601 (default: same as --date)")
    .requiredOption("--method <text>", "cleaning method, e.g. hydroblast")
    .option("--cost <amount>", "cost in the site currency")
    .option("--notes <text>", "notes", "")
    .option("--by <name>", "who records it")
    .option("--json", "print JSON")
    .action(async (options: { asset: string; date: string; end?: string; method: string; cost?: string; notes: string; by?: string; json?: boolean }) => {
      const cost = options.cost === undefined ? undefined : Number(options.cost);
      if (cost !== undefined && !Number.isFinite(cost)) throw new UsageError(`--cost must be a number, got ${options.cost}`);
      await withDatabase(async () => {
        try {
          const result = await recordCleaning(getPrisma(), { tag: options.asset, date: options.date, endDate: options.end, method: options.method, cost, notes: options.notes }, options.by ?? `cli:${os.userInfo().username}`);
          if (options.json) return printJson({ id: result.id, tag: options.asset, reassessed: result.reassessed, queued: result.queued });
          console.log(`Cleaning ${result.id} recorded for ${options.asset}${result.reassessed ? "; assessment recomputed" : ""}.`);
          if (result.queued) console.log("Reassessment queued for the workers (FOULCAST_QUEUE=on).");
        } catch (error) {
          if (error instanceof CleaningRecordError) throw new UsageError(error.message);
          throw error;
        }
      });
    });
  cleaning
    .command("list")
    .description("list an asset's cleaning records with the fouling removed")
    .requiredOption("--asset <tag>", "asset tag")
    .option("--json", "print JSON")
    .action(async (options: { asset: string; json?: boolean }) => {
      await withDatabase(async () => {
        const rows = await getPrisma().cleaning.findMany({ where: { asset: { tag: options.asset } }, orderBy: { date: "asc" } });
        if (options.json) return printJson(rows.map((row) => ({ ...row, date: row.date.toISOString(), endDate: row.endDate?.toISOString() ?? null, createdAt: row.createdAt.toISOString() })));
        for (const row of rows) {
          console.log(`${row.date.toISOString().slice(0, 10)} ${row.method}${row.costCents === null ? "" : `, cost ${(row.costCents / 100).toFixed(0)}`}${row.effectiveness === null ? "" : `, fouling removed ${(row.effectiveness * 100).toFixed(0)} %`}`);
        }
      });
    });
}
