import { DAY_MS } from "./constants";
import { describeCleaning, type DescribeOptions } from "./describe-cleaning";
import { escapeICalendarText } from "./escape-icalendar-text";
import { foldICalendarLine } from "./fold-icalendar-line";
import { formatUtcDate } from "./format-utc-date";
import type { CleaningPlan } from "./types";

/** The caution every exported cleaning carries unless the caller gives its own. */
export const ADVISORY_CAUTION =
  "Advisory: a model-based proposal from fouling forecasts and cost assumptions. Confirm with operations, inspection findings and permits before acting.";

/** Options of {@link planToICalendar}. */
export interface ICalendarOptions extends DescribeOptions {
  /** DTSTAMP of every event (when the file was made), epoch ms; a parameter so the export stays pure. */
  dtstampMs: number;
  /** Domain part of the UIDs, e.g. the site's host name. */
  uidDomain: string;
  /** PRODID; default "-//Foulcast//Cleaning planner//EN". */
  productId?: string;
  /** Caution appended to every description; default ADVISORY_CAUTION. */
  caution?: string;
}

function timestamp(instantMs: number): string {
  const iso = new Date(instantMs).toISOString(); // YYYY-MM-DDTHH:MM:SS.sssZ
  return `${iso.slice(0, 4)}${iso.slice(5, 7)}${iso.slice(8, 10)}T${iso.slice(11, 13)}${iso.slice(14, 16)}${iso.slice(17, 19)}Z`;
}

/** UID-safe form of an asset id: letters, digits, dot, underscore and hyphen kept, anything else percent-encoded. */
function uidPart(id: string): string {
  return Array.from(new TextEncoder().encode(id))
    .map((byte) => {
      const character = String.fromCharCode(byte);
      return /[A-Za-z0-9._-]/.test(character) ? character : `%${byte.toString(16).toUpperCase().padStart(2, "0")}`;
    })
    .join("");
}

/**
 * planToICalendar: the plan's cleanings as an iCalendar object (RFC 5545): one VCALENDAR with one all-day VEVENT per
 * cleaning: UID (asset id and start date at the given domain, stable across re-plans), DTSTAMP (parameter),
 * DTSTART;VALUE=DATE and DTEND;VALUE=DATE (exclusive: start + whole outage days), SUMMARY, and DESCRIPTION with the
 * explanation (describeCleaning) and the advisory caution; TEXT values escaped, lines folded at 75 octets, CRLF
 * line endings.
 *
 * Source: RFC 5545 (Desruisseaux 2009) §3.1 (content lines), §3.3.11 (TEXT), §3.6.1 (VEVENT), §3.8.2.2 (DTEND of
 * an all-day event is exclusive).
 */
export function planToICalendar(plan: CleaningPlan, options: ICalendarOptions): string {
  const outcomes = new Map(plan.assets.map((outcome) => [outcome.assetId, outcome]));
  const caution = options.caution ?? ADVISORY_CAUTION;
  const lines: string[] = [
    "BEGIN:VCALENDAR",
    "VERSION:2.0",
    `PRODID:${escapeICalendarText(options.productId ?? "-//Foulcast//Cleaning planner//EN")}`,
    "CALSCALE:GREGORIAN",
    "METHOD:PUBLISH",
  ];
  for (const cleaning of plan.cleanings) {
    const outcome = outcomes.get(cleaning.assetId);
    if (!outcome) continue;
    const endMs = cleaning.startMs + Math.max(1, Math.ceil(cleaning.outageDays)) * DAY_MS;
    const description = `${describeCleaning(plan, cleaning, outcome, options)}\n${caution}`;
    lines.push(
      "BEGIN:VEVENT",
      `UID:${uidPart(cleaning.assetId)}-${formatUtcDate(cleaning.startMs, "basic")}@${options.uidDomain}`,
      `DTSTAMP:${timestamp(options.dtstampMs)}`,
      `DTSTART;VALUE=DATE:${formatUtcDate(cleaning.startMs, "basic")}`,
      `DTEND;VALUE=DATE:${formatUtcDate(endMs, "basic")}`,
      `SUMMARY:${escapeICalendarText(`Clean ${cleaning.tag} (${cleaning.method})${cleaning.locked ? " [locked]" : ""}`)}`,
      `DESCRIPTION:${escapeICalendarText(description)}`,
      "TRANSP:TRANSPARENT",
      "END:VEVENT",
    );
  }
  lines.push("END:VCALENDAR");
  return lines.map(foldICalendarLine).join("\r\n") + "\r\n";
}
