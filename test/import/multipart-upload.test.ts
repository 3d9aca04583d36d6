import fc from "fast-check";
import { text } from "node:stream/consumers";
import { describe, expect, it } from "vitest";
import { ImportRefusal } from "../../lib/import/import-errors";
import { multipartBoundary, readMultipartUpload } from "../../lib/import/multipart-upload";

const BOUNDARY = "----foulcastBoundary7MA4YWxkTrZu0gW";

function body(parts: { name: string; fileName?: string; content: string }[]): string {
  const lines = parts.map(
    (part) =>
      `--${BOUNDARY}\r\nContent-Disposition: form-data; name="${part.name}"${part.fileName ? `; filename="${part.fileName}"\r\nContent-Type: text/csv` : ""}\r\n\r\n${part.content}\r\n`,
  );
  return `${lines.join("")}--${BOUNDARY}--\r\n`;
}

async function* chunks(source: string, cuts: readonly number[]): AsyncGenerator<Buffer> {
  const bytes = Buffer.from(source);
  let start = 0;
  for (const cut of [...new Set(cuts)].sort((a, b) => a - b)) {
    if (cut > start && cut < bytes.length) {
      yield bytes.subarray(start, cut);
      start = cut;
    }
  }
  yield bytes.subarray(start);
}

describe("multipartBoundary", () => {
  it("reads the boundary parameter, quoted or not", () => {
    // RFC 7578 §4.1 / RFC 2046 §5.1.1
    expect(multipartBoundary(`multipart/form-data; boundary=${BOUNDARY}`)).toBe(BOUNDARY);
    expect(multipartBoundary('multipart/form-data; boundary="a b"')).toBe("a b");
    expect(multipartBoundary("text/csv")).toBeNull();
  });
});

describe("readMultipartUpload", () => {
  const csv = "timestamp,hot_in_C\r\n2026-03-01T10:00Z,120\r\n--not-a-boundary\r\n";

  it("returns the fields before the file and the file's bytes exactly, however the body is cut", async () => {
    // property: any cutting of the body into chunks gives the same fields and file content
    const source = body([{ name: "mapping", content: "saved" }, { name: "file", fileName: "plant.csv", content: csv }, { name: "after", content: "x" }]);
    await fc.assert(
      fc.asyncProperty(fc.array(fc.integer({ min: 1, max: source.length - 1 }), { maxLength: 12 }), async (cuts) => {
        const upload = await readMultipartUpload(chunks(source, cuts), BOUNDARY);
        expect(upload.fields).toEqual({ mapping: "saved" });
        expect(upload.fileName).toBe("plant.csv");
        expect(await text(upload.file)).toBe(csv);
      }),
      { numRuns: 200 },
    );
  });

  it("refuses a body without a file part and one cut off inside the file", async () => {
    await expect(readMultipartUpload(chunks(body([{ name: "mapping", content: "saved" }]), []), BOUNDARY)).rejects.toThrow(
      "the multipart upload cannot be read: no file part (a part with a filename) in the body",
    );
    const whole = body([{ name: "file", fileName: "a.csv", content: csv }]);
    const cut = whole.slice(0, whole.indexOf("2026") + 4);
    const upload = await readMultipartUpload(chunks(cut, []), BOUNDARY);
    await expect(text(upload.file)).rejects.toBeInstanceOf(ImportRefusal);
  });
});
