// The planner's JSON API called as route handlers with real sessions: roles, validation, files.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { GET as getPlan, POST as postPlan } from "../../app/api/plan/route";
import { POST as postBooking } from "../../app/api/plan/bookings/route";
import { GET as getCalendar, POST as postCalendar } from "../../app/api/plan/calendar/route";
import { GET as getExport } from "../../app/api/plan/runs/[id]/export/route";
import { GET as getEconomics } from "../../app/api/assets/[tag]/economics/route";
import { GET as getFleet } from "../../app/api/fleet/route";
import { refreshAssessment } from "../../lib/data/refresh-assessment";
import { refreshDataQuality } from "../../lib/data/refresh-data-quality";
import { seedDemoFleetIfEmpty } from "../../lib/data/seed-demo-fleet";
import { disconnectPrisma } from "../../lib/db";
import { createSignedInUser, type TestUser } from "../support/auth-session";
import { createTestDatabase, type TestDatabase } from "../support/test-database";

const OWN = "http://localhost:3000";
let database: TestDatabase;
let planner: TestUser;
let viewer: TestUser;

beforeAll(async () => {
  delete process.env.PORT;
  delete process.env.FOULCAST_BASE_URL;
  delete process.env.FOULCAST_TRUSTED_ORIGINS;
  database = await createTestDatabase();
  process.env.DATABASE_URL = database.url;
  await seedDemoFleetIfEmpty(database.prisma, { tags: ["E-1101", "E-1102"] });
  for (const tag of ["E-1101", "E-1102"]) {
    await refreshDataQuality(database.prisma, tag);
    await refreshAssessment(database.prisma, tag);
  }
  planner = await createSignedInUser(database.prisma, "planner");
  viewer = await createSignedInUser(database.prisma, "viewer");
}, 600_000);
afterAll(async () => {
  await disconnectPrisma();
  await database.drop();
});

function request(path: string, user: TestUser | null, init: { method?: string; body?: unknown } = {}): Request {
  const headers: Record<string, string> = { origin: OWN, "sec-fetch-site": "same-origin" };
  if (user) headers.cookie = user.cookie;
  if (init.body !== undefined) headers["content-type"] = "application/json";
  return new Request(`${OWN}${path}`, { method: init.method ?? "GET", headers, ...(init.body !== undefined ? { body: typeof init.body === "string" ? init.body : JSON.stringify(init.body) } : {}) });
}

