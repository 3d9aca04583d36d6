// Asset register commands: list, add, update, export, history.
import type { Command } from "commander";
import fs from "node:fs";
import os from "node:os";
import { exportAssetFile } from "../../lib/data/export-asset-file";
import { listAssetRevisions } from "../../lib/data/list-asset-revisions";
import { listAssets } from "../../lib/data/list-assets";
import { createAsset, parseAssetFile, updateAsset, type SaveAssetResult } from "../../lib/data/save-asset";
import { getPrisma } from "../../lib/db";
import { AssetValidationError } from "../../lib/validation/asset";
import { printJson, UsageError, withDatabase } from "./context";

/** Reads an asset file: one asset object or an array of them. */
function readAssetFile(path: string): unknown[] {
  let text: string;
  try {
    text = fs.readFileSync(path, "utf8");
  } catch (error) {
    throw new UsageError(`cannot read ${path}: ${(error as Error).message}`);
  }
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch (error) {
    throw new UsageError(`${path} is not valid JSON: ${(error as Error).message}`);
  }
  return Array.isArray(raw) ? raw : [raw];
}

async function saveFromFile(path: string, by: string, save: typeof createAsset): Promise<SaveAssetResult[]> {
  const entries = readAssetFile(path);
  // Validate every entry before writing any, so a bad file changes nothing.
  const problems: string[] = [];
  const parsed = entries.flatMap((entry, index) => {
    try {
      return [parseAssetFile(entry, entries.length > 1 ? `[${index}] ` : "")];
    } catch (error) {
      if (error instanceof AssetValidationError) {
        problems.push(...error.problems);
        return [];
      }
      throw error;
    }
  });
  if (problems.length > 0) throw new UsageError(`${path} has ${problems.length} problem(s); nothing was saved:\n  ${problems.join("\n  ")}`);
  return withDatabase(async () => {
    const results: SaveAssetResult[] = [];
    for (const asset of parsed) results.push(await save(getPrisma(), asset, by));
    return results;
  });
}

function report(results: SaveAssetResult[]): void {
  for (const result of results) {
    console.log(`${result.tag}: ${result.action}${result.changedFields.length && result.action === "updated" ? ` (${result.changedFields.join(", ")})` : ""}`);
  }
}

const defaultAuthor = () => `cli:${os.userInfo().username}`;

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

  const asset = program.command("asset").description("add, update, export and review asset register entries (docs/asset-file.md)");

  asset
    .command("add")
    .description("add the asset(s) in a JSON asset file; refuses tags that exist")
    .requiredOption("--file <path>", "JSON asset file: one asset or an array")
    .option("--by <name>", "who makes the change (recorded in the history)")
    .action(async (options: { file: string; by?: string }) => report(await saveFromFile(options.file, options.by ?? defaultAuthor(), createAsset)));

  asset
    .command("update")
    .description("replace existing asset(s) with the entries of a JSON asset file; records what changed")
    .requiredOption("--file <path>", "JSON asset file: one asset or an array")
    .option("--by <name>", "who makes the change (recorded in the history)")
    .action(async (options: { file: string; by?: string }) => report(await saveFromFile(options.file, options.by ?? defaultAuthor(), updateAsset)));

  asset
    .command("export")
    .description("print an asset's register entry in the asset-file format (edit it and load it back with update)")
    .argument("<tag>", "asset tag")
    .action(async (tag: string) => {
      await withDatabase(async () => {
        const file = await exportAssetFile(getPrisma(), tag);
        if (!file) throw new UsageError(`unknown asset ${tag}`);
        printJson(file);
      });
    });

  asset
    .command("history")
    .description("show who changed an asset's register entry, when, and what")
    .argument("<tag>", "asset tag")
    .option("--json", "print JSON")
    .action(async (tag: string, options: { json?: boolean }) => {
      await withDatabase(async () => {
        const revisions = await listAssetRevisions(getPrisma(), tag);
        if (!revisions) throw new UsageError(`unknown asset ${tag}`);
        if (options.json) return printJson(revisions);
        if (revisions.length === 0) console.log(`${tag}: no recorded changes (loaded as demo data)`);
        for (const revision of revisions) {
          console.log(`${revision.changedAt}  ${revision.changedBy}  ${revision.action}: ${Object.keys(revision.changes).join(", ")}`);
        }
      });
    });
}
