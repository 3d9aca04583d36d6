// Operating-data import commands: import (one CSV file into an asset's readings) and imports (recent batches).
import type { Command } from "commander";
import fs from "node:fs";
import fsp from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { importReadings, type ImportOptions, type ImportSummary } from "../../lib/data/import-readings";
import { listImportBatches } from "../../lib/data/list-import-batches";
import { refreshAfterImport } from "../../lib/data/refresh-after-import";
import { getPrisma } from "../../lib/db";
import type { Delimiter } from "../../lib/import/detect-delimiter";
import { ImportFailure, ImportRefusal, type RejectedRow } from "../../lib/import/import-errors";
import { resolveImportLimits } from "../../lib/import/import-limits";
import { ROLE_DEFINITIONS } from "../../lib/import/measurement-roles";
import { rejectsToCsv } from "../../lib/import/reject-report-csv";
import { unitLabel } from "../../lib/import/role-units";
import { TIMESTAMP_FORMATS, type TimestampFormat } from "../../lib/import/timestamp-formats";
import type { ColumnMappingInput } from "../../lib/validation/column-mapping";
import { printJson, UsageError, withDatabase } from "./context";

interface ImportCommandOptions {
  asset: string;
  file: string;
  mapping?: string;
  canonical?: boolean;
  saved?: boolean;
  timeZone?: string;
  decimal?: string;
  delimiter?: string;
  timestampFormat?: string;
  trustUnits?: boolean;
  rejects?: string;
  json?: boolean;
}

const REJECTS_SHOWN = 20;

function delimiterOption(text: string | undefined): Delimiter | undefined {
  if (text === undefined) return undefined;
  const delimiters: Record<string, Delimiter> = { ",": ",", comma: ",", ";": ";", semicolon: ";", tab: "\t", "\\t": "\t", "\t": "\t" };
  const delimiter = delimiters[text.toLowerCase()];
  if (!delimiter) throw new UsageError(`--delimiter must be "," ";" or tab, got "${text}"`);
  return delimiter;
}

function decimalOption(text: string | undefined): "." | "," | undefined {
  if (text === undefined) return undefined;
  if (text === "." || text === ",") return text;
  throw new UsageError(`--decimal must be "." or ",", got "${text}"`);
}

function timestampFormatOption(text: string | undefined): TimestampFormat | undefined {
  if (text === undefined) return undefined;
  const format = TIMESTAMP_FORMATS.find((candidate) => candidate.toLowerCase() === text.toLowerCase());
  if (!format) throw new UsageError(`--timestamp-format must be one of: ${TIMESTAMP_FORMATS.join(" | ")}`);
  return format;
}

async function readMappingFile(file: string): Promise<ColumnMappingInput> {
  const resolved = path.resolve(file);
  let text: string;
  try {
    text = await fsp.readFile(resolved, "utf8");
  } catch (error) {
    throw new UsageError(`cannot read the mapping file ${resolved}: ${(error as Error).message}`);
  }
  try {
    // Validated by importReadings (columnMappingSchema), which names every problem.
    return JSON.parse(text) as ColumnMappingInput;
  } catch (error) {
    throw new UsageError(`the mapping file ${resolved} is not JSON: ${(error as Error).message}`);
  }
}

function formatCount(value: number): string {
  return value.toLocaleString("en-US");
}

function printRejects(rejects: readonly RejectedRow[], total: number): void {
  if (total === 0) return;
  console.log(`First rejected rows (${Math.min(REJECTS_SHOWN, rejects.length)} of ${formatCount(total)}):`);
  for (const reject of rejects.slice(0, REJECTS_SHOWN)) console.log(`  line ${reject.line}: ${reject.reason}`);
}

