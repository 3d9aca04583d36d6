// Prints the real report markup (MonthlyReportView with the app's style sheets) to PDF in Chromium and reads it back.
import fs from "node:fs";
import { getDocument } from "pdfjs-dist/legacy/build/pdf.mjs";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { beforeAll, describe, expect, it } from "vitest";
import { MonthlyReportView } from "../../app/_components/monthly-report-view";
import type { AssessmentSummary } from "../../lib/planning/assessment-summary";
import { FLEET_STATUSES } from "../../lib/planning/fleet-status";
import { monthlyReport, type MonthlyReport, type MonthlyReportInput } from "../../lib/report/monthly-report";
import { ChromiumUnavailableError, chromiumPath, parseCookieHeader, PdfRenderError, renderPdf, type Paper } from "../../lib/report/render-pdf";
import { reportMonth } from "../../lib/report/report-month";

const CHROMIUM = chromiumPath();
const HAVE_CHROMIUM = fs.existsSync(CHROMIUM);
if (!HAVE_CHROMIUM) console.warn(`render-pdf tests skipped: no Chromium at ${CHROMIUM} (apt-get install chromium, or set CHROMIUM_PATH)`);

function summary(costPerDay: number, dutyLossW: number, percentOfClean: number): AssessmentSummary {
  return {
    asOf: "2026-11-30T23:00:00.000Z",
    currentUWPerM2K: 300,
    percentOfClean,
    foulingM2KPerW: 4e-4,
    cleanDutyW: 5e6,
    dutyLossW,
    threshold: { status: "ahead", p10: null, p50: null, p90: null, crossedAt: null },
    trendModel: "linear",
    economics: { currency: "EUR", costPerDay, cycleCostToDate: 0, optimalIntervalDays: null },
    economicsNote: null,
    sparkline: [],
  };
}

/** 24 exchangers in three units (as the demo site), costs 100 EUR to 2,400 EUR per day; two cleanings, twelve planned. */
function fixture(): MonthlyReport {
  const assets: MonthlyReportInput["assets"] = Array.from({ length: 24 }, (_, index) => {
    const unit = index < 10 ? "CDU-1" : index < 16 ? "HTU-2" : "RDC-3";
    return {
      tag: `E-${String(index + 1).padStart(4, "0")}`,
      name: `Test exchanger number ${index + 1} with a fairly long service description`,
      unitCode: unit,
      unitName: `Unit ${unit}`,
      atMonthEnd: { status: FLEET_STATUSES[index % 4] ?? "good", summary: summary(100 * (index + 1), 2e4 * (index + 1), 90 - index) },
      atPreviousMonthEnd: { status: FLEET_STATUSES[(index + 1) % 4] ?? "good", summary: summary(90 * (index + 1), 1.8e4 * (index + 1), 91 - index) },
    };
  });
  return monthlyReport({
    site: { code: "TST", name: "Testing Harbour Works", timeZone: "Europe/Amsterdam", currency: "EUR" },
    month: reportMonth("2026-11", "Europe/Amsterdam"),
    generatedAtMs: Date.parse("2026-12-01T08:00:00Z"),
    dataEndMs: Date.parse("2026-12-01T00:00:00Z"),
    assets,
    cleanings: [
      { tag: "E-0003", dateMs: Date.parse("2026-10-31T23:30:00Z"), endDateMs: Date.parse("2026-11-04T06:00:00Z"), method: "hydroblast", costCents: 2_345_600, effectiveness: 0.87 },
      { tag: "E-0017", dateMs: Date.parse("2026-11-16T06:00:00Z"), endDateMs: null, method: "chemical wash", costCents: null, effectiveness: null },
    ],
    alerts: [{ id: 1, tag: "E-0005", instrumentTag: "TI-0005A", role: "hotIn", kind: "drift", startMs: Date.parse("2026-11-10T05:00:00Z"), endMs: null, acknowledgedAtMs: null, acknowledgedBy: null }],
    plan: {
      id: 9,
      createdAt: "2026-12-01T07:00:00.000Z",
      horizonStart: "2026-12-07",
      cleanings: Array.from({ length: 12 }, (_, index) => ({
        tag: `E-${String(24 - index).padStart(4, "0")}`,
        start: `2027-0${1 + (index % 2)}-${String(4 + index).padStart(2, "0")}`,
        state: index === 0 ? ("booked" as const) : ("proposed" as const),
        window: "routine",
        method: "routine cleaning",
        outageDays: 4,
        cost: 40_000 + 1_000 * index,
        saving: 90_000,
      })),
    },
  });
}

