"use client";

import { useEffect, useMemo, useRef, useState } from "react";
import { mappingFromCanonicalHeaders } from "@/lib/import/canonical-header";
import { detectDecimalMark } from "@/lib/import/detect-decimal-mark";
import { detectDelimiter, DELIMITER_NAMES, type Delimiter } from "@/lib/import/detect-delimiter";
import { detectTimestampFormat } from "@/lib/import/detect-timestamp-format";
import type { RejectedRow } from "@/lib/import/import-errors";
import { splitCsvSample, type SampleRecord } from "@/lib/import/split-csv-sample";
import { columnMappingSchema, describeMappingIssues, type ColumnMapping } from "@/lib/validation/column-mapping";
import { emptyMappingState, ImportMappingFields, mappingToState, stateToMapping, type MappingFormState } from "./import-mapping-fields";
import { ImportPreviewTable } from "./import-preview-table";
import { ImportResultSummary, type ImportResult } from "./import-result-summary";

/** Bytes read in the browser for the preview (File.slice): the import itself streams the whole file. */
const PREVIEW_BYTES = 64 * 1024;
const PREVIEW_ROWS = 20;

interface Preview {
  fileName: string;
  header: string[];
  rows: SampleRecord[];
  delimiter: Delimiter;
  decimalMark: "." | ",";
  /** Where the form's values came from. */
  prefill: "saved" | "canonical" | "none";
}

type Phase =
  | { kind: "idle" }
  | { kind: "uploading"; fraction: number }
  | { kind: "processing" }
  | { kind: "done"; result: ImportResult }
  | { kind: "failed"; message: string; rejects: RejectedRow[]; batchId: number | null };

interface Props {
  assetTag: string;
  siteTimeZone: string;
  savedMapping: ColumnMapping | null;
  maxBytes: number;
}

function fitsHeader(mapping: ColumnMapping, header: readonly string[]): boolean {
  const names = new Set(header.map((name) => name.trim().toLowerCase()));
  const columns = [mapping.timestamp.column, ...Object.values(mapping.columns).flatMap((entry) => (entry ? [entry.column] : []))];
  return columns.every((column) => names.has(column.toLowerCase()));
}

function formatBytes(bytes: number): string {
  return bytes >= 2 ** 20 ? `${(bytes / 2 ** 20).toFixed(1)} MB` : `${Math.ceil(bytes / 1024)} KB`;
}

/**
 * Upload page body: choose a file, see its first rows and the detected delimiter and decimal mark, check or set
 * the column mapping (prefilled from the asset's saved mapping or from canonical headers), upload with progress,
 * then the summary with the first rejected rows and a link to the full reject report.
 */
