import fc from "fast-check";
import highsLoader, { type Highs } from "highs";
import { beforeAll, describe, expect, it } from "vitest";
import {
  ADVISORY_CAUTION,
  csvCell,
  escapeICalendarText,
  foldICalendarLine,
  planCleanings,
  planToCsv,
  planToICalendar,
  PLAN_CSV_COLUMNS,
  type CleaningPlan,
} from "../../../lib/core/plan";
import { linearAsset, START_MS } from "./linear-asset";

let highs: Highs;
let plan: CleaningPlan;
const octets = (text: string): number => new TextEncoder().encode(text).length;
const unfold = (text: string): string => text.replace(/\r\n /g, "");

beforeAll(async () => {
  highs = await highsLoader();
  plan = planCleanings(
    highs,
    {
      horizon: { startMs: START_MS, weeks: 16 },
      site: { crewCapacity: 1 },
      assets: [
        linearAsset("101", { tag: "E-101,A; \"north\"", thresholdCrossing: { p10Ms: START_MS + 90 * 86_400_000, p50Ms: null } }),
        linearAsset("102", { tag: "=HYPERLINK(\"http://x\")" }),
      ],
    },
    { relativeGap: 0 },
  );
});

describe("escapeICalendarText", () => {
  it("escapes backslash, semicolon, comma and every kind of line break", () => {
    // RFC 5545 §3.3.11: ESCAPED-CHAR = "\\" / "\;" / "\," / "\N" / "\n"
    expect(escapeICalendarText("a\\b")).toBe("a\\\\b");
    expect(escapeICalendarText("a;b")).toBe("a\\;b");
    expect(escapeICalendarText("a,b")).toBe("a\\,b");
    expect(escapeICalendarText("a\nb\r\nc\rd")).toBe("a\\nb\\nc\\nd");
    expect(escapeICalendarText("plain: text")).toBe("plain: text");
  });
});

describe("foldICalendarLine", () => {
  it("folds at 75 octets with a leading space and unfolds to the original", () => {
    // RFC 5545 §3.1: lines SHOULD NOT be longer than 75 octets; a fold is CRLF followed by one space
    const line = `DESCRIPTION:${"x".repeat(200)}`;
    const folded = foldICalendarLine(line);
    const pieces = folded.split("\r\n");
    expect(pieces.every((piece) => octets(piece) <= 75)).toBe(true);
    expect(pieces.slice(1).every((piece) => piece.startsWith(" "))).toBe(true);
    expect(octets(pieces[0] ?? "")).toBe(75);
    expect(unfold(folded)).toBe(line);
    expect(foldICalendarLine("SHORT:line")).toBe("SHORT:line");
  });

  it("never splits a multi-octet UTF-8 character", () => {
    // RFC 5545 §3.1 (multi-octet characters must not be split) and RFC 3629 (UTF-8 lengths 1–4 octets)
    fc.assert(
      fc.property(fc.string({ unit: "grapheme", maxLength: 300 }), (text) => {
        const line = `SUMMARY:${text}`;
        const folded = foldICalendarLine(line);
        for (const piece of folded.split("\r\n")) {
          expect(octets(piece)).toBeLessThanOrEqual(75);
          expect(piece).not.toContain("\uFFFD");
        }
        expect(unfold(folded)).toBe(line);
      }),
      { seed: 13, numRuns: 200 },
    );
    const euro = foldICalendarLine(`X:${"€".repeat(60)}`).split("\r\n");
    // 3-octet characters: the first line holds "X:" and 24 euros (74 octets), the next a space and 24 (73 octets)
    expect(octets(euro[0] ?? "")).toBe(74);
  });
});

