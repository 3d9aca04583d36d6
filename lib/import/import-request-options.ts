// Options of an HTTP import, from query parameters (and multipart fields): what the route handler passes on.
import { z } from "zod";
import type { ImportOptions } from "./import-options";
import type { ColumnMappingInput } from "../validation/column-mapping";
import { TIMESTAMP_FORMATS } from "./timestamp-formats";

const DELIMITER_WORDS: Record<string, "," | ";" | "\t"> = { ",": ",", comma: ",", ";": ";", semicolon: ";", tab: "\t", "\t": "\t" };

/**
 * Query parameters of POST /api/assets/{tag}/readings, all optional:
 * mapping = auto | saved | canonical | a column mapping as JSON; timeZone; decimal = . | ,; delimiter = , | ; | tab;
 * timestampFormat (one of TIMESTAMP_FORMATS); trustUnits = true | false; fileName; source = api | web.
 */
export const importRequestSchema = z
  .object({
    mapping: z.string().trim().optional(),
    timeZone: z.string().trim().min(1).optional(),
    decimal: z.enum([".", ","]).optional(),
    delimiter: z
      .string()
      .transform((text, context) => {
        const delimiter = DELIMITER_WORDS[text.toLowerCase()];
        if (!delimiter) {
          context.addIssue({ code: "custom", message: 'use "," ";" or "tab"' });
          return z.NEVER;
        }
        return delimiter;
      })
      .optional(),
    timestampFormat: z.enum(TIMESTAMP_FORMATS).optional(),
    trustUnits: z.enum(["true", "false"]).optional(),
    fileName: z.string().trim().min(1).max(255).optional(),
    source: z.enum(["api", "web"]).optional(),
  })
  .strip();

export interface ImportRequestOptions {
  mapping?: ColumnMappingInput;
  options: ImportOptions;
  fileName: string;
  source: "api" | "web";
}

export type ImportRequestParse = { ok: true; value: ImportRequestOptions } | { ok: false; message: string };

/** Reads the parameters (query first, then multipart fields for what the query leaves out). */
export function parseImportRequestOptions(...sources: readonly Record<string, string | undefined>[]): ImportRequestParse {
  const merged: Record<string, string> = {};
  for (const source of [...sources].reverse()) {
    for (const [key, value] of Object.entries(source)) if (value !== undefined && value !== "") merged[key] = value;
  }
  const parsed = importRequestSchema.safeParse(merged);
  if (!parsed.success) {
    return { ok: false, message: parsed.error.issues.map((issue) => `${issue.path.join(".") || "query"}: ${issue.message}`).join("; ") };
  }
  const { mapping: mappingText, timeZone, decimal, delimiter, timestampFormat, trustUnits, fileName, source } = parsed.data;
  let mapping: ColumnMappingInput | undefined;
  let mappingSource: ImportOptions["mappingSource"] = "auto";
  if (mappingText === "saved" || mappingText === "canonical" || mappingText === "auto") mappingSource = mappingText;
  else if (mappingText !== undefined) {
    try {
      // Validated by importReadings (columnMappingSchema), which names every problem.
      mapping = JSON.parse(mappingText) as ColumnMappingInput;
    } catch {
      return { ok: false, message: 'mapping: give "auto", "saved", "canonical" or a column mapping as JSON' };
    }
  }
  return {
    ok: true,
    value: {
      mapping,
      options: { mappingSource, timeZone, decimalMark: decimal, delimiter, timestampFormat, trustUnits: trustUnits === "true" },
      fileName: fileName ?? "upload.csv",
      source: source ?? "api",
    },
  };
}
