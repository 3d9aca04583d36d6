// A JSON answer encoded once and served to many requests: the bytes, their gzip form and an entity tag, so a
// shared answer costs each request only the copy to the socket (the fleet API under load, docs/benchmarks.md).
import { createHash } from "node:crypto";
import { gzipSync } from "node:zlib";

export interface EncodedJson {
  body: Uint8Array<ArrayBuffer>;
  gzipped: Uint8Array<ArrayBuffer>;
  /** Strong entity tag of the body (RFC 9110 §8.8.3): a quoted SHA-256 prefix. */
  etag: string;
}

export function encodeJson(value: unknown): EncodedJson {
  const body = new Uint8Array(Buffer.from(JSON.stringify(value), "utf8"));
  return { body, gzipped: new Uint8Array(gzipSync(body)), etag: `"${createHash("sha256").update(body).digest("base64url").slice(0, 27)}"` };
}

/** Whether Accept-Encoding admits gzip: listed (or "*") without q=0 (RFC 9110 §12.5.3). */
export function acceptsGzip(acceptEncoding: string | null): boolean {
  if (!acceptEncoding) return false;
  let star: boolean | null = null;
  for (const item of acceptEncoding.split(",")) {
    const [coding = "", ...parameters] = item.split(";").map((part) => part.trim().toLowerCase());
    const q = parameters.find((parameter) => parameter.startsWith("q="));
    const allowed = q === undefined || Number(q.slice(2)) > 0;
    if (coding === "gzip" || coding === "x-gzip") return allowed;
    if (coding === "*") star = allowed;
  }
  return star === true;
}

/** Whether If-None-Match names this tag (weak comparison, RFC 9110 §13.1.2), or is "*". */
function matchesTag(ifNoneMatch: string | null, etag: string): boolean {
  if (!ifNoneMatch) return false;
  return ifNoneMatch.split(",").some((candidate) => {
    const tag = candidate.trim();
    return tag === "*" || tag.replace(/^W\//, "") === etag;
  });
}

/**
 * The response for `request`: 304 when its If-None-Match names the tag, else the body, gzipped when the client
 * accepts gzip. Private (the answer depends on who may read it) and revalidated on every use.
 */
export function encodedJsonResponse(request: Request, encoded: EncodedJson): Response {
  const headers = new Headers({ ETag: encoded.etag, Vary: "Accept-Encoding, Cookie", "Cache-Control": "private, no-cache" });
  if (matchesTag(request.headers.get("if-none-match"), encoded.etag)) return new Response(null, { status: 304, headers });
  headers.set("Content-Type", "application/json");
  const gzip = acceptsGzip(request.headers.get("accept-encoding"));
  if (gzip) headers.set("Content-Encoding", "gzip");
  const bytes = gzip ? encoded.gzipped : encoded.body;
  headers.set("Content-Length", String(bytes.length));
  return new Response(bytes, { headers });
}
