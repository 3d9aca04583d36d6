import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { POST } from "../../app/api/assets/[tag]/readings/route";
import { GET as getBatch } from "../../app/api/imports/[id]/route";
import { GET as getRejects } from "../../app/api/imports/[id]/rejects.csv/route";
import { disconnectPrisma } from "../../lib/db";
import { createSignedInUser, type TestUser } from "../support/auth-session";
import { createTestDatabase, type TestDatabase } from "../support/test-database";
import { CANONICAL_HEADER, canonicalCsv, createTestAsset } from "./support/fixtures";

let database: TestDatabase;
/** The routes need a signed-in engineer (test/security covers refusals). */
let engineer: TestUser;
const START = Date.UTC(2026, 2, 1);

beforeAll(async () => {
  database = await createTestDatabase();
  // the route handlers use the process-wide client (lib/db.ts), which reads DATABASE_URL on first use
  process.env.DATABASE_URL = database.url;
  await createTestAsset(database.prisma, "E-API");
  engineer = await createSignedInUser(database.prisma, "engineer");
});

afterAll(async () => {
  await disconnectPrisma();
  await database.drop();
});

function post(tag: string, body: BodyInit | null, query = "", headers: Record<string, string> = { "content-type": "text/csv" }) {
  const request = new Request(`http://localhost/api/assets/${tag}/readings${query}`, { method: "POST", body, headers: { ...headers, cookie: engineer.cookie }, duplex: "half" } as RequestInit);
  return POST(request, { params: Promise.resolve({ tag }) });
}

const idParams = (id: string | number) => ({ params: Promise.resolve({ id: String(id) }) });
const signedIn = () => new Request("http://localhost", { headers: { cookie: engineer.cookie } });

describe("POST /api/assets/{tag}/readings", () => {
  it("imports a text/csv body and answers 201 with the summary and where to find the batch", async () => {
    const response = await post("E-API", canonicalCsv(20, START), "?fileName=march.csv");
    expect(response.status).toBe(201);
    const summary = (await response.json()) as { batchId: number; rowsNew: number; fileName: string; source: string; createdBy: string; rejectsUrl: string };
    expect(summary).toMatchObject({ rowsNew: 20, fileName: "march.csv", source: "api", createdBy: engineer.email });
    expect(response.headers.get("location")).toBe(`/api/imports/${summary.batchId}`);
    expect(summary.rejectsUrl).toBe(`/api/imports/${summary.batchId}/rejects.csv`);
    const batch = await getBatch(signedIn(), idParams(summary.batchId));
    expect(await batch.json()).toMatchObject({ id: summary.batchId, status: "completed", rowsNew: 20, rejects: [] });
  });

  it("takes the one file of a multipart body, with parameters in fields before it", async () => {
    const form = new FormData();
    form.append("mapping", "canonical");
    form.append("file", new Blob([canonicalCsv(5, START + 86_400_000)], { type: "text/csv" }), "upload.csv");
    const encoded = new Request("http://localhost", { method: "POST", body: form });
    const response = await post("E-API", await encoded.arrayBuffer(), "", { "content-type": encoded.headers.get("content-type") ?? "" });
    expect(response.status).toBe(201);
    expect(await response.json()).toMatchObject({ rowsNew: 5, fileName: "upload.csv", mappingSource: "canonical" });
  });

  it("serves the reject report as CSV with formula-like cells neutralised", async () => {
    const mapping = {
      timestamp: { column: "timestamp" },
      columns: {
        hotIn: { column: "=HYPERLINK(1)", unit: "C" }, hotOut: { column: "hot_out_C", unit: "C" }, coldIn: { column: "cold_in_C", unit: "C" },
        coldOut: { column: "cold_out_C", unit: "C" }, hotFlow: { column: "hot_flow_kg_s", unit: "kg/s" }, coldFlow: { column: "cold_flow_kg_s", unit: "kg/s" },
      },
    };
    const text = canonicalCsv(4, START + 2 * 86_400_000).replace("hot_in_C", "=HYPERLINK(1)").replace(/\n([^,]+),[^,]+,/, "\n$1,oops,");
    const response = await post("E-API", text, `?mapping=${encodeURIComponent(JSON.stringify(mapping))}`);
    expect(response.status).toBe(201);
    const { batchId } = (await response.json()) as { batchId: number };
    const csv = await getRejects(signedIn(), idParams(batchId));
    expect(csv.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    expect(csv.headers.get("content-disposition")).toBe(`attachment; filename="import-${batchId}-rejects.csv"`);
    // OWASP "CSV Injection": the reason starts with "=", so it is prefixed with a single quote (then RFC 4180 quoting)
    expect(await csv.text()).toBe('line,reason\r\n2,"\'=HYPERLINK(1): ""oops"" is not a number"\r\n');
  });

  it("answers 413 for a body over the limit, by its declared length or while streaming", async () => {
    process.env.FOULCAST_MAX_IMPORT_BYTES = "2000";
    try {
      const declared = await post("E-API", canonicalCsv(100, START), "", { "content-type": "text/csv", "content-length": "9000" });
      expect(declared.status).toBe(413);
      const bytes = new TextEncoder().encode(canonicalCsv(100, START));
      const streamed = new ReadableStream<Uint8Array>({
        start(controller) {
          for (let start = 0; start < bytes.length; start += 500) controller.enqueue(bytes.subarray(start, start + 500));
          controller.close();
        },
      });
      const response = await post("E-API", streamed);
      expect(response.status).toBe(413);
      expect(await response.json()).toMatchObject({ code: "too-large", error: "the file is larger than the limit of 2,000 bytes (FOULCAST_MAX_IMPORT_BYTES); split it into smaller files" });
    } finally {
      delete process.env.FOULCAST_MAX_IMPORT_BYTES;
    }
  });

  it("names the problem in a 4xx answer: unknown tag, bad parameter, wrong content type, refused file", async () => {
    const unknown = await post("E-NOPE", canonicalCsv(2, START));
    expect(unknown.status).toBe(404);
    expect(await unknown.json()).toEqual({ error: 'no asset with tag "E-NOPE"', code: "unknown-asset", batchId: null, rejects: [] });
    const badQuery = await post("E-API", canonicalCsv(2, START), "?decimal=%3B");
    expect(badQuery.status).toBe(400);
    const json = await post("E-API", "{}", "", { "content-type": "application/json" });
    expect(json.status).toBe(415);
    const refused = await post("E-API", `${CANONICAL_HEADER}\n`);
    expect(refused.status).toBe(422);
    expect(await refused.json()).toMatchObject({ code: "empty", error: "the file has no data rows (only a header)" });
  });
});

describe("GET /api/imports/{id}", () => {
  it("answers 404 for an unknown import and 400 for an id that is not a number", async () => {
    expect((await getBatch(signedIn(), idParams(999_999))).status).toBe(404);
    expect((await getBatch(signedIn(), idParams("../etc"))).status).toBe(400);
    expect((await getRejects(signedIn(), idParams("1e3"))).status).toBe(400);
  });
});
