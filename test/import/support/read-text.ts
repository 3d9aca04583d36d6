// Runs ReadingsCsvReader over a text and collects what it hands out (for the parser tests; no database).
import { resolveImportLimits, type ImportLimits } from "../../../lib/import/import-limits";
import { MEASUREMENT_ROLES, type MeasurementRole } from "../../../lib/import/measurement-roles";
import { ReadingsCsvReader, type ReadingsCsvOptions } from "../../../lib/import/read-readings-csv";
import { textStream } from "./fixtures";

export interface ReadRow {
  line: number;
  timeMs: number;
  values: Record<MeasurementRole, number | null>;
}

export interface ReadResult {
  reader: ReadingsCsvReader;
  rows: ReadRow[];
}

/** Reads `text` (in chunks of `chunkBytes`) and returns the reader and every accepted row. */
export async function readText(
  text: string | Buffer,
  options: Partial<Omit<ReadingsCsvOptions, "limits" | "onBatch">> & { limits?: Partial<ImportLimits>; chunkBytes?: number } = {},
): Promise<ReadResult> {
  const rows: ReadRow[] = [];
  const reader = new ReadingsCsvReader({
    mapping: null,
    mappingSource: "canonical",
    defaultTimeZone: "UTC",
    ...options,
    limits: resolveImportLimits(options.limits ?? {}, {}),
    onBatch: async (batch) => {
      batch.lines.forEach((line, index) => {
        const values = {} as Record<MeasurementRole, number | null>;
        for (const role of MEASUREMENT_ROLES) values[role] = batch.values[role][index] ?? null;
        rows.push({ line, timeMs: batch.timesMs[index] as number, values });
      });
    },
  });
  const bytes = text;
  await reader.read(typeof bytes === "string" ? textStream(bytes, options.chunkBytes) : (async function* () { yield bytes; })());
  return { reader, rows };
}

/** The refusal a read ends with (fails the test when the read succeeds). */
export async function refusalOf(text: string | Buffer, options: Parameters<typeof readText>[1] = {}): Promise<{ code: string; message: string }> {
  try {
    await readText(text, options);
  } catch (error) {
    const refusal = error as { code?: string; message: string; name?: string };
    if (refusal.name !== "ImportRefusal") throw error;
    return { code: refusal.code ?? "", message: refusal.message };
  }
  throw new Error("expected the file to be refused");
}
