import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { POST } from "../../app/api/assets/[tag]/readings/route";
import { GET as getRejects } from "../../app/api/imports/[id]/rejects.csv/route";
import { importReadings } from "../../lib/data/import-readings";
import { disconnectPrisma } from "../../lib/db";
import { DEFAULT_FILE_NAME, MAX_FILE_NAME_LENGTH, safeFileName } from "../../lib/import/safe-file-name";
import { attachmentDisposition } from "../../lib/present/attachment-disposition";
import { authenticatedRequest } from "../support/authenticated-request";
import { createTestDatabase, type TestDatabase } from "../support/test-database";
import { canonicalCsv, createTestAsset, textStream } from "../import/support/fixtures";

const HOSTILE_NAMES = [
  "../../etc/passwd",
  "..\\..\\Windows\\System32\\drivers\\etc\\hosts",
  "/etc/shadow",
  "C:\\temp\\march.csv",
  "march\0.csv",
  "march.csv\r\nSet-Cookie: session=stolen",
  'a"; filename="evil.exe',
  "evil\u202Evsc.exe",
  "..",
  ".",
  "",
  "   ",
  "/",
  `${"a".repeat(300)}.csv`,
  `${"a".repeat(254)}😀.csv`,
  "\ud800lone.csv",
];

// Characters a recorded name must never hold: C0/C1 controls (NUL, CR, LF, ...), DEL, path separators,
// bidirectional controls (Unicode Standard Annex #9) and lone surrogates.
const FORBIDDEN = /[\u0000-\u001f\u007f-\u009f/\\\u202a-\u202e\u2066-\u2069]|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;

const nameArbitrary = fc.oneof(
  fc.string({ unit: "binary", maxLength: 300 }),
  fc.array(fc.constantFrom("..", "/", "\\", "\0", "\r\n", '"', ";", "etc", "passwd", ".csv", "é", "\u202e", "\ud800", " ", "%2e%2e"), { maxLength: 20 }).map((parts) => parts.join("")),
);

describe("safeFileName", () => {
  it("keeps only the last path segment and drops control characters", () => {
    expect(safeFileName("../../etc/passwd")).toBe("passwd");
    expect(safeFileName("..\\..\\Windows\\System32\\drivers\\etc\\hosts")).toBe("hosts");
    expect(safeFileName("C:\\temp\\march.csv")).toBe("march.csv");
    expect(safeFileName("march\0.csv")).toBe("march.csv");
    expect(safeFileName("march.csv\r\nSet-Cookie: session=stolen")).toBe("march.csvSet-Cookie: session=stolen");
    expect(safeFileName("evil\u202Evsc.exe")).toBe("evilvsc.exe");
    for (const name of ["..", ".", "", "   ", "/"]) expect(safeFileName(name)).toBe(DEFAULT_FILE_NAME);
    expect(safeFileName(`${"a".repeat(300)}.csv`)).toHaveLength(MAX_FILE_NAME_LENGTH);
    // the cut never splits the surrogate pair of 😀 (code units 254-255)
    expect(safeFileName(`${"a".repeat(254)}😀.csv`)).toBe("a".repeat(254));
    expect(safeFileName("\ud800lone.csv")).toBe("\ufffdlone.csv");
  });

  it("gives a non-empty, bounded name without separators or controls for any input, and is idempotent", () => {
    fc.assert(
      fc.property(nameArbitrary, (name) => {
        const safe = safeFileName(name);
        expect(safe.length).toBeGreaterThan(0);
        expect(safe.length).toBeLessThanOrEqual(MAX_FILE_NAME_LENGTH);
        expect(safe).not.toMatch(FORBIDDEN);
        expect([".", ".."]).not.toContain(safe);
        expect(safeFileName(safe)).toBe(safe);
      }),
      { numRuns: 3000 },
    );
  });
});

