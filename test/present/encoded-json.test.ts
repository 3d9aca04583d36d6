import { describe, expect, it } from "vitest";
import { encodedJsonResponse, encodeJson } from "../../lib/present/encoded-json";

const value = { rows: Array.from({ length: 200 }, (_, index) => ({ tag: `E-${index}`, foulingM2KPerW: index * 1e-5 })) };
const request = (headers: Record<string, string> = {}) => new Request("http://localhost/api/fleet", { headers });

describe("encodedJsonResponse", () => {
  const encoded = encodeJson(value);

  it("sends the JSON as it is, with its tag, and never a Content-Encoding of its own (Next's server compresses)", async () => {
    const response = encodedJsonResponse(request({ "accept-encoding": "gzip, br" }), encoded);
    expect(response.status).toBe(200);
    expect(response.headers.get("content-encoding")).toBeNull();
    expect(response.headers.get("content-type")).toBe("application/json");
    const text = await response.text();
    expect(JSON.parse(text)).toEqual(value);
    expect(Buffer.byteLength(text)).toBe(encoded.body.length);
    expect(response.headers.get("etag")).toMatch(/^"[A-Za-z0-9_-]{27}"$/);
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
