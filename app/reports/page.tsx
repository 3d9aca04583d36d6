import Link from "next/link";
import { requireSignedInUser } from "@/lib/auth/current-user";
import { getPrisma } from "@/lib/db";
import { listReportMonths } from "@/lib/data/monthly-report-data";

export const dynamic = "force-dynamic";

export default async function ReportsPage() {
  await requireSignedInUser();
  const sites = await listReportMonths(getPrisma());
  return (
    <>
      <h1>Monthly condition summaries</h1>
      <p className="subtle">
        One report per site and month: condition categories and how they changed since the month before, cost of fouling and duty lost, the
        costliest exchangers, cleanings done and planned, instrument issues. Open it to read or print; the PDF links give a file for A4 or Letter
        paper. The first opening of a month re-assesses every exchanger at both month ends (about half a second per exchanger); later openings are
        immediate.
      </p>
      {sites.length === 0 ? <p className="empty">No site in the database yet.</p> : null}
      {sites.map(({ site, months }) => {
        const query = (key: string) => `site=${encodeURIComponent(site.code)}&month=${key}`;
        return (
          <section key={site.code} aria-labelledby={`site-${site.code}`}>
            <h2 id={`site-${site.code}`}>{site.name} ({site.code})</h2>
            {months.length === 0 ? (
              <p className="empty">No operating data yet.</p>
            ) : (
              <table className="grid" style={{ maxWidth: "46rem" }}>
                <thead><tr><th scope="col">Month</th><th scope="col">Data</th><th scope="col">Report</th><th scope="col">PDF</th></tr></thead>
                <tbody>
                  {months.map(({ month, complete }) => (
                    <tr key={month.key}>
                      <td>{month.label}</td>
                      <td>{complete ? "whole month" : "part of the month"}</td>
                      <td><Link href={`/reports/monthly?${query(month.key)}`}>View</Link></td>
                      <td><a href={`/api/reports/monthly.pdf?${query(month.key)}&paper=a4`}>A4</a> · <a href={`/api/reports/monthly.pdf?${query(month.key)}&paper=letter`}>Letter</a></td>
                    </tr>
                  ))}
                </tbody>
              </table>
            )}
          </section>
        );
      })}
    </>
  );
}
