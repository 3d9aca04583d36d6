import { NextResponse } from "next/server";
import { Readable } from "node:stream";
import type { ReadableStream as NodeReadableStream } from "node:stream/web";
import { withRole } from "@/lib/auth/with-role";
import { importReadings } from "@/lib/data/import-readings";
import { refreshAfterImport } from "@/lib/data/refresh-after-import";
import { getPrisma } from "@/lib/db";
import { ImportFailure, ImportRefusal } from "@/lib/import/import-errors";
import { resolveImportLimits } from "@/lib/import/import-limits";
import { parseImportRequestOptions } from "@/lib/import/import-request-options";
import { multipartBoundary, readMultipartUpload } from "@/lib/import/multipart-upload";
import { badPathParameterMessage, pathParameter } from "@/lib/validation/path-parameter";

export const dynamic = "force-dynamic";

/** Rejected rows returned in the response; all of them (up to 10,000) are in GET /api/imports/{id}. */
const REJECTS_IN_RESPONSE = 100;

/** Content types read as the CSV itself (browsers label .csv files differently per platform). */
const CSV_TYPES = ["text/csv", "text/plain", "application/csv", "application/octet-stream", "application/vnd.ms-excel"];

function problem(status: number, code: string, error: string, extra: Record<string, unknown> = {}) {
  return NextResponse.json({ error, code, ...extra }, { status });
}

/**
 * POST /api/assets/{tag}/readings: imports the request body, a CSV file (text/csv), or the one file of a
 * multipart/form-data body (fields before it may carry the parameters), into the asset's readings.
 * Query parameters: mapping (auto | saved | canonical | JSON mapping), timeZone, decimal, delimiter,
 * timestampFormat, trustUnits, fileName, source (api | web). The body is streamed, never held whole, and refused
 * with 413 once it passes FOULCAST_MAX_IMPORT_BYTES. 201 with the summary; 4xx with { error, code } naming the
 * problem; nothing is written on an error. Engineers and admins only (401/403 otherwise, and 403 for a cross-site
 * request); createdBy is the signed-in user's email.
 */
export const POST = withRole("data.import", async (request: Request, { params }: { params: Promise<{ tag: string }> }, user) => {
  const { tag } = await params;
  const assetTag = pathParameter(tag);
  if (assetTag === null) return problem(400, "bad-request", badPathParameterMessage("asset tag", tag));
  const url = new URL(request.url);
  const query = Object.fromEntries(url.searchParams.entries());
  const { maxBytes } = resolveImportLimits();
  const declaredLength = Number(request.headers.get("content-length") ?? Number.NaN);
  if (Number.isFinite(declaredLength) && declaredLength > maxBytes) {
    return problem(413, "too-large", `the upload is ${declaredLength} bytes, larger than the limit of ${maxBytes} bytes (FOULCAST_MAX_IMPORT_BYTES)`);
  }
  if (!request.body) return problem(422, "empty", "the request has no body; send the CSV file as the body (text/csv)");
  const contentType = (request.headers.get("content-type") ?? "text/csv").toLowerCase();
  let body: Readable = Readable.fromWeb(request.body as unknown as NodeReadableStream<Uint8Array>);
  let fields: Record<string, string> = {};
  let uploadedName: string | null = null;
  try {
    const boundary = multipartBoundary(contentType);
    if (boundary) {
      const upload = await readMultipartUpload(body, boundary);
      body = upload.file;
      fields = upload.fields;
      uploadedName = upload.fileName;
    } else if (!CSV_TYPES.some((type) => contentType.startsWith(type))) {
      body.destroy();
      return problem(415, "unsupported-media-type", `send the file as text/csv or multipart/form-data, not ${contentType}`);
    }
  } catch (error) {
    body.destroy();
    if (error instanceof ImportRefusal) return problem(error.status, error.code, error.message);
    throw error;
  }
  const parsed = parseImportRequestOptions(query, fields);
  if (!parsed.ok) {
    body.destroy();
    return problem(400, "bad-request", parsed.message);
  }
  const { mapping, options, source } = parsed.value;
  const fileName = query.fileName ? parsed.value.fileName : (uploadedName ?? parsed.value.fileName);
  try {
    // A plain body must arrive whole (Content-Length); a multipart one must reach its closing boundary.
    const expectedBytes = uploadedName === null && Number.isFinite(declaredLength) ? declaredLength : undefined;
    const summary = await importReadings(getPrisma(), {
      assetTag,
      source,
      createdBy: user.email,
      userId: user.id,
      fileName,
      stream: body,
      mapping,
      options: { ...options, expectedBytes },
    });
    const { reassessed, queued } = await refreshAfterImport(getPrisma(), summary);
    return NextResponse.json(
      {
        ...summary,
        reassessed,
        queued,
        rejects: summary.rejects.slice(0, REJECTS_IN_RESPONSE),
        batchUrl: `/api/imports/${summary.batchId}`,
        rejectsUrl: `/api/imports/${summary.batchId}/rejects.csv`,
      },
      { status: 201, headers: { Location: `/api/imports/${summary.batchId}` } },
    );
  } catch (error) {
    if (error instanceof ImportRefusal) {
      return problem(error.status, error.code, error.message, { batchId: error.batchId, rejects: error.rejects.slice(0, 20) });
    }
    if (error instanceof ImportFailure) return problem(500, "failed", error.message, { batchId: error.batchId });
    throw error;
  }
});