describe("attachmentDisposition", () => {
  it("writes an RFC 6266 attachment header with an ASCII fallback and an RFC 8187 UTF-8 name", () => {
    expect(attachmentDisposition("import-12-rejects.csv")).toBe('attachment; filename="import-12-rejects.csv"');
    // RFC 8187 §3.2.1: "é" is UTF-8 C3 A9, percent-encoded; the quoted fallback replaces it with "_"
    expect(attachmentDisposition("café.csv")).toBe("attachment; filename=\"caf_.csv\"; filename*=UTF-8''caf%C3%A9.csv");
    expect(attachmentDisposition('a"; filename="evil.exe')).toBe("attachment; filename=\"a_; filename=_evil.exe\"; filename*=UTF-8''a%22%3B%20filename%3D%22evil.exe");
    expect(attachmentDisposition("../../etc/passwd")).toBe('attachment; filename="passwd"');
  });

  it("is always a valid single header value whose names read back as the safe name", () => {
    fc.assert(
      fc.property(nameArbitrary, (name) => {
        const value = attachmentDisposition(name);
        // the Fetch Headers class refuses values with CR, LF or NUL (header injection would throw here)
        expect(new Headers({ "content-disposition": value }).get("content-disposition")).toBe(value);
        const match = /^attachment; filename="([\x20-\x21\x23-\x5b\x5d-\x7e]*)"(?:; filename\*=UTF-8''([A-Za-z0-9!#$&+\-.^_`|~%]*))?$/.exec(value);
        expect(match).not.toBeNull();
        const extended = match?.[2];
        expect(extended === undefined ? match?.[1] : decodeURIComponent(extended)).toBe(safeFileName(name));
      }),
      { numRuns: 3000 },
    );
  });
});

describe("file names given to an import (HTTP upload, query parameter, library call)", () => {
  let database: TestDatabase;
  const START = Date.UTC(2026, 2, 1);

  beforeAll(async () => {
    database = await createTestDatabase();
    process.env.DATABASE_URL = database.url;
    await createTestAsset(database.prisma, "E-NAMES");
  });

  afterAll(async () => {
    await disconnectPrisma();
    await database.drop();
  });

  async function postMultipart(fileName: string, day: number): Promise<Response> {
    const form = new FormData();
    form.append("file", new Blob([canonicalCsv(3, START + day * 86_400_000)], { type: "text/csv" }), "placeholder.csv");
    const encoded = new Request("http://localhost", { method: "POST", body: form });
    // FormData escapes the name it is given; write the part header by hand so the raw hostile name arrives
    const body = Buffer.from(await encoded.arrayBuffer()).toString("latin1").replace('filename="placeholder.csv"', `filename="${fileName.replace(/["\\]/g, "\\$&")}"`);
    const request = await authenticatedRequest("http://localhost/api/assets/E-NAMES/readings", {
      method: "POST",
      body: Buffer.from(body, "latin1"),
      headers: { "content-type": encoded.headers.get("content-type") ?? "" },
    });
    return POST(request, { params: Promise.resolve({ tag: "E-NAMES" }) });
  }

  it("records a hostile multipart file name only as its safe label, and the import succeeds", async () => {
    for (const [index, name] of ["../../etc/passwd", "march\0.csv", "..\\..\\boot.ini"].entries()) {
      const response = await postMultipart(name, index);
      expect(response.status).toBe(201);
      const summary = (await response.json()) as { fileName: string; batchId: number };
      // latin1 round trip of ASCII names is exact
      expect(summary.fileName).toBe(safeFileName(name));
      const batch = await database.prisma.importBatch.findUniqueOrThrow({ where: { id: summary.batchId } });
      expect(batch.fileName).toBe(safeFileName(name));
    }
    // a raw CR LF ends the part's header line (RFC 7578 §4.2 wants such names percent-encoded): whatever part of the
    // name the parser keeps, the record holds no line break
    const response = await postMultipart("x.csv\r\nX-Injected: 1", 3);
    expect(response.status).toBe(201);
    expect(((await response.json()) as { fileName: string }).fileName).not.toMatch(FORBIDDEN);
  });

  it("accepts a NUL byte in the fileName query parameter instead of failing in PostgreSQL (text cannot hold NUL)", async () => {
    const request = await authenticatedRequest(`http://localhost/api/assets/E-NAMES/readings?fileName=${encodeURIComponent("evil\0name.csv")}`, {
      method: "POST",
      body: canonicalCsv(3, START + 10 * 86_400_000),
      headers: { "content-type": "text/csv" },
    });
    const response = await POST(request, { params: Promise.resolve({ tag: "E-NAMES" }) });
    expect(response.status).toBe(201);
    expect(await response.json()).toMatchObject({ fileName: "evilname.csv" });
  });

  it("records every hostile name through the library call, refused imports included", async () => {
    for (const [index, name] of HOSTILE_NAMES.entries()) {
      const summary = await importReadings(database.prisma, {
        assetTag: "E-NAMES", source: "cli", createdBy: "test", fileName: name, stream: textStream(canonicalCsv(2, START + (20 + index) * 86_400_000)),
      });
      expect(summary.fileName).toBe(safeFileName(name));
      const refused = await importReadings(database.prisma, { assetTag: "E-NAMES", source: "cli", createdBy: "test", fileName: name, stream: textStream("") }).catch((error: unknown) => error);
      expect(refused).toMatchObject({ name: "ImportRefusal", code: "empty" });
      const failed = await database.prisma.importBatch.findUniqueOrThrow({ where: { id: (refused as { batchId: number }).batchId } });
      expect(failed).toMatchObject({ status: "failed", fileName: safeFileName(name) });
    }
  });

  it("serves the reject report with a Content-Disposition that names the batch, never a user's file name", async () => {
    const response = await postMultipart("=evil\r\n.csv", 40);
    const { batchId } = (await response.json()) as { batchId: number };
    const download = await getRejects(await authenticatedRequest(`http://localhost/api/imports/${batchId}/rejects.csv`), { params: Promise.resolve({ id: String(batchId) }) });
    expect(download.headers.get("content-disposition")).toBe(`attachment; filename="import-${batchId}-rejects.csv"`);
  });
});