/** A complete HTML document: the report markup and the app's two style sheets, as the browser gets them. */
function reportHtml(report: MonthlyReport): string {
  const css = ["app/globals.css", "app/reports/report.css"].map((file) => fs.readFileSync(file, "utf8")).join("\n");
  const body = renderToStaticMarkup(createElement(MonthlyReportView, { report }));
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>report</title><style>${css}</style></head><body><header class="topbar">NAVIGATION CHROME</header><main>${body}</main></body></html>`;
}

/** Page objects of a PDF: "/Type /Page" but not "/Type /Pages" (the page tree). */
function countPageObjects(pdf: Buffer): number {
  return (pdf.toString("latin1").match(/\/Type\s*\/Page(?![A-Za-z])/g) ?? []).length;
}

async function readPdf(pdf: Buffer): Promise<{ pages: number; text: string[]; sizes: number[][] }> {
  const document = await getDocument({ data: new Uint8Array(pdf), useSystemFonts: false, isEvalSupported: false }).promise;
  const text: string[] = [];
  const sizes: number[][] = [];
  for (let number = 1; number <= document.numPages; number += 1) {
    const page = await document.getPage(number);
    sizes.push(page.view.map((value) => Math.round(value)));
    const content = await page.getTextContent();
    text.push(content.items.map((item) => ("str" in item ? item.str : "")).join(" ").replace(/\s+/g, " "));
  }
  const pages = document.numPages;
  await document.destroy();
  return { pages, text, sizes };
}

describe("MonthlyReportView units", () => {
  // Duty lost at the month end: Σ 2e4·i W for i = 1..24 = 6.00 MW; the last month 5.40 MW, a change of 0.60 MW.
  // 1 Btu_IT/h = 0.293 071 1 W (NIST SP 811, Appendix B.8), so 6.00 MW = 20.5 MMBtu/h and 0.60 MW = 2.05 MMBtu/h.
  it("shows duty in MW for SI readers and in MMBtu/h for US customary readers", () => {
    const si = renderToStaticMarkup(createElement(MonthlyReportView, { report: fixture() }));
    expect(si).toContain(">6.00 MW<");
    expect(si).toContain("+0.600 MW");
    expect(si).not.toContain("MMBtu/h");
    const us = renderToStaticMarkup(createElement(MonthlyReportView, { report: fixture(), unitSystem: "us" }));
    expect(us).toContain(">20.5 MMBtu/h<");
    expect(us).toContain("+2.05 MMBtu/h");
    expect(us).not.toMatch(/\d MW/);
  });
});

describe("parseCookieHeader", () => {
  it("splits a Cookie header into pairs and keeps values with '=' whole", () => {
    expect(parseCookieHeader("better-auth.session_token=abc.def=; theme=dark;; =bad; spaced = 1 ")).toEqual([
      { name: "better-auth.session_token", value: "abc.def=" },
      { name: "theme", value: "dark" },
      { name: "spaced", value: "1" },
    ]);
    expect(parseCookieHeader(null)).toEqual([]);
  });
});

describe("renderPdf", () => {
  it("refuses with a clear message when Chromium is not where it is expected", async () => {
    const missing = "/nonexistent/chromium-for-test";
    await expect(renderPdf({ source: { html: "<p>x</p>" }, paper: "a4", executablePath: missing })).rejects.toThrow(ChromiumUnavailableError);
    await expect(renderPdf({ source: { html: "<p>x</p>" }, paper: "a4", executablePath: missing })).rejects.toThrow(
      "Chromium is not installed at /nonexistent/chromium-for-test: install it (Debian: apt-get install chromium) or set CHROMIUM_PATH",
    );
  });
});

describe.skipIf(!HAVE_CHROMIUM)("renderPdf of the monthly report (Chromium)", () => {
  const report = fixture();
  const rendered = new Map<Paper, { pdf: Buffer; elapsedMs: number; read: Awaited<ReturnType<typeof readPdf>> }>();

  beforeAll(async () => {
    const html = reportHtml(report);
    for (const paper of ["a4", "letter"] as const) {
      const { pdf, elapsedMs } = await renderPdf({ source: { html }, paper, readySelector: "[data-report-month='2026-11']", footerText: "Testing Harbour Works · November 2026" });
      rendered.set(paper, { pdf, elapsedMs, read: await readPdf(pdf) });
      console.info(`monthly report PDF (${paper}): ${countPageObjects(pdf)} pages, ${pdf.length} bytes, ${Math.round(elapsedMs)} ms`);
    }
  }, 120_000);

  it("prints A4 and Letter pages of the right size, a few pages long, with the page count in every footer", () => {
    // ISO 216 A4 = 210 × 297 mm = 595 × 842 pt; ANSI Letter = 8.5 × 11 in = 612 × 792 pt (1 pt = 1/72 in)
    const expected = { a4: [0, 0, 596, 843], letter: [0, 0, 612, 792] };
    for (const paper of ["a4", "letter"] as const) {
      const { pdf, read } = rendered.get(paper) ?? expect.unreachable();
      const pages = countPageObjects(pdf);
      expect(pages, paper).toBe(read.pages);
      // 24 exchangers, ten in the top table, twelve planned cleanings: more than one page, fewer than eight
      expect(pages, paper).toBeGreaterThanOrEqual(2);
      expect(pages, paper).toBeLessThanOrEqual(7);
      for (const size of read.sizes) expect(size).toEqual(expected[paper]);
      read.text.forEach((text, index) => expect(text).toContain(`page ${index + 1} of ${pages}`));
    }
  });

  it("carries the key figures, the tables' rows and the advisory caution, without the navigation chrome", () => {
    const { read } = rendered.get("a4") ?? expect.unreachable();
    const text = read.text.join(" ");
    expect(text).toContain("Monthly condition summary — Testing Harbour Works");
    expect(text).toContain("November 2026");
    // total cost per day: 100 × (1 + 2 + … + 24) = 30,000 EUR; the month before 90 × 300 = 27,000 EUR
    expect(report.totals.costPerDay).toBe(30_000);
    expect(text).toContain("30,000 EUR");
    expect(text).toContain("+3,000 EUR");
    // the costliest exchanger (E-0024, 2,400 EUR per day) and the cleaning of 00:30 on 1 November local time
    expect(text).toContain("E-0024");
    expect(text).toContain("2,400 EUR");
    expect(text).toContain("2026-11-01");
    expect(text).toContain("23,456 EUR");
    expect(text).toContain("TI-0005A");
    expect(text).toContain("Advisory only.");
    expect(text).not.toContain("NAVIGATION CHROME");
    expect(text).not.toContain("PDF (A4)");
  });

  it("refuses to print a page whose expected content is still hidden (a streaming template)", async () => {
    const html = `<!doctype html><html><head><title>Loading page</title></head><body><p>Loading…</p><div hidden><article data-report-month="2026-11">late</article></div></body></html>`;
    const attempt = renderPdf({ source: { html }, paper: "a4", readySelector: "[data-report-month='2026-11']", readyTimeoutMs: 1_000 });
    await expect(attempt).rejects.toBeInstanceOf(PdfRenderError);
    await expect(renderPdf({ source: { html }, paper: "a4", readySelector: "[data-report-month='2026-11']", readyTimeoutMs: 1_000 })).rejects.toThrow(
      `the page "Loading page" (about:blank) shows no [data-report-month='2026-11']`,
    );
  }, 60_000);

  it("takes a few seconds, not minutes", () => {
    // one browser launch, load and print each; generous on a busy 2-core machine
    for (const paper of ["a4", "letter"] as const) expect(rendered.get(paper)?.elapsedMs ?? Infinity).toBeLessThan(30_000);
  });
});
