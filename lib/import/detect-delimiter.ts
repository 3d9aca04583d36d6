// Which field delimiter a file uses: comma, semicolon or tab.
import { splitCsvSample } from "./split-csv-sample";

export type Delimiter = "," | ";" | "\t";

export const DELIMITERS: readonly Delimiter[] = [",", ";", "\t"];

export const DELIMITER_NAMES: { readonly [D in Delimiter]: string } = { ",": "comma", ";": "semicolon", "\t": "tab" };

const SAMPLE_RECORDS = 50;

function fieldCountMatches(fields: readonly string[], headerCount: number): boolean {
  if (fields.length === headerCount) return true;
  // A trailing delimiter on data lines only (empty extra fields) is tolerated by the import too.
  return fields.length > headerCount && fields.slice(headerCount).every((field) => field.trim() === "");
}

/**
 * Detects the delimiter from the start of a file (`complete` false when `text` is only its first kilobytes): for
 * each candidate, the header must split into at least two fields, and the share of the next 50 records with the
 * header's field count is its consistency. The most consistent candidate wins, then the one with more header
 * fields, then the order comma, semicolon, tab. A file with one column falls back to comma (the import then
 * reports the missing columns, naming the one column it found).
 */
export function detectDelimiter(text: string, complete = true): Delimiter {
  let best: { delimiter: Delimiter; consistency: number; strayQuotes: number; headerCount: number } | null = null;
  for (const delimiter of DELIMITERS) {
    const records = splitCsvSample(text, delimiter, complete).slice(0, SAMPLE_RECORDS + 1);
    const [header, ...rows] = records;
    if (!header || header.fields.length < 2) continue;
    const headerCount = header.fields.length;
    const consistency = rows.length === 0 ? 1 : rows.filter((row) => fieldCountMatches(row.fields, headerCount)).length / rows.length;
    const strayQuotes = records.reduce((count, record) => count + record.fields.filter((field) => field.includes('"')).length, 0);
    if (
      !best ||
      consistency > best.consistency ||
      (consistency === best.consistency && strayQuotes < best.strayQuotes) ||
      (consistency === best.consistency && strayQuotes === best.strayQuotes && headerCount > best.headerCount)
    ) {
      best = { delimiter, consistency, strayQuotes, headerCount };
    }
  }
  return best?.delimiter ?? ",";
}
