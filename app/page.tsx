import Link from "next/link";
import { AdvisoryCaution } from "./_components/advisory-caution";
import { requireSignedInUser } from "@/lib/auth/current-user";
import { can } from "@/lib/auth/permissions";
import { listAssets } from "@/lib/data/list-assets";
import { getPrisma } from "@/lib/db";
import { describeArrangement, formatDate, formatDutyMW, formatSignificant } from "@/lib/present/format";

export const dynamic = "force-dynamic";

export default async function FleetPage() {
  const user = await requireSignedInUser();
  const assets = await listAssets(getPrisma());
  if (assets.length === 0) {
    return (
      <>
        <h1>Fleet</h1>
        <p className="empty">No exchangers registered yet. Load the demo fleet with <code>npm run cli -- seed-demo</code>.</p>
      </>
    );
  }
  const site = assets[0];
  const latest = assets.map((asset) => asset.lastReading ?? "").sort().at(-1) || null;
  const units = [...new Set(assets.map((asset) => asset.unitCode))];
  return (
    <>
      <h1>Fleet — {site?.siteName}</h1>
      {can(user.role, "assets.edit") ? <p className="actions"><Link href="/assets/new">Register an exchanger</Link></p> : null}
      <p className="subtle">{assets.length} exchangers in {units.length} process units. Latest reading {formatDate(latest, site?.siteTimeZone ?? "UTC")} (site time, {site?.siteTimeZone}).</p>
      <table className="grid" aria-label="Exchangers">
        <thead>
          <tr>
            <th scope="col">Tag</th>
            <th scope="col">Name</th>
            <th scope="col">Service</th>
            <th scope="col">Arrangement</th>
            <th scope="col" className="num">Area (m²)</th>
            <th scope="col" className="num">Design duty</th>
            <th scope="col" className="num">Design U (W/m²K)</th>
            <th scope="col" className="num">Readings</th>
            <th scope="col">Last cleaning</th>
            <th scope="col" className="num">Open alerts</th>
          </tr>
        </thead>
        <tbody>
          {units.map((unitCode) => {
            const inUnit = assets.filter((asset) => asset.unitCode === unitCode);
            return [
              <tr key={`unit-${unitCode}`} className="unit-row">
                <td colSpan={10}>{unitCode} — {inUnit[0]?.unitName}</td>
              </tr>,
              ...inUnit.map((asset) => (
                <tr key={asset.tag}>
                  <td><Link href={`/assets/${encodeURIComponent(asset.tag)}`}>{asset.tag}</Link></td>
                  <td>{asset.name}</td>
                  <td>{asset.service}</td>
                  <td>{describeArrangement(asset.arrangementKind, asset.shells, asset.tubePasses)}</td>
                  <td className="num">{formatSignificant(asset.areaM2, 3)}</td>
                  <td className="num">{formatDutyMW(asset.designDutyW)}</td>
                  <td className="num">{formatSignificant(asset.designUWPerM2K, 3)}</td>
                  <td className="num">{asset.readingCount.toLocaleString("en-US")}</td>
                  <td>{formatDate(asset.lastCleaning, asset.siteTimeZone)}</td>
                  <td className="num">{asset.openAlerts ? <Link href={`/assets/${encodeURIComponent(asset.tag)}#alerts`} className="alert-count">{asset.openAlerts}</Link> : "—"}</td>
                </tr>
              )),
            ];
          })}
        </tbody>
      </table>
      <AdvisoryCaution />
    </>
  );
}
