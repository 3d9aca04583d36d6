// Foulcast command line for batch work: `npm run cli -- <command> [options]`.
import { Command, CommanderError } from "commander";
import { prepareDatabase, type PreparedDatabase } from "../lib/database/prepare-database";
import { databaseTarget } from "../lib/database/connection-settings";
import { disconnectPrisma, getPrisma } from "../lib/db";
import { resetDemoFleet, seedDemoFleetIfEmpty } from "../lib/data/seed-demo-fleet";
import { listAssets } from "../lib/data/list-assets";
import { databaseStatus } from "../lib/data/database-status";

const log = (message: string) => console.error(`[foulcast] ${message}`);
// Decided once, before withDatabase() exports the URL it connected to.
const target = databaseTarget();

/** Runs `work` with the database ready, and always releases what this process started. */
async function withDatabase<T>(work: (database: PreparedDatabase) => Promise<T>): Promise<T> {
  const database = await prepareDatabase({ log });
  process.env.DATABASE_URL = database.url;
  try {
    return await work(database);
  } finally {
    await disconnectPrisma();
    await database.release();
  }
}

function printJson(value: unknown): void {
  process.stdout.write(`${JSON.stringify(value, null, 2)}\n`);
}

const program = new Command()
  .name("npm run cli --")
  .description("Foulcast command line: database set-up, demo data, and batch work on exchanger data.")
  .showHelpAfterError()
  .exitOverride();

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
      if (options.json) printJson(status);
      else {
        console.log(`Database: ${target.kind === "embedded" ? `embedded PostgreSQL on 127.0.0.1:${target.port}, data in ${target.dataDir}` : "external PostgreSQL (DATABASE_URL)"}`);
        console.log(`Migrations applied: ${status.migrations}`);
        console.log(`Sites: ${status.sites}  Assets: ${status.assets}  Readings: ${status.readings}  Cleanings: ${status.cleanings}`);
      }
    });
  });

program
  .command("assets")
  .description("list the exchangers in the asset register")
  .option("--json", "print JSON")
  .action(async (options: { json?: boolean }) => {
    await withDatabase(async () => {
      const assets = await listAssets(getPrisma());
      if (options.json) return printJson(assets);
      for (const asset of assets) {
        console.log(`${asset.tag.padEnd(10)} ${asset.unitCode.padEnd(6)} ${asset.service.padEnd(22)} ${asset.name}`);
      }
      console.log(`${assets.length} asset(s)`);
    });
  });

try {
  await program.parseAsync(process.argv);
} catch (error) {
  if (error instanceof CommanderError) {
    process.exitCode = error.exitCode;
  } else {
    console.error(`Error: ${error instanceof Error ? error.message : String(error)}`);
    process.exitCode = 1;
  }
}
// Exit now: a database server left running for other users must not keep this process alive.
process.exit(process.exitCode ?? 0);
