// Data screening and instrument-alert commands.
import type { Command } from "commander";
import os from "node:os";
import { acknowledgeAlert, AlertNotFoundError } from "../../lib/data/acknowledge-alert";
import { listAlerts } from "../../lib/data/list-alerts";
import { refreshDataQuality } from "../../lib/data/refresh-data-quality";
import { refreshFleet } from "../../lib/data/refresh-fleet";
import { getPrisma } from "../../lib/db";
import { log, printJson, UsageError, withDatabase } from "./context";

export function registerQualityCommands(program: Command): void {
  program
    .command("screen")
    .description("screen and reconcile stored readings, detect instrument faults, store periods and alerts")
    .option("--asset <tag>", "one asset (default: every asset)")
    .option("--period <length>", "hourly or daily periods", "daily")
    .option("--json", "print JSON")
    .action(async (options: { asset?: string; period: string; json?: boolean }) => {
      if (options.period !== "hourly" && options.period !== "daily") throw new UsageError(`--period must be hourly or daily, got ${options.period}`);
      const periodS = options.period === "hourly" ? 3600 : 86400;
      await withDatabase(async () => {
        const prisma = getPrisma();
        if (options.asset && !(await prisma.asset.findUnique({ where: { tag: options.asset } }))) throw new UsageError(`unknown asset ${options.asset}`);
        const results = options.asset ? [await refreshDataQuality(prisma, options.asset, { periodS })] : await refreshFleet(prisma, { log });
        if (options.json) return printJson(results);
        for (const result of results) {
          const excluded = Object.entries(result.sampleCounts.excluded).map(([reason, count]) => `${reason} ${count}`).join(", ");
          console.log(`${result.tag}: ${result.usablePeriods}/${result.periods} usable periods; samples used ${result.sampleCounts.used}/${result.sampleCounts.total} (excluded: ${excluded}); alerts new ${result.alerts.new}, updated ${result.alerts.updated}`);
        }
      });
    });

  const alerts = program.command("alerts").description("instrument alerts (open ones by default)");
  alerts
    .command("list", { isDefault: true })
    .description("list instrument alerts")
    .option("--asset <tag>", "one asset")
    .option("--all", "include acknowledged alerts")
    .option("--json", "print JSON")
    .action(async (options: { asset?: string; all?: boolean; json?: boolean }) => {
      await withDatabase(async () => {
        const rows = await listAlerts(getPrisma(), { tag: options.asset, includeAcknowledged: options.all });
        if (options.json) return printJson(rows);
        for (const row of rows) {
          console.log(`#${row.id} ${row.tag} ${row.instrumentTag} (${row.role}) ${row.kind} from ${row.start.slice(0, 10)}${row.end ? ` to ${row.end.slice(0, 10)}` : ", still present"}; size ${row.size.toPrecision(3)} ${row.sizeUnit}${row.acknowledgedAt ? `; acknowledged by ${row.acknowledgedBy}` : ""}`);
          console.log(`    ${row.evidence}`);
        }
        console.log(`${rows.length} alert(s)`);
      });
    });
  alerts
    .command("ack")
    .description("acknowledge an alert (it leaves the open list; its period stays excluded)")
    .argument("<id>", "alert id")
    .option("--by <name>", "who acknowledges")
    .option("--note <text>", "a note", "")
    .action(async (id: string, options: { by?: string; note: string }) => {
      const number = Number(id);
      if (!Number.isInteger(number) || number < 1) throw new UsageError(`alert id must be a positive whole number, got ${id}`);
      await withDatabase(async () => {
        try {
          await acknowledgeAlert(getPrisma(), number, options.by ?? `cli:${os.userInfo().username}`, options.note);
        } catch (error) {
          if (error instanceof AlertNotFoundError) throw new UsageError(error.message);
          throw error;
        }
        console.log(`Alert ${number} acknowledged.`);
      });
    });
}