function printSummary(summary: ImportSummary): void {
  const mapping =
    summary.mappingSource === "explicit"
      ? `the mapping given${summary.mappingSaved ? " (saved for the asset's next imports)" : ""}`
      : summary.mappingSource === "saved"
        ? "the asset's saved mapping"
        : "canonical headers";
  console.log(`Imported ${summary.fileName} into ${summary.assetTag} (import batch ${summary.batchId}, ${(summary.durationMs / 1000).toFixed(1)} s)`);
  console.log(`  rows read   ${formatCount(summary.rowsRead)}`);
  console.log(`  new         ${formatCount(summary.rowsNew)}`);
  console.log(`  changed     ${formatCount(summary.rowsChanged)}`);
  console.log(`  unchanged   ${formatCount(summary.rowsUnchanged)}`);
  console.log(`  rejected    ${formatCount(summary.rowsRejected)}`);
  console.log(`  time span   ${summary.firstTime ?? "—"} to ${summary.lastTime ?? "—"}`);
  console.log(`  read with   ${mapping}; timestamps ${summary.timestampFormat} (${summary.timeZone}); delimiter ${JSON.stringify(summary.delimiter)}; decimal mark "${summary.decimalMark}"`);
  console.log(`  columns     ${summary.columns.map((column) => `${column.column} → ${column.role} (${unitLabel(ROLE_DEFINITIONS[column.role].quantity, column.unit)})`).join(", ")}`);
  if (summary.ignoredColumns.length) console.log(`  ignored     ${summary.ignoredColumns.join(", ")}`);
  printRejects(summary.rejects, summary.rowsRejected);
}

function progressPrinter(totalBytes: number): (progress: { bytesRead: number; rowsRead: number }) => void {
  if (!process.stderr.isTTY) return () => undefined;
  let lastShown = 0;
  return ({ bytesRead, rowsRead }) => {
    const now = Date.now();
    if (now - lastShown < 250) return;
    lastShown = now;
    const percent = totalBytes > 0 ? Math.min(100, Math.round((bytesRead / totalBytes) * 100)) : 0;
    process.stderr.write(`\r[foulcast] reading: ${percent} % (${formatCount(rowsRead)} rows)   `);
  };
}

async function runImport(options: ImportCommandOptions): Promise<void> {
  if (options.canonical && (options.saved || options.mapping)) throw new UsageError("--canonical cannot be combined with --saved or --mapping");
  if (options.saved && options.mapping) throw new UsageError("--saved cannot be combined with --mapping");
  const file = path.resolve(options.file);
  let size: number;
  try {
    const stat = await fsp.stat(file);
    if (!stat.isFile()) throw new UsageError(`${file} is not a file`);
    size = stat.size;
  } catch (error) {
    if (error instanceof UsageError) throw error;
    throw new UsageError(`cannot read ${file}: ${(error as Error).message}`);
  }
  const importOptions: ImportOptions = {
    mappingSource: options.canonical ? "canonical" : options.saved ? "saved" : "auto",
    timeZone: options.timeZone,
    decimalMark: decimalOption(options.decimal),
    delimiter: delimiterOption(options.delimiter),
    timestampFormat: timestampFormatOption(options.timestampFormat),
    trustUnits: options.trustUnits ?? false,
    expectedBytes: size,
  };
  const mapping = options.mapping ? await readMappingFile(options.mapping) : undefined;
  const { maxBytes } = resolveImportLimits();
  await withDatabase(async () => {
    const writeRejects = async (rejects: readonly RejectedRow[]) => {
      if (!options.rejects) return;
      const target = path.resolve(options.rejects);
      await fsp.writeFile(target, rejectsToCsv(rejects), "utf8");
      if (!options.json) console.log(`Reject report written to ${target}`);
    };
    try {
      if (size > maxBytes) {
        throw new ImportRefusal("too-large", `the file is ${formatCount(size)} bytes, larger than the limit of ${formatCount(maxBytes)} bytes (FOULCAST_MAX_IMPORT_BYTES); split it into smaller files`);
      }
      const summary = await importReadings(getPrisma(), {
        assetTag: options.asset,
        source: "cli",
        createdBy: os.userInfo().username,
        fileName: path.basename(file),
        stream: fs.createReadStream(file),
        mapping,
        options: importOptions,
        onProgress: progressPrinter(size),
      });
      if (process.stderr.isTTY) process.stderr.write("\r\x1b[K");
      const { reassessed, queued } = await refreshAfterImport(getPrisma(), summary);
      if (!options.json && reassessed) console.log("Screening, instrument alerts and assessment recomputed.");
      if (!options.json && queued) console.log("Reassessment queued for the workers (FOULCAST_QUEUE=on).");
      if (options.json) printJson({ ...summary, reassessed, queued });
      else printSummary(summary);
      await writeRejects(summary.rejects);
    } catch (error) {
      if (process.stderr.isTTY) process.stderr.write("\r\x1b[K");
      if (!(error instanceof ImportRefusal) && !(error instanceof ImportFailure)) throw error;
      const rejects = error instanceof ImportRefusal ? error.rejects : [];
      if (options.json) {
        printJson({
          status: error instanceof ImportRefusal ? "refused" : "failed",
          code: error instanceof ImportRefusal ? error.code : "failed",
          error: error.message,
          batchId: error.batchId,
          rejects: rejects.slice(0, REJECTS_SHOWN),
        });
      } else {
        console.error(`${error instanceof ImportRefusal ? "Refused" : "Import failed"}: ${error.message}`);
        console.error("Nothing was imported; the asset's readings are unchanged.");
        if (error.batchId !== null) console.error(`Recorded as failed import batch ${error.batchId}.`);
        for (const reject of rejects.slice(0, REJECTS_SHOWN)) console.error(`  line ${reject.line}: ${reject.reason}`);
      }
      await writeRejects(rejects);
      process.exitCode = 1;
    }
  });
}

