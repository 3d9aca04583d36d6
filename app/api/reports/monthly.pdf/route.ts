import { withRole } from "@/lib/auth/with-role";
import { ensureMonthEndSnapshots } from "@/lib/data/ensure-month-end-snapshots";
import { ReportError, resolveReportRequest } from "@/lib/data/monthly-report-data";
import { getPrisma } from "@/lib/db";
import { attachmentDisposition } from "@/lib/present/attachment-disposition";
import { ChromiumUnavailableError, PAPERS, parseCookieHeader, PdfRenderError, renderPdf, requireChromium, type Paper } from "@/lib/report/render-pdf";
import { previousMonth } from "@/lib/report/report-month";

export const dynamic = "force-dynamic";

/** Where the headless browser reaches this server: FOULCAST_REPORT_ORIGIN, else this machine on $PORT (3000). */
function reportOrigin(): string {
  return process.env.FOULCAST_REPORT_ORIGIN?.trim().replace(/\/+$/, "") || `http://localhost:${process.env.PORT?.trim() || "3000"}`;
}

function problem(status: number, code: string, error: string): Response {
  return Response.json({ error, code }, { status, headers: { "cache-control": "no-store" } });
}

/**
 * GET /api/reports/monthly.pdf?site=BWH&month=2026-11&paper=a4|letter: the monthly condition summary as a PDF,
 * printed by headless Chromium from the report page with the caller's session cookie. site: default the only site;
 * month: default the last whole month with data; paper: default a4. 400 bad month or paper, 404 unknown site or a
 * month without data, 503 Chromium missing, 502 the page could not be printed.
 */
export const GET = withRole("read", async (request: Request) => {
  const params = new URL(request.url).searchParams;
  const paper = (params.get("paper") ?? "a4").toLowerCase();
  if (!PAPERS.includes(paper as Paper)) return problem(400, "bad-request", `paper must be one of ${PAPERS.join(", ")}, got "${paper}"`);
  const prisma = getPrisma();
  let resolved;
  try {
    resolved = await resolveReportRequest(prisma, { site: params.get("site"), month: params.get("month") });
  } catch (error) {
    if (error instanceof ReportError) return problem(error.status, error.status === 400 ? "bad-request" : "not-found", error.message);
    throw error;
  }
  const { site, month } = resolved;
  const url = `${reportOrigin()}/reports/monthly?site=${encodeURIComponent(site.code)}&month=${month.key}`;
  try {
    await requireChromium();
    // The month-end assessments can take seconds the first time: do them here, outside the browser's page timeout.
    await ensureMonthEndSnapshots(prisma, { siteCode: site.code, monthEnds: [month.endMs, previousMonth(month).endMs] });
    const rendered = await renderPdf({
      source: { url, cookies: parseCookieHeader(request.headers.get("cookie")) },
      paper: paper as Paper,
      readySelector: `[data-report-month="${month.key}"]`,
      footerText: `${site.name} · monthly condition summary · ${month.label}`,
    });
    return new Response(new Uint8Array(rendered.pdf), {
      headers: {
        "content-type": "application/pdf",
        "content-disposition": attachmentDisposition(`foulcast-${site.code}-${month.key}-${paper}.pdf`),
        "cache-control": "private, no-store",
        "server-timing": `pdf;dur=${Math.round(rendered.elapsedMs)}`,
      },
    });
  } catch (error) {
    if (error instanceof ChromiumUnavailableError) return problem(503, "chromium-unavailable", `The PDF cannot be made on this server: ${error.message}. Print the report page from the browser instead.`);
    if (error instanceof PdfRenderError) return problem(502, "pdf-failed", `The report could not be printed: ${error.message}`);
    throw error;
  }
});
