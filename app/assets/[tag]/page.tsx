import Link from "next/link";
import { notFound } from "next/navigation";
import { AdvisoryCaution } from "@/app/_components/advisory-caution";
import { DailyTemperatureChart } from "@/app/_components/daily-temperature-chart";
import { dailyReadings } from "@/lib/data/daily-readings";
import { getAsset } from "@/lib/data/get-asset";
import { listAssetRevisions } from "@/lib/data/list-asset-revisions";
import { getPrisma } from "@/lib/db";
import { describeArrangement, formatDate, formatDutyMW, formatSignificant, formatTemperatureC } from "@/lib/present/format";

export const dynamic = "force-dynamic";

const ROLE_LABELS: Record<string, string> = {
  hotIn: "Hot inlet temperature",
  hotOut: "Hot outlet temperature",
  coldIn: "Cold inlet temperature",
  coldOut: "Cold outlet temperature",
  hotFlow: "Hot mass flow",
  coldFlow: "Cold mass flow",
  hotPressureDrop: "Hot side pressure drop",
  coldPressureDrop: "Cold side pressure drop",
};

function describeHeatCapacity(kind: string, intercept: number, slope: number): string {
  return kind === "linear"
    ? `cp = ${formatSignificant(intercept, 4)} + ${formatSignificant(slope, 3)}·T[K] J/(kg·K)`
    : `cp = ${formatSignificant(intercept, 4)} J/(kg·K)`;
}

const ROLE_ORDER = Object.keys(ROLE_LABELS);

function describeChange(field: string, change: { before: unknown; after: unknown }): string {
  const show = (value: unknown) => (typeof value === "number" ? formatSignificant(value, 6) : value === null ? "—" : typeof value === "object" ? "(list)" : String(value));
  return field === "instruments" ? "instruments changed" : `${field}: ${show(change.before)} → ${show(change.after)}`;
}

export default async function AssetPage({ params, searchParams }: { params: Promise<{ tag: string }>; searchParams: Promise<{ saved?: string }> }) {
  const { tag } = await params;
  const { saved } = await searchParams;
  const prisma = getPrisma();
  const asset = await getAsset(prisma, decodeURIComponent(tag));
  if (!asset) notFound();
  const [daily, revisions] = await Promise.all([dailyReadings(prisma, asset.id), listAssetRevisions(prisma, asset.tag)]);
  const instruments = [...asset.instruments].sort((a, b) => ROLE_ORDER.indexOf(a.role) - ROLE_ORDER.indexOf(b.role));
  const timeZone = asset.unit.site.timeZone;
  return (
    <>
      <p className="subtle"><Link href="/">Fleet</Link> / {asset.unit.name}</p>
      <h1>{asset.tag} — {asset.name}</h1>
      {saved ? <p className="notice" role="status">Changes saved.</p> : null}
      <p className="actions">
        <Link href={`/assets/${encodeURIComponent(asset.tag)}/edit`}>Edit register entry</Link>
        <Link href={`/assets/${encodeURIComponent(asset.tag)}/import`}>Import operating data</Link>
      </p>
      <div className="columns">
        <section className="panel" aria-labelledby="design-heading">
          <h2 id="design-heading">Design</h2>
          <dl className="facts">
            <dt>Service</dt><dd>{asset.service}</dd>
            <dt>Arrangement</dt><dd>{describeArrangement(asset.arrangementKind, asset.shells, asset.tubePasses)}{asset.mixedStream ? ` (${asset.mixedStream} stream mixed)` : ""}</dd>
            <dt>Area</dt><dd>{formatSignificant(asset.areaM2, 3)} m²</dd>
            <dt>Design duty</dt><dd>{formatDutyMW(asset.designDutyW)}</dd>
            <dt>Design U</dt><dd>{formatSignificant(asset.designUWPerM2K, 3)} W/(m²·K)</dd>
            <dt>Design fouling</dt><dd>{formatSignificant(asset.designFoulingM2KPerW, 2)} m²·K/W</dd>
            <dt>Duty threshold</dt><dd>{formatDutyMW(asset.dutyThresholdW)}</dd>
          </dl>
        </section>
        <section className="panel" aria-labelledby="streams-heading">
          <h2 id="streams-heading">Streams and reference conditions</h2>
          <dl className="facts">
            <dt>Hot stream</dt><dd>{asset.hotStreamName}; {describeHeatCapacity(asset.hotCpKind, asset.hotCpIntercept, asset.hotCpSlope)}</dd>
            <dt>Cold stream</dt><dd>{asset.coldStreamName}; {describeHeatCapacity(asset.coldCpKind, asset.coldCpIntercept, asset.coldCpSlope)}</dd>
            <dt>Hot inlet</dt><dd>{formatTemperatureC(asset.refHotInletK)}, {formatSignificant(asset.refHotFlowKgPerS, 3)} kg/s</dd>
            <dt>Cold inlet</dt><dd>{formatTemperatureC(asset.refColdInletK)}, {formatSignificant(asset.refColdFlowKgPerS, 3)} kg/s</dd>
          </dl>
        </section>
        <section className="panel" aria-labelledby="instruments-heading">
          <h2 id="instruments-heading">Instruments</h2>
          <table className="grid">
            <thead><tr><th scope="col">Measurement</th><th scope="col">Tag</th><th scope="col" className="num">Standard uncertainty</th></tr></thead>
            <tbody>
              {instruments.map((instrument) => (
                <tr key={instrument.id}>
                  <td>{ROLE_LABELS[instrument.role] ?? instrument.role}</td>
                  <td>{instrument.tag}</td>
                  <td className="num">{formatSignificant(instrument.standardUncertainty, 2)} {instrument.role.endsWith("Flow") ? "kg/s" : instrument.role.endsWith("PressureDrop") ? "Pa" : "K"}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
      </div>
      <h2>Daily mean temperatures (raw readings, unscreened)</h2>
      <div className="panel">
        {daily.length === 0 ? <p className="empty">No operating data imported yet.</p> : <DailyTemperatureChart data={daily} />}
      </div>
      <h2>Cleanings</h2>
      {asset.cleanings.length === 0 ? (
        <p className="subtle">No cleanings recorded.</p>
      ) : (
        <table className="grid">
          <thead><tr><th scope="col">Date</th><th scope="col">Method</th><th scope="col">Notes</th></tr></thead>
          <tbody>
            {asset.cleanings.map((cleaning) => (
              <tr key={cleaning.id}><td>{formatDate(cleaning.date.toISOString(), timeZone)}</td><td>{cleaning.method}</td><td>{cleaning.notes}</td></tr>
            ))}
          </tbody>
        </table>
      )}
      <h2>Register history</h2>
      {revisions === null || revisions.length === 0 ? (
        <p className="subtle">No recorded changes{asset.demoTruth ? " (loaded as demo data)" : ""}.</p>
      ) : (
        <table className="grid">
          <thead><tr><th scope="col">When</th><th scope="col">Who</th><th scope="col">What</th></tr></thead>
          <tbody>
            {revisions.map((revision) => (
              <tr key={revision.changedAt + revision.action}>
                <td>{revision.changedAt.replace("T", " ").slice(0, 16)} UTC</td>
                <td>{revision.changedBy}</td>
                <td>{revision.action === "created" ? "Created" : Object.entries(revision.changes).map(([field, change]) => describeChange(field, change)).join("; ")}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      <AdvisoryCaution />
    </>
  );
}