describe("planner API", () => {
  it("answers 404 before the first plan, then plans for a planner (201) and refuses a viewer (403) and strangers (401)", async () => {
    expect((await getPlan(request("/api/plan", viewer), {})).status).toBe(404);
    expect((await postPlan(request("/api/plan", null, { method: "POST", body: {} }), {})).status).toBe(401);
    expect((await postPlan(request("/api/plan", viewer, { method: "POST", body: {} }), {})).status).toBe(403);
    expect(await database.prisma.planRun.count()).toBe(0);
    const created = await postPlan(request("/api/plan", planner, { method: "POST", body: {} }), {});
    expect(created.status).toBe(201);
    const document = (await created.json()) as { id: number; cleanings: unknown[]; advisory: string; site: { code: string } };
    expect(document.site.code).toBe("BWH");
    expect(document.advisory).toMatch(/permits/);
    const latest = await getPlan(request("/api/plan", viewer), {});
    expect(((await latest.json()) as { id: number }).id).toBe(document.id);
  }, 120_000);

  it("refuses malformed bodies with the field named, and changes nothing", async () => {
    const before = await database.prisma.planRun.count();
    const bad = await postPlan(request("/api/plan", planner, { method: "POST", body: { scenario: { fuelPriceFactor: -1 } } }), {});
    expect(bad.status).toBe(400);
    expect(((await bad.json()) as { error: string }).error).toMatch(/fuelPriceFactor/);
    const notJson = await postPlan(request("/api/plan", planner, { method: "POST", body: "{oops" }), {});
    expect(notJson.status).toBe(400);
    const huge = await postPlan(request("/api/plan", planner, { method: "POST", body: JSON.stringify({ site: "x".repeat(200_000) }) }), {});
    expect(huge.status).toBe(413);
    const unknownKey = await postPlan(request("/api/plan", planner, { method: "POST", body: { horizon: 3 } }), {});
    expect(unknownKey.status).toBe(400);
    const badWeek = await postBooking(request("/api/plan/bookings", planner, { method: "POST", body: { action: "move", tag: "E-1101", week: "next tuesday" } }), {});
    expect(badWeek.status).toBe(400);
    expect(((await badWeek.json()) as { error: string }).error).toMatch(/week/);
    const badWindow = await postCalendar(request("/api/plan/calendar", planner, { method: "POST", body: { action: "add-window", window: { kind: "holiday", name: "x", startDate: "2027-01-01", endDate: "2027-01-02" } } }), {});
    expect(badWindow.status).toBe(400);
    expect(((await badWindow.json()) as { error: string }).error).toMatch(/kind/);
    expect(await database.prisma.planRun.count()).toBe(before);
    expect(await database.prisma.cleaningBooking.count()).toBe(0);
    expect(await database.prisma.calendarWindow.count()).toBe(3); // the demo's own windows only
  });

  it("lets a planner book, and a viewer only read the calendar", async () => {
    const booked = await postBooking(request("/api/plan/bookings", planner, { method: "POST", body: { action: "accept", tags: [] } }), {});
    expect(booked.status).toBe(200);
    expect(((await booked.json()) as { booked: unknown[] }).booked.length).toBeGreaterThan(0);
    expect((await postBooking(request("/api/plan/bookings", viewer, { method: "POST", body: { action: "release", tag: "E-1101" } }), {})).status).toBe(403);
    const calendar = (await (await getCalendar(request("/api/plan/calendar", viewer), {})).json()) as { settings: { crewCapacity: number }; windows: unknown[] };
    expect(calendar.settings.crewCapacity).toBe(2);
    expect(calendar.windows).toHaveLength(3);
  });

  it("serves exports as attachments with their media types (RFC 5545 text/calendar, RFC 4180 text/csv)", async () => {
    const run = await database.prisma.planRun.findFirstOrThrow({ orderBy: { id: "desc" } });
    const context = { params: Promise.resolve({ id: String(run.id) }) };
    const ics = await getExport(request(`/api/plan/runs/${run.id}/export?format=ics`, viewer), context);
    expect(ics.headers.get("content-type")).toMatch(/^text\/calendar/);
    expect(ics.headers.get("content-disposition")).toMatch(/^attachment; filename="cleaning-plan-bwh-\d+\.ics"$/);
    const csv = await getExport(request(`/api/plan/runs/${run.id}/export?format=csv`, viewer), context);
    expect(csv.headers.get("content-type")).toMatch(/^text\/csv/);
    expect((await getExport(request(`/api/plan/runs/${run.id}/export?format=pdf`, viewer), context)).status).toBe(400);
  });

  it("returns an asset's economics and 404 for an unknown tag", async () => {
    const ok = await getEconomics(request("/api/assets/E-1101/economics", viewer), { params: Promise.resolve({ tag: "E-1101" }) });
    const body = (await ok.json()) as { costPerDay: number; optimalInterval: { intervalDays: number } };
    expect(body.costPerDay).toBeGreaterThan(0);
    expect(body.optimalInterval.intervalDays).toBeGreaterThan(0);
    expect((await getEconomics(request("/api/assets/E-0000/economics", viewer), { params: Promise.resolve({ tag: "E-0000" }) })).status).toBe(404);
  });

  it("serves the fleet rows at GET /api/fleet: trend line points only with trend=1, 304 for a known ETag", async () => {
    expect((await getFleet(request("/api/fleet", null), {})).status).toBe(401);
    const plain = await getFleet(request("/api/fleet?sort=tag", viewer), {});
    expect(plain.status).toBe(200);
    const body = (await plain.json()) as { count: number; rows: { tag: string; summary: { sparkline: unknown[]; foulingM2KPerW: number | null } | null }[] };
    expect(body.rows.map((row) => row.tag)).toEqual(["E-1101", "E-1102"]);
    expect(body.rows.every((row) => row.summary !== null && row.summary.sparkline.length === 0)).toBe(true);
    const withTrend = (await (await getFleet(request("/api/fleet?sort=tag&trend=1", viewer), {})).json()) as typeof body;
    expect(withTrend.rows.every((row) => (row.summary?.sparkline.length ?? 0) > 5)).toBe(true);
    expect(withTrend.rows.map((row) => row.summary?.foulingM2KPerW)).toEqual(body.rows.map((row) => row.summary?.foulingM2KPerW));
    const etag = plain.headers.get("etag") ?? "";
    const again = request("/api/fleet?sort=tag", viewer);
    again.headers.set("if-none-match", etag);
    expect((await getFleet(again, {})).status).toBe(304);
  });
});
