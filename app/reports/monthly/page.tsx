import Link from "next/link";
import { MonthlyReportView } from "../../_components/monthly-report-view";
import { requireSignedInUser } from "@/lib/auth/current-user";
import { getPrisma } from "@/lib/db";
import { loadMonthlyReport, ReportError, resolveReportRequest } from "@/lib/data/monthly-report-data";
import { nextMonth, previousMonth } from "@/lib/report/report-month";
import "../report.css";

export const dynamic = "force-dynamic";

type SearchParams = Promise<Record<string, string | string[] | undefined>>;
const one = (value: string | string[] | undefined): string | undefined => (Array.isArray(value) ? value[0] : value);

export default async function MonthlyReportPage({ searchParams }: { searchParams: SearchParams }) {
  const user = await requireSignedInUser();
  const params = await searchParams;
  const prisma = getPrisma();
  let resolved;
  try {
    resolved = await resolveReportRequest(prisma, { site: one(params.site) ?? null, month: one(params.month) ?? null });
  } catch (error) {
    if (error instanceof ReportError) {
      return (
        <>
          <h1>Monthly condition summary</h1>
          <p className="empty">{error.message}. <Link href="/reports">All reports</Link></p>
        </>
      );
    }
    throw error;
  }
  const { site, month, months } = resolved;
  const report = await loadMonthlyReport(prisma, { site, month });
  const keys = new Set(months.map((entry) => entry.month.key));
  const earlier = previousMonth(month).key;
  const later = nextMonth(month).key;
  const link = (key: string) => `/reports/monthly?site=${encodeURIComponent(site.code)}&month=${key}`;
  return (
    <MonthlyReportView
      report={report}
      unitSystem={user.unitSystem}
      navigation={
        <nav className="report-actions screen-only" aria-label="Other months" style={{ marginTop: "0.4rem" }}>
          {keys.has(earlier) ? <Link href={link(earlier)}>← {previousMonth(month).label}</Link> : null}
          {keys.has(later) ? <Link href={link(later)}>{nextMonth(month).label} →</Link> : null}
        </nav>
      }
    />
  );
}