export function ImportUploadForm({ assetTag, siteTimeZone, savedMapping, maxBytes }: Props) {
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<Preview | null>(null);
  const [previewError, setPreviewError] = useState<string | null>(null);
  const [mapping, setMapping] = useState<MappingFormState>(() => emptyMappingState(siteTimeZone));
  const [trustUnits, setTrustUnits] = useState(false);
  const [phase, setPhase] = useState<Phase>({ kind: "idle" });
  const [formError, setFormError] = useState<string | null>(null);
  const request = useRef<XMLHttpRequest | null>(null);
  const [timeZones, setTimeZones] = useState<string[]>([]);

  useEffect(() => {
    setTimeZones(typeof Intl.supportedValuesOf === "function" ? Intl.supportedValuesOf("timeZone") : []);
    return () => request.current?.abort();
  }, []);

  const busy = phase.kind === "uploading" || phase.kind === "processing";
  const tooLarge = file !== null && file.size > maxBytes;

  async function choose(chosen: File | null) {
    setFile(chosen);
    setPreview(null);
    setPreviewError(null);
    setFormError(null);
    setPhase({ kind: "idle" });
    if (!chosen) return;
    try {
      const complete = chosen.size <= PREVIEW_BYTES;
      const text = await chosen.slice(0, PREVIEW_BYTES).text();
      const delimiter = detectDelimiter(text, complete);
      const [head, ...rest] = splitCsvSample(text, delimiter, complete);
      if (!head) {
        setPreviewError("The file has no header line and no rows.");
        return;
      }
      const rows = rest.slice(0, PREVIEW_ROWS);
      const canonical = mappingFromCanonicalHeaders(head.fields);
      const prefill = savedMapping && fitsHeader(savedMapping, head.fields) ? "saved" : canonical.ok ? "canonical" : "none";
      const state =
        prefill === "saved" && savedMapping ? mappingToState(savedMapping, siteTimeZone) : canonical.ok ? mappingToState(canonical.mapping, siteTimeZone) : emptyMappingState(siteTimeZone);
      const timestampIndex = head.fields.findIndex((name) => name.trim().toLowerCase() === state.timestampColumn.toLowerCase());
      const valueCells = rows.flatMap((row) => row.fields.filter((_, index) => index !== timestampIndex));
      setMapping(state);
      setPreview({ fileName: chosen.name, header: head.fields, rows, delimiter, decimalMark: detectDecimalMark(valueCells, delimiter), prefill });
    } catch (error) {
      setPreviewError(`The file could not be read in the browser: ${(error as Error).message}`);
    }
  }

  // The timestamp format is detected again whenever the timestamp column or the time zone changes.
  const detected = useMemo(() => {
    const index = preview ? preview.header.findIndex((name) => name.trim() === mapping.timestampColumn) : -1;
    const format = preview && index >= 0 ? detectTimestampFormat(preview.rows.map((row) => row.fields[index] ?? ""), mapping.timeZone || siteTimeZone) : null;
    return { delimiter: preview?.delimiter ?? ",", decimalMark: preview?.decimalMark ?? ".", timestampFormat: format?.ok ? format.format : null };
  }, [preview, mapping.timestampColumn, mapping.timeZone, siteTimeZone]);

  function upload() {
    if (!file || !preview) return;
    const parsed = columnMappingSchema.safeParse(stateToMapping(mapping, siteTimeZone));
    if (!parsed.success) {
      setFormError(`The mapping is not complete: ${describeMappingIssues(parsed.error)}`);
      return;
    }
    setFormError(null);
    const query = new URLSearchParams({ mapping: JSON.stringify(stateToMapping(mapping, siteTimeZone)), fileName: file.name, source: "web" });
    if (trustUnits) query.set("trustUnits", "true");
    const xhr = new XMLHttpRequest();
    request.current = xhr;
    xhr.open("POST", `/api/assets/${encodeURIComponent(assetTag)}/readings?${query.toString()}`);
    xhr.setRequestHeader("Content-Type", "text/csv");
    xhr.responseType = "json";
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) setPhase({ kind: "uploading", fraction: event.loaded / event.total });
    };
    xhr.upload.onload = () => setPhase({ kind: "processing" });
    xhr.onload = () => {
      const body = xhr.response as (ImportResult & { error?: string; rejects?: RejectedRow[]; batchId?: number | null }) | null;
      if (xhr.status === 201 && body) setPhase({ kind: "done", result: body });
      else {
        setPhase({
          kind: "failed",
          message: body?.error ?? `The server answered ${xhr.status} ${xhr.statusText}.`,
          rejects: body?.rejects ?? [],
          batchId: body?.batchId ?? null,
        });
      }
    };
    xhr.onerror = () =>
      setPhase({ kind: "failed", message: "The upload was interrupted (connection lost or refused). Nothing was imported.", rejects: [], batchId: null });
    xhr.onabort = () => setPhase({ kind: "failed", message: "The upload was cancelled. Nothing was imported.", rejects: [], batchId: null });
    setPhase({ kind: "uploading", fraction: 0 });
    xhr.send(file);
  }

  return (
    <>
      <section className="panel" aria-labelledby="choose-heading">
        <h2 id="choose-heading">1. Choose a file</h2>
        <p>
          <label htmlFor="import-file">CSV file (comma, semicolon or tab separated; UTF-8; up to {formatBytes(maxBytes)})</label><br />
          <input id="import-file" type="file" accept=".csv,.txt,.tsv,text/csv,text/plain" disabled={busy} onChange={(event) => void choose(event.target.files?.[0] ?? null)} />
        </p>
        {file && <p className="subtle">{file.name}: {formatBytes(file.size)}</p>}
        {tooLarge && <p role="alert">This file is larger than the import limit of {formatBytes(maxBytes)}. Split it into smaller files.</p>}
        {previewError && <p role="alert">{previewError}</p>}
      </section>

      {preview && (
        <>
          <section className="panel" aria-labelledby="preview-heading" style={{ marginTop: "1rem" }}>
            <h2 id="preview-heading">2. Check the first rows</h2>
            <p>
              Detected delimiter: <strong>{DELIMITER_NAMES[preview.delimiter]}</strong>; decimal mark: <strong>“{preview.decimalMark}”</strong>
              {detected.timestampFormat ? <>; timestamps: <strong>{detected.timestampFormat}</strong></> : null}.{" "}
              {preview.prefill === "saved" && "The mapping below is the one saved for this asset."}
              {preview.prefill === "canonical" && "The columns have canonical names; the mapping below follows from them."}
              {preview.prefill === "none" && "Choose which column holds each measurement."}
            </p>
            <ImportPreviewTable header={preview.header} rows={preview.rows} fileName={preview.fileName} />
          </section>

          <section className="panel" aria-labelledby="mapping-heading" style={{ marginTop: "1rem" }}>
            <h2 id="mapping-heading">3. Column mapping</h2>
            <ImportMappingFields state={mapping} header={preview.header} detected={detected} timeZones={timeZones} disabled={busy} onChange={setMapping} />
            <p>
              <input id="trust-units" type="checkbox" checked={trustUnits} disabled={busy} onChange={(event) => setTrustUnits(event.target.checked)} />{" "}
              <label htmlFor="trust-units">Import even if the values look like another unit (skip the unit check of the first rows)</label>
            </p>
            <p className="subtle">The mapping is saved for this asset when the import succeeds, and offered again next time.</p>
            {formError && <p role="alert">{formError}</p>}
            <p>
              <button type="button" onClick={upload} disabled={busy || tooLarge}>Import {preview.fileName}</button>{" "}
              {busy && <button type="button" onClick={() => request.current?.abort()}>Cancel</button>}
            </p>
            <div role="status" aria-live="polite">
              {phase.kind === "uploading" && (
                <p>
                  <label htmlFor="upload-progress">Uploading and reading: {Math.round(phase.fraction * 100)} %</label><br />
                  <progress id="upload-progress" max={1} value={phase.fraction} style={{ width: "100%" }} />
                </p>
              )}
              {phase.kind === "processing" && (
                <p>
                  <label htmlFor="save-progress">Saving to the database (all rows in one transaction)…</label><br />
                  <progress id="save-progress" style={{ width: "100%" }} />
                </p>
              )}
            </div>
            {phase.kind === "failed" && (
              <div role="alert">
                <p><strong>Not imported.</strong> {phase.message}</p>
                <p className="subtle">The asset&apos;s readings are unchanged.{phase.batchId !== null ? ` The attempt is recorded as import batch ${phase.batchId}.` : ""}</p>
                {phase.rejects.length > 0 && (
                  <ul>
                    {phase.rejects.map((reject) => <li key={reject.line}>line {reject.line}: {reject.reason}</li>)}
                  </ul>
                )}
              </div>
            )}
          </section>
        </>
      )}

      {phase.kind === "done" && (
        <div style={{ marginTop: "1rem" }}>
          <ImportResultSummary result={phase.result} assetTag={assetTag} />
        </div>
      )}
    </>
  );
}
