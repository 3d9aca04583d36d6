"use client";

import Link from "next/link";
import type { RejectedRow } from "@/lib/import/import-errors";

/** What the server returns for a completed import (the fields the page shows). */
export interface ImportResult {
  batchId: number;
  fileName: string;
  rowsRead: number;
  rowsNew: number;
  rowsChanged: number;
  rowsUnchanged: number;
  rowsRejected: number;
  rejects: RejectedRow[];
  firstTime: string | null;
  lastTime: string | null;
  mappingSource: string;
  mappingSaved: boolean;
  ignoredColumns: string[];
  timestampFormat: string;
  timeZone: string;
  delimiter: string;
  decimalMark: string;
  rejectsUrl: string;
}

const SHOWN_REJECTS = 20;

function formatTime(iso: string | null, timeZone: string): string {
  if (!iso) return "—";
  const local = new Intl.DateTimeFormat("en-CA", {
    timeZone, year: "numeric", month: "2-digit", day: "2-digit", hour: "2-digit", minute: "2-digit", hour12: false,
  }).format(new Date(iso));
  return `${local} (${timeZone}) · ${iso}`;
}

export function ImportResultSummary({ result, assetTag }: { result: ImportResult; assetTag: string }) {
  const count = (value: number) => value.toLocaleString("en-US");
  return (
    <section className="panel" aria-labelledby="import-result-heading">
      <h2 id="import-result-heading">Imported {result.fileName}</h2>
      <dl className="facts">
        <dt>Rows read</dt><dd>{count(result.rowsRead)}</dd>
        <dt>New</dt><dd>{count(result.rowsNew)}</dd>
        <dt>Changed</dt><dd>{count(result.rowsChanged)}</dd>
        <dt>Unchanged</dt><dd>{count(result.rowsUnchanged)}</dd>
        <dt>Rejected</dt><dd>{count(result.rowsRejected)}</dd>
        <dt>First reading</dt><dd>{formatTime(result.firstTime, result.timeZone)}</dd>
        <dt>Last reading</dt><dd>{formatTime(result.lastTime, result.timeZone)}</dd>
        <dt>Read with</dt>
        <dd>
          {result.mappingSource === "explicit" ? "this mapping" : result.mappingSource === "saved" ? "the saved mapping" : "canonical headers"}
          {result.mappingSaved ? " (saved for the next import)" : ""}; timestamps {result.timestampFormat}; decimal mark “{result.decimalMark}”
        </dd>
        {result.ignoredColumns.length > 0 && (<><dt>Ignored columns</dt><dd>{result.ignoredColumns.join(", ")}</dd></>)}
        <dt>Import batch</dt><dd>{result.batchId}</dd>
      </dl>
      {result.rowsRejected > 0 && (
        <>
          <h3>Rejected rows</h3>
          <p>
            <a href={result.rejectsUrl} download>Download the reject report (CSV)</a>{" "}
            <span className="subtle">— every rejected row with its line in the file and the reason.</span>
          </p>
          <table className="grid">
            <caption className="subtle" style={{ textAlign: "left" }}>
              First {Math.min(SHOWN_REJECTS, result.rejects.length)} of {count(result.rowsRejected)}
            </caption>
            <thead><tr><th scope="col" className="num">Line</th><th scope="col">Reason</th></tr></thead>
            <tbody>
              {result.rejects.slice(0, SHOWN_REJECTS).map((reject) => (
                <tr key={reject.line}><td className="num">{reject.line}</td><td>{reject.reason}</td></tr>
              ))}
            </tbody>
          </table>
        </>
      )}
      <p><Link href={`/assets/${encodeURIComponent(assetTag)}`}>Back to {assetTag}</Link></p>
    </section>
  );
}
