// The JSON API under malformed requests, calling the route handlers directly with a signed-in session
// (test/support/authenticated-request.ts): every answer is a 4xx with a JSON { error } that names what is wrong,
// or a success; never an exception out of the handler (which Next.js turns into a bare 500).
import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { GET as getAssessment } from "../../app/api/assets/[tag]/assessment/route";
import { POST as postReadings } from "../../app/api/assets/[tag]/readings/route";
import { GET as getBatch } from "../../app/api/imports/[id]/route";
import { POST as postBookings } from "../../app/api/plan/bookings/route";
import { POST as postPlan } from "../../app/api/plan/route";
import { disconnectPrisma } from "../../lib/db";
import { authenticatedRequest } from "../support/authenticated-request";
import { createTestDatabase, type TestDatabase } from "../support/test-database";
import { canonicalCsv, createTestAsset, readingsState } from "../import/support/fixtures";

let database: TestDatabase;
let assetId: number;
const START = Date.UTC(2026, 2, 1);

beforeAll(async () => {
  database = await createTestDatabase();
  process.env.DATABASE_URL = database.url;
  assetId = (await createTestAsset(database.prisma, "E-ROUTES")).id;
});

afterAll(async () => {
  await disconnectPrisma();
  await database.drop();
});

async function errorBody(response: Response): Promise<{ error: string; code?: string }> {
  expect(response.headers.get("content-type") ?? "").toMatch(/application\/json/);
  const body = (await response.json()) as { error?: unknown; code?: unknown };
  expect(typeof body.error).toBe("string");
  expect((body.error as string).length).toBeGreaterThan(5);
  return body as { error: string; code?: string };
}

const queryValue = fc.oneof(fc.string({ maxLength: 30 }), fc.constantFrom("{", '{"timestamp":1}', "[]", "null", "%", "\0", "tab", ";", ",", "true", "maybe", "x".repeat(400)), fc.jsonValue({ maxDepth: 3 }).map((json) => JSON.stringify(json) ?? ""));
const QUERY_KEYS = ["mapping", "timeZone", "decimal", "delimiter", "timestampFormat", "trustUnits", "fileName", "source"] as const;

