// Database set-up commands: migrate, seed-demo, reset-demo, status.
import type { Command } from "commander";
import { databaseStatus } from "../../lib/data/database-status";
import { refreshFleet } from "../../lib/data/refresh-fleet";
import { resetDemoFleet, seedDemoFleetIfEmpty } from "../../lib/data/seed-demo-fleet";
import { getPrisma } from "../../lib/db";
import { log, printJson, target, withDatabase } from "./context";

export function registerDatabaseCommands(program: Command): void {
  program
    .command("migrate")
    .description("apply pending database migrations (also done automatically at every start)")
    .action(async () => {
      await withDatabase(async (database) => {
        const { applied, alreadyApplied } = database.migrations;
        console.log(applied.length ? `Applied ${applied.length} migration(s): ${applied.join(", ")}` : `Database is up to date (${alreadyApplied} migration(s) applied before).`);
      });
    });

  program
    .command("seed-demo")
    .description("load the demo fleet (invented site) if the database holds no assets yet")
    .action(async () => {
      await withDatabase(async () => {
        const result = await seedDemoFleetIfEmpty(getPrisma(), { log });
        if (result) await refreshFleet(getPrisma(), { log });
        console.log(result ? `Loaded the demo fleet: ${result.assets} exchangers, ${result.readings} readings.` : "The database already holds assets; nothing loaded (use reset-demo to start over).");
      });
    });

  program
    .command("reset-demo")
    .description("delete ALL sites, assets and readings, then load the demo fleet afresh")
    .requiredOption("--yes", "confirm that all stored data may be deleted")
    .action(async () => {
      await withDatabase(async () => {
        const result = await resetDemoFleet(getPrisma(), { log });
        await refreshFleet(getPrisma(), { log });
        console.log(`Reset done: ${result.assets} exchangers, ${result.readings} readings.`);
      });
    });

  program
    .command("status")
    .description("show which database is used and what it holds")
    .option("--json", "print JSON")
    .action(async (options: { json?: boolean }) => {
      await withDatabase(async (database) => {
        const status = {
          database: target.kind === "embedded" ? { kind: "embedded", dataDir: target.dataDir, port: target.port, startedByThisCommand: database.embedded?.owned ?? false } : { kind: "external" },
          ...(await databaseStatus(getPrisma())),
        };
        if (options.json) return printJson(status);
        console.log(`Database: ${target.kind === "embedded" ? `embedded PostgreSQL on 127.0.0.1:${target.port}, data in ${target.dataDir}` : "external PostgreSQL (DATABASE_URL)"}`);
        console.log(`Migrations applied: ${status.migrations}`);
        console.log(`Sites: ${status.sites}  Assets: ${status.assets}  Readings: ${status.readings}  Cleanings: ${status.cleanings}`);
      });
    });
}
