// A JSON answer encoded once and served to many requests: its bytes and an entity tag, so a shared answer costs each
// request only the copy to the socket (the fleet API under load, docs/benchmarks.md). Compression is Next's: its
// server gzips for clients that accept it, and drops a route's own Content-Encoding and Content-Length headers
// (next/dist/server/send-response.js), so a route must not compress its body itself.
import { createHash } from "node:crypto";

export interface EncodedJson {
  body: Uint8Array<ArrayBuffer>;
  /** Strong entity tag of the body (RFC 9110 §8.8.3): a quoted SHA-256 prefix. */
  etag: string;
}

export function encodeJson(value: unknown): EncodedJson {
  const body = new Uint8Array(Buffer.from(JSON.stringify(value), "utf8"));
  return { body, etag: `"${createHash("sha256").update(body).digest("base64url").slice(0, 27)}"` };
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
 * The response for `request`: 304 when its If-None-Match names the tag, else the body. Private (the answer depends
 * on who may read it) and revalidated on every use.
 */
export function encodedJsonResponse(request: Request, encoded: EncodedJson): Response {
  const headers = new Headers({ ETag: encoded.etag, Vary: "Cookie", "Cache-Control": "private, no-cache" });
  if (matchesTag(request.headers.get("if-none-match"), encoded.etag)) return new Response(null, { status: 304, headers });
  headers.set("Content-Type", "application/json");
  return new Response(encoded.body, { headers });
}