export function registerImportCommands(program: Command): void {
  program
    .command("import")
    .description("import a CSV file of operating data into an asset's readings (all or nothing)")
    .requiredOption("--asset <tag>", "asset tag")
    .requiredOption("--file <path>", "CSV file to import")
    .option("--mapping <file>", "column mapping (JSON, see docs/import.md); saved for the asset when the import succeeds")
    .option("--canonical", "read canonical headers (timestamp, hot_in_C, ...) even when the asset has a saved mapping")
    .option("--saved", "use the asset's saved mapping and nothing else")
    .option("--time-zone <zone>", "IANA time zone of local timestamps (default: the mapping's, else the site's)")
    .option("--decimal <mark>", 'decimal mark "." or "," (default: detected)')
    .option("--delimiter <delimiter>", 'field delimiter "," ";" or tab (default: detected)')
    .option("--timestamp-format <format>", `one of ${TIMESTAMP_FORMATS.join(" | ")} (default: detected)`)
    .option("--trust-units", "skip the check that flags a wrong unit from the first rows")
    .option("--rejects <file>", "write the rejected rows (line, reason) to this CSV file")
    .option("--json", "print the summary as JSON")
    .action(runImport);

  program
    .command("imports")
    .description("list an asset's recent imports")
    .requiredOption("--asset <tag>", "asset tag")
    .option("--limit <count>", "how many (default 20)", "20")
    .option("--json", "print JSON")
    .action(async (options: { asset: string; limit: string; json?: boolean }) => {
      const limit = Number(options.limit);
      if (!Number.isInteger(limit) || limit < 1) throw new UsageError(`--limit must be a positive whole number, got "${options.limit}"`);
      await withDatabase(async () => {
        const batches = await listImportBatches(getPrisma(), options.asset, limit);
        if (batches === null) throw new UsageError(`no asset with tag "${options.asset}"`);
        if (options.json) return printJson(batches);
        if (batches.length === 0) return console.log(`No imports for ${options.asset} yet.`);
        for (const batch of batches) {
          const counts = batch.status === "completed"
            ? `read ${formatCount(batch.rowsRead)}, new ${formatCount(batch.rowsNew)}, changed ${formatCount(batch.rowsChanged)}, unchanged ${formatCount(batch.rowsUnchanged)}, rejected ${formatCount(batch.rowsRejected)}`
            : (batch.error ?? "");
          console.log(`${String(batch.id).padStart(5)}  ${batch.startedAt.slice(0, 19)}Z  ${batch.status.padEnd(9)} ${batch.source.padEnd(3)}  ${batch.fileName}  ${counts}`);
        }
      });
    });
}