describe("POST /api/assets/{tag}/readings with malformed parameters and bodies", () => {
  it("answers 201 or a 4xx JSON error naming the parameter or the file's problem, and writes nothing on a 4xx", async () => {
    let rejected = 0;
    await fc.assert(
      fc.asyncProperty(
        fc.dictionary(fc.constantFrom(...QUERY_KEYS), queryValue, { maxKeys: 4 }),
        fc.constantFrom("text/csv", "application/json", "multipart/form-data", "multipart/form-data; boundary=x", "text/plain; charset=utf-16", "image/png", ""),
        fc.oneof(fc.constant(canonicalCsv(3, START)), fc.string({ maxLength: 200 }), fc.constantFrom("", "{}", '{"rows":[1,2]}', "--x\r\n\r\n", "--x\r\nContent-Disposition: form-data; name=\"file\"; filename=\"a.csv\"\r\n\r\n")),
        async (query, contentType, body) => {
          const before = await readingsState(database.prisma, assetId);
          const search = new URLSearchParams(query).toString();
          const request = await authenticatedRequest(`http://localhost/api/assets/E-ROUTES/readings${search ? `?${search}` : ""}`, { method: "POST", body, headers: contentType ? { "content-type": contentType } : {} });
          const response = await postReadings(request, { params: Promise.resolve({ tag: "E-ROUTES" }) });
          if (response.status === 201) return;
          rejected += 1;
          expect(response.status).toBeGreaterThanOrEqual(400);
          expect(response.status).toBeLessThan(500);
          const { error, code } = await errorBody(response);
          if (response.status === 400) expect(error).toMatch(new RegExp(`^(${QUERY_KEYS.join("|")}|query)\\b`));
          expect(code).toBeTruthy();
          expect(await readingsState(database.prisma, assetId)).toEqual(before);
        },
      ),
      { numRuns: 120 },
    );
    expect(rejected).toBeGreaterThan(60);
  }, 120_000);

  it("refuses an oversized body with 413 before reading it whole (declared length, then a 1 GB stream cut off early)", async () => {
    const declared = await postReadings(
      await authenticatedRequest("http://localhost/api/assets/E-ROUTES/readings", { method: "POST", body: "x", headers: { "content-type": "text/csv", "content-length": String(300 * 1024 * 1024) } }),
      { params: Promise.resolve({ tag: "E-ROUTES" }) },
    );
    expect(declared.status).toBe(413);
    expect((await errorBody(declared)).error).toMatch(/larger than the limit of 209715200 bytes \(FOULCAST_MAX_IMPORT_BYTES\)/);
    // a stream that would deliver 1 GB (16,384 chunks of 64 KiB) if read to the end; the limit is 1 MB here
    process.env.FOULCAST_MAX_IMPORT_BYTES = String(1024 * 1024);
    try {
      let pulled = 0;
      const chunk = new TextEncoder().encode(`${canonicalCsv(1500, START).slice(0, 64 * 1024 - 1)}\n`);
      const endless = new ReadableStream<Uint8Array>({
        pull(controller) {
          pulled += 1;
          if (pulled > 16_384) controller.close();
          else controller.enqueue(chunk);
        },
      });
      const response = await postReadings(await authenticatedRequest("http://localhost/api/assets/E-ROUTES/readings", { method: "POST", body: endless, headers: { "content-type": "text/csv" } }), { params: Promise.resolve({ tag: "E-ROUTES" }) });
      expect(response.status).toBe(413);
      // stopped within a few chunks past 1 MB (16 chunks), far from the 16,384 of the whole body
      expect(pulled).toBeLessThan(64);
    } finally {
      delete process.env.FOULCAST_MAX_IMPORT_BYTES;
    }
  });

  it("answers 404 or 400 for tags that are unknown or not valid percent-encoding, never an exception", async () => {
    for (const tag of ["E-NOPE", "%E0%A4%A", "%", "..%2F..%2Fetc", "\0", "x".repeat(10_000)]) {
      const request = await authenticatedRequest(`http://localhost/api/assets/x/readings`, { method: "POST", body: canonicalCsv(2, START), headers: { "content-type": "text/csv" } });
      const response = await postReadings(request, { params: Promise.resolve({ tag }) });
      expect([400, 404]).toContain(response.status);
      await errorBody(response);
      const assessment = await getAssessment(await authenticatedRequest("http://localhost/api/assets/x/assessment"), { params: Promise.resolve({ tag }) });
      expect([400, 404]).toContain(assessment.status);
      await errorBody(assessment);
    }
  });
});

describe("GET /api/imports/{id} with any id", () => {
  it("answers 400 for anything but a whole number, 404 for an unknown one and 200 for a known one", async () => {
    await fc.assert(
      fc.asyncProperty(fc.oneof(fc.string({ maxLength: 20 }), fc.constantFrom("-1", "1e3", "0x10", "99999999999", "9999999999", "2147483648", "1.5", "NaN", "../1", "%00")), async (id) => {
        const response = await getBatch(await authenticatedRequest(`http://localhost/api/imports/x`), { params: Promise.resolve({ id }) });
        // an id of an import made by the tests above is found
        if (response.status === 200) {
          expect(id).toMatch(/^\d{1,10}$/);
          return;
        }
        expect([400, 404]).toContain(response.status);
        await errorBody(response);
      }),
      { numRuns: 200 },
    );
  });
});

describe("planner JSON bodies (POST /api/plan, POST /api/plan/bookings)", () => {
  it("answer a 4xx JSON error for malformed JSON and wrong types, never an exception", async () => {
    const body = fc.oneof(fc.string({ maxLength: 60 }), fc.constantFrom("{", "[", "null", "1", '"x"', '{"action":1}', '{"action":"move","tag":5,"week":"2026-13-45"}', '{"site":{"$ne":1}}', '{"scenario":"x".repeat}'), fc.jsonValue({ maxDepth: 3 }).map((json) => JSON.stringify(json) ?? ""));
    let answered = 0;
    await fc.assert(
      fc.asyncProperty(body, fc.boolean(), async (text, bookings) => {
        const request = await authenticatedRequest(`http://localhost/api/plan${bookings ? "/bookings" : ""}`, { method: "POST", body: text, headers: { "content-type": "application/json" }, role: "admin" });
        const response = bookings ? await postBookings(request, undefined) : await postPlan(request, undefined);
        answered += 1;
        if (response.status < 300) return;
        expect(response.status).toBeGreaterThanOrEqual(400);
        expect(response.status).toBeLessThan(500);
        await errorBody(response);
      }),
      { numRuns: 150 },
    );
    expect(answered).toBe(150);
  }, 120_000);
});
