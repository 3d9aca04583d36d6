import { gunzipSync } from "node:zlib";
import { describe, expect, it } from "vitest";
import { acceptsGzip, encodedJsonResponse, encodeJson } from "../../lib/present/encoded-json";

const value = { rows: Array.from({ length: 200 }, (_, index) => ({ tag: `E-${index}`, foulingM2KPerW: index * 1e-5 })) };
const request = (headers: Record<string, string> = {}) => new Request("http://localhost/api/fleet", { headers });

describe("acceptsGzip (RFC 9110 §12.5.3)", () => {
  it("takes gzip when listed, x-gzip as its alias, or * — and never with q=0", () => {
    expect(acceptsGzip("gzip, deflate, br")).toBe(true);
    expect(acceptsGzip("br;q=1.0, gzip;q=0.5")).toBe(true);
    expect(acceptsGzip("x-gzip")).toBe(true);
    expect(acceptsGzip("*")).toBe(true);
    expect(acceptsGzip("gzip;q=0")).toBe(false);
    expect(acceptsGzip("gzip;q=0.000, *")).toBe(false);
    expect(acceptsGzip("*;q=0")).toBe(false);
    expect(acceptsGzip("br, deflate")).toBe(false);
    expect(acceptsGzip("identity")).toBe(false);
    expect(acceptsGzip(null)).toBe(false);
  });
});

describe("encodedJsonResponse", () => {
  const encoded = encodeJson(value);

  it("sends the JSON as is to a client that does not ask for gzip, with its length and tag", async () => {
    const response = encodedJsonResponse(request(), encoded);
    expect(response.status).toBe(200);
    expect(response.headers.get("content-encoding")).toBeNull();
    expect(response.headers.get("content-type")).toBe("application/json");
    const text = await response.text();
    expect(JSON.parse(text)).toEqual(value);
    expect(Number(response.headers.get("content-length"))).toBe(Buffer.byteLength(text));
    expect(response.headers.get("etag")).toMatch(/^"[A-Za-z0-9_-]{27}"$/);
  });

  it("gzips for a client that accepts it, and the bytes inflate to the same JSON", async () => {
    const response = encodedJsonResponse(request({ "accept-encoding": "gzip, br" }), encoded);
    expect(response.headers.get("content-encoding")).toBe("gzip");
    const bytes = Buffer.from(await response.arrayBuffer());
    // gzip member header: ID1 ID2 = 0x1f 0x8b, CM = 8 (deflate) (RFC 1952 §2.3.1)
    expect([...bytes.subarray(0, 3)]).toEqual([0x1f, 0x8b, 8]);
    expect(JSON.parse(gunzipSync(bytes).toString("utf8"))).toEqual(value);
    expect(bytes.length).toBeLessThan(encoded.body.length / 3);
    expect(response.headers.get("vary")).toContain("Accept-Encoding");
  });

  it("answers 304 with no body when If-None-Match names the tag (weak comparison, RFC 9110 §13.1.2), else the body", async () => {
    for (const ifNoneMatch of [encoded.etag, `W/${encoded.etag}`, `"other", ${encoded.etag}`, "*"]) {
      const response = encodedJsonResponse(request({ "if-none-match": ifNoneMatch }), encoded);
      expect(response.status).toBe(304);
      expect(response.headers.get("etag")).toBe(encoded.etag);
      expect(await response.text()).toBe("");
    }
    expect(encodedJsonResponse(request({ "if-none-match": '"other"' }), encoded).status).toBe(200);
  });

  it("gives another tag to another answer, and the same tag to the same answer", () => {
    expect(encodeJson(value).etag).toBe(encoded.etag);
    expect(encodeJson({ ...value, extra: 1 }).etag).not.toBe(encoded.etag);
  });
});
