// Cross-site request forgery: a page on another site makes the browser send a state-changing request with the
// user's cookie. better-auth checks Origin on its own endpoints; our POST routes refuse foreign Origin and
// Sec-Fetch-Site (lib/auth/request-origin.ts). Server actions are covered by Next's own Origin/Host comparison.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { POST as authPost } from "../../app/api/auth/[...all]/route";
import { POST as importPost } from "../../app/api/assets/[tag]/readings/route";
import { crossSiteReason } from "../../lib/auth/request-origin";
import { sessionUser } from "../../lib/auth/session-user";
import { disconnectPrisma } from "../../lib/db";
import { cookieFromSetCookie, createSignedInUser, TEST_PASSWORD, type TestUser } from "../support/auth-session";
import { createTestDatabase, type TestDatabase } from "../support/test-database";
import { canonicalCsv, createTestAsset } from "../import/support/fixtures";

// authSettings() default with PORT unset: the app's own origin
const OWN = "http://localhost:3000";
const FOREIGN = "https://evil.example";

let database: TestDatabase;
let engineer: TestUser;

beforeAll(async () => {
  delete process.env.PORT;
  delete process.env.FOULCAST_BASE_URL;
  delete process.env.FOULCAST_TRUSTED_ORIGINS;
  database = await createTestDatabase();
  process.env.DATABASE_URL = database.url;
  await createTestAsset(database.prisma, "E-CSRF");
  engineer = await createSignedInUser(database.prisma, "engineer");
});

afterAll(async () => {
  await disconnectPrisma();
  await database.drop();
});

function signInRequest(headers: Record<string, string>) {
  return new Request(`${OWN}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { "content-type": "application/json", ...headers },
    body: JSON.stringify({ email: engineer.email, password: TEST_PASSWORD }),
  });
}

describe("better-auth endpoints", () => {
  it("sign a user in from the app's own origin", async () => {
    const response = await authPost(signInRequest({ origin: OWN, "sec-fetch-site": "same-origin", "sec-fetch-mode": "cors" }));
    expect(response.status).toBe(200);
    expect(await sessionUser(new Headers({ cookie: cookieFromSetCookie(response.headers) }))).toMatchObject({ email: engineer.email });
  });

  it("refuse a sign-in posted from a foreign origin, setting no cookie", async () => {
    const response = await authPost(signInRequest({ origin: FOREIGN, "sec-fetch-site": "cross-site", "sec-fetch-mode": "cors" }));
    expect(response.status).toBe(403);
    expect(response.headers.getSetCookie()).toEqual([]);
  });

  it("refuse a cross-site form navigation that would sign the victim in (login CSRF)", async () => {
    const response = await authPost(signInRequest({ origin: FOREIGN, "sec-fetch-site": "cross-site", "sec-fetch-mode": "navigate" }));
    expect(response.status).toBe(403);
  });

  it("refuse a sign-out posted from a foreign origin with the user's cookie: the session survives", async () => {
    const user = await createSignedInUser(database.prisma, "viewer");
    const response = await authPost(new Request(`${OWN}/api/auth/sign-out`, { method: "POST", headers: { cookie: user.cookie, origin: FOREIGN, "content-type": "application/json" }, body: "{}" }));
    expect(response.status).toBe(403);
    expect(await sessionUser(new Headers({ cookie: user.cookie }))).toMatchObject({ id: user.id });
  });
});

describe("POST /api/assets/{tag}/readings", () => {
  const post = (headers: Record<string, string>, day: number) =>
    importPost(
      new Request(`${OWN}/api/assets/E-CSRF/readings`, { method: "POST", headers: { cookie: engineer.cookie, "content-type": "text/csv", ...headers }, body: canonicalCsv(5, Date.UTC(2026, 0, day)) }),
      { params: Promise.resolve({ tag: "E-CSRF" }) },
    );
  const readings = () => database.prisma.reading.count();

  it("refuses a foreign Origin or a cross-site fetch even with a valid engineer's cookie, writing nothing", async () => {
    const before = await readings();
    const foreign = await post({ origin: FOREIGN }, 1);
    expect(foreign.status).toBe(403);
    expect(await foreign.json()).toEqual({ code: "forbidden", error: `cross-site request refused: origin ${FOREIGN} is not trusted (FOULCAST_BASE_URL, FOULCAST_TRUSTED_ORIGINS)` });
    const crossSite = await post({ "sec-fetch-site": "cross-site" }, 2);
    expect(crossSite.status).toBe(403);
    const sameSiteOtherOrigin = await post({ "sec-fetch-site": "same-site", origin: "http://reports.localhost:3000" }, 3);
    expect(sameSiteOtherOrigin.status).toBe(403);
    expect(await readings()).toBe(before);
  });

  it("accepts the app's own pages (same origin) and programs that send no Origin (curl with the cookie)", async () => {
    expect((await post({ origin: OWN, "sec-fetch-site": "same-origin" }, 4)).status).toBe(201);
    expect((await post({}, 5)).status).toBe(201);
  });
});

describe("crossSiteReason", () => {
  const trusted = [OWN, "http://127.0.0.1:3000"];
  it("lets same-origin, user-typed and header-less requests through", () => {
    expect(crossSiteReason(new Headers({ "sec-fetch-site": "same-origin", origin: OWN }), trusted)).toBeNull();
    expect(crossSiteReason(new Headers({ "sec-fetch-site": "none" }), trusted)).toBeNull();
    expect(crossSiteReason(new Headers({ origin: "http://127.0.0.1:3000" }), trusted)).toBeNull();
    expect(crossSiteReason(new Headers(), trusted)).toBeNull();
  });
  it("names why a request is refused", () => {
    expect(crossSiteReason(new Headers({ "sec-fetch-site": "cross-site" }), trusted)).toBe("cross-site request refused (Sec-Fetch-Site: cross-site)");
    // "null" is what a sandboxed frame or a redirect chain sends
    expect(crossSiteReason(new Headers({ origin: "null" }), trusted)).toBe("cross-site request refused: origin null is not trusted (FOULCAST_BASE_URL, FOULCAST_TRUSTED_ORIGINS)");
  });
});
