// Asset register commands.
import type { Command } from "commander";
import { listAssets } from "../../lib/data/list-assets";
import { getPrisma } from "../../lib/db";
import { printJson, withDatabase } from "./context";

export function registerAssetCommands(program: Command): void {
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
}
