// Foulcast command line for batch work: `npm run cli -- <command> [options]`.
// Each group of commands registers itself from scripts/cli/.
import { Command, CommanderError } from "commander";
import { registerAssessCommands } from "./cli/assess-commands";
import { registerAssetCommands } from "./cli/asset-commands";
import { registerCleaningCommands } from "./cli/cleaning-commands";
import { UsageError } from "./cli/context";
import { registerDatabaseCommands } from "./cli/database-commands";
import { registerImportCommands } from "./cli/import-commands";
import { registerPlanCommands } from "./cli/plan-commands";
import { registerQualityCommands } from "./cli/quality-commands";
import { registerReassessCommands } from "./cli/reassess-commands";
import { registerUserCommands } from "./cli/user-commands";

const program = new Command()
  .name("npm run cli --")
  .description("Foulcast command line: database set-up, demo data, and batch work on exchanger data.")
  .showHelpAfterError()
  .exitOverride();

registerDatabaseCommands(program);
registerAssetCommands(program);
registerImportCommands(program);
registerQualityCommands(program);
registerAssessCommands(program);
registerReassessCommands(program);
registerCleaningCommands(program);
registerPlanCommands(program);
registerUserCommands(program);

try {
  await program.parseAsync(process.argv);
} catch (error) {
  if (error instanceof CommanderError) {
    process.exitCode = error.exitCode;
  } else {
    console.error(`Error: ${error instanceof Error ? error.message : String(error)}`);
    if (!(error instanceof UsageError) && process.env.FOULCAST_DEBUG) console.error(error);
    process.exitCode = 1;
  }
}
// Exit now: a database server left running for other users must not keep this process alive.
process.exit(process.exitCode ?? 0);
