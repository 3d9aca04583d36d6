// Choosing the timestamp format of a file from its first timestamp cells.
import { parseTimestamp } from "./parse-timestamp";
import { TIMESTAMP_FORMATS, type ConcreteTimestampFormat } from "./timestamp-formats";

export type TimestampFormatDetection = { ok: true; format: ConcreteTimestampFormat } | { ok: false; message: string };

const CANDIDATES: readonly ConcreteTimestampFormat[] = [
  "iso",
  "YYYY-MM-DD HH:mm[:ss]",
  "DD.MM.YYYY HH:mm[:ss]",
  "DD/MM/YYYY HH:mm[:ss]",
  "MM/DD/YYYY HH:mm[:ss]",
  "epoch-seconds",
  "epoch-ms",
];

/** Epoch values with 12 or more integer digits are milliseconds (1e11 ms is 1973-03-03; 1e11 s is year 5138). */
function epochKindFits(format: ConcreteTimestampFormat, text: string): boolean {
  if (format !== "epoch-seconds" && format !== "epoch-ms") return true;
  const integerDigits = text.replace(/^[+-]/, "").split(/[.,]/)[0]?.length ?? 0;
  return format === "epoch-ms" ? integerDigits >= 12 : integerDigits < 12;
}

/**
 * Picks the format that reads the most of `cells` (blank cells ignored), in the order of CANDIDATES on a tie,
 * except that a tie between DD/MM/YYYY and MM/DD/YYYY is refused: "01/03/2026" can be either, so the user must say.
 * No format reading any cell is refused too. Rows the chosen format cannot read are rejected one by one later.
 */
export function detectTimestampFormat(cells: readonly string[], zone: string): TimestampFormatDetection {
  const texts = cells.map((cell) => cell.trim()).filter((text) => text !== "");
  if (texts.length === 0) return { ok: false, message: "the timestamp column is empty in the first rows" };
  const scores = new Map<ConcreteTimestampFormat, number>();
  for (const format of CANDIDATES) {
    let score = 0;
    for (const text of texts) {
      if (epochKindFits(format, text) && parseTimestamp(text, format, zone).kind !== "invalid") score += 1;
    }
    scores.set(format, score);
  }
  const best = Math.max(...scores.values());
  const examples = texts.slice(0, 3).map((text) => `"${text}"`).join(", ");
  if (best === 0) {
    return {
      ok: false,
      message: `timestamps such as ${examples} match none of the formats ${TIMESTAMP_FORMATS.filter((format) => format !== "auto").join(", ")}; give the timestamp format`,
    };
  }
  if (scores.get("DD/MM/YYYY HH:mm[:ss]") === best && scores.get("MM/DD/YYYY HH:mm[:ss]") === best) {
    return {
      ok: false,
      message: `timestamps such as ${examples} can be read as DD/MM/YYYY or as MM/DD/YYYY; give the timestamp format`,
    };
  }
  const format = CANDIDATES.find((candidate) => scores.get(candidate) === best);
  return format ? { ok: true, format } : { ok: false, message: "no timestamp format found" };
}