describe("planToICalendar", () => {
  it("writes one all-day VEVENT per cleaning with the RFC 5545 properties", () => {
    const text = planToICalendar(plan, { dtstampMs: Date.UTC(2025, 0, 2, 3, 4, 5), uidDomain: "plant.example" });
    // RFC 5545 §3.1: every content line ends with CRLF
    expect(text.endsWith("\r\n")).toBe(true);
    expect(text.replace(/\r\n/g, "")).not.toMatch(/[\r\n]/);
    const lines = unfold(text).split("\r\n").filter((line) => line !== "");
    expect(lines[0]).toBe("BEGIN:VCALENDAR");
    expect(lines).toContain("VERSION:2.0");
    expect(lines[lines.length - 1]).toBe("END:VCALENDAR");
    expect(lines.filter((line) => line === "BEGIN:VEVENT")).toHaveLength(plan.cleanings.length);
    // week 10 from Monday 2025-01-06 is 2025-03-17; a 1-day outage ends (exclusive, RFC 5545 §3.6.1) on 2025-03-18
    const first = plan.cleanings.find((cleaning) => cleaning.startWeek === 10);
    expect(first).toBeDefined();
    expect(lines).toContain("DTSTART;VALUE=DATE:20250317");
    expect(lines).toContain("DTEND;VALUE=DATE:20250318");
    expect(lines.filter((line) => line === "DTSTAMP:20250102T030405Z")).toHaveLength(plan.cleanings.length);
    expect(lines).toContain(`UID:${first?.assetId}-20250317@plant.example`);
    // TEXT escaping in SUMMARY (RFC 5545 §3.3.11)
    expect(lines).toContain('SUMMARY:Clean E-101\\,A\\; "north" (hydro-blast)');
    const description = lines.find((line) => line.startsWith("DESCRIPTION:") && line.includes("E-101"));
    expect(description).toContain("\\n");
    expect(description?.endsWith(escapeICalendarText(ADVISORY_CAUTION))).toBe(true);
    expect(description).toContain("before the P10 threshold crossing");
    expect(text.split("\r\n").every((line) => octets(line) <= 75)).toBe(true);
  });

  it("uses the caller's caution text", () => {
    const text = planToICalendar(plan, { dtstampMs: 0, uidDomain: "x", caution: "Check with the shift lead." });
    expect(unfold(text)).toContain("\\nCheck with the shift lead.\r\n");
  });
});

describe("csvCell", () => {
  it("neutralises text that a spreadsheet would run as a formula", () => {
    // OWASP CSV injection guidance (from memory): prefix ' to cells starting with = + - @ tab or CR
    expect(csvCell("=1+1")).toBe("'=1+1");
    expect(csvCell("+41 22")).toBe("'+41 22");
    expect(csvCell("-2")).toBe("'-2");
    expect(csvCell("@SUM(A1)")).toBe("'@SUM(A1)");
    expect(csvCell("\tx")).toBe("'\tx");
    expect(csvCell("\rx")).toBe('"\'\rx"');
    expect(csvCell("E-101")).toBe("E-101");
  });

  it("quotes fields with commas, quotes or line breaks and writes numbers plainly", () => {
    // RFC 4180 §2 rules 6 and 7
    expect(csvCell("a,b")).toBe('"a,b"');
    expect(csvCell('say "hi"')).toBe('"say ""hi"""');
    expect(csvCell("two\nlines")).toBe('"two\nlines"');
    expect(csvCell("=a,b")).toBe('"\'=a,b"');
    expect(csvCell(-12.5)).toBe("-12.5");
    expect(csvCell(null)).toBe("");
    expect(csvCell(Number.NaN)).toBe("");
  });
});

describe("planToCsv", () => {
  it("writes a header and one row per cleaning with CRLF line ends and neutralised text", () => {
    const text = planToCsv(plan);
    expect(text.endsWith("\r\n")).toBe(true);
    const rows = text.slice(0, -2).split("\r\n");
    expect(rows[0]).toBe(PLAN_CSV_COLUMNS.join(","));
    expect(rows).toHaveLength(plan.cleanings.length + 1);
    expect(text).toContain('"\'=HYPERLINK(""http://x"")"');
    expect(text).toContain('"E-101,A; ""north"""');
    expect(text).toContain("2025-03-17");
  });
});
