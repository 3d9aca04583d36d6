// A stored plan run as a file: iCalendar (RFC 5545), CSV (RFC 4180) or XLSX.
import writeXlsxFile, { type SheetData } from "write-excel-file/node";
import type { PlanRun } from "../../generated/prisma/client";
import { planToCsv, planToICalendar, type CleaningPlan } from "../core/plan";
import { ADVISORY_NOTICE } from "../data/assessment-document";
import { spreadsheetText } from "../core/export/spreadsheet-text";
import { planDocument, type PlanDocument } from "./plan-document";

export type PlanExportFormat = "ics" | "csv" | "xlsx";
export const PLAN_EXPORT_FORMATS: readonly PlanExportFormat[] = ["ics", "csv", "xlsx"];

export interface PlanExportFile {
  fileName: string;
  contentType: string;
  body: Buffer;
}

const CONTENT_TYPES: Record<PlanExportFormat, string> = {
  ics: "text/calendar; charset=utf-8",
  csv: "text/csv; charset=utf-8",
  xlsx: "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet",
};

/** Sheet rows of the plan: one header row, one row per cleaning; user-entered text neutralised (spreadsheetText). */
function planSheet(document: PlanDocument): SheetData {
  const header = ["Tag", "Start", "Return to service", "Week", "Outage days", "Method", "State", "Window", "Saving vs no cleaning", "Currency", "P10 crossing", "P10 margin days", "Moved by", "Explanation"];
  const movedBy = new Map(document.assets.map((asset) => [asset.tag, asset.movedBy.join("; ")]));
  const rows: SheetData = [header.map((value) => ({ value, fontWeight: "bold" as const }))];
  for (const cleaning of document.cleanings) {
    const p10 = cleaning.thresholds.find((margin) => margin.quantile === "p10");
    rows.push([
      spreadsheetText(cleaning.tag),
      cleaning.start,
      cleaning.returnToService,
      cleaning.week,
      cleaning.outageDays,
      spreadsheetText(cleaning.method),
      cleaning.state,
      spreadsheetText(cleaning.window),
      Math.round(cleaning.savingVsNoCleaning * 100) / 100,
      document.totals.currency,
      p10?.crossing ?? null,
      p10 ? Math.round(p10.marginDays * 10) / 10 : null,
      spreadsheetText(movedBy.get(cleaning.tag) ?? ""),
      spreadsheetText(cleaning.explanation.join(" ")),
    ]);
  }
  rows.push([]);
  rows.push([spreadsheetText(`Plan ${document.id} of ${document.site.code}, horizon ${document.horizon.start} to ${document.horizon.end}, status ${document.status}, gap ${document.solver.gap === null ? "n/a" : `${(document.solver.gap * 100).toFixed(3)} %`}.`)]);
  rows.push([ADVISORY_NOTICE]);
  return rows;
}

/**
 * exportPlan: the run's cleanings as a file. iCalendar: one all-day event per cleaning with its explanation and the
 * advisory caution (planToICalendar); CSV: planToCsv (formula-safe cells); XLSX: one sheet with the same columns as
 * the page, user-entered text neutralised against formula injection.
 */
export async function exportPlan(run: PlanRun, format: PlanExportFormat, nowMs: number): Promise<PlanExportFile> {
  const plan = run.result as unknown as CleaningPlan;
  const document = planDocument(run);
  const siteSlug = document.site.code.toLowerCase().replace(/[^a-z0-9-]/g, "-");
  const base = `cleaning-plan-${siteSlug}-${run.id}`;
  let body: Buffer;
  if (format === "ics") {
    body = Buffer.from(planToICalendar(plan, { dtstampMs: nowMs, uidDomain: `${siteSlug}.foulcast.invalid`, currency: document.totals.currency, caution: ADVISORY_NOTICE }), "utf8");
  } else if (format === "csv") {
    body = Buffer.from(planToCsv(plan), "utf8");
  } else {
    body = await writeXlsxFile(planSheet(document), { sheet: "Cleaning plan", stickyRowsCount: 1 }).toBuffer();
  }
  return { fileName: `${base}.${format}`, contentType: CONTENT_TYPES[format], body };
}
