import { verifyPassword } from "better-auth/crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { GET as listAssetsRoute } from "../../app/api/assets/route";
import { getAuth } from "../../lib/auth/auth";
import { SESSION_EXPIRES_IN_SECONDS, SESSION_UPDATE_AGE_SECONDS } from "../../lib/auth/auth-settings";
import { AccessDenied, requireRole } from "../../lib/auth/require-role";
import { sessionUser, verifiedSessionToken } from "../../lib/auth/session-user";
import { changeUserRole } from "../../lib/data/change-user-role";
import { createUser, UserAccountError } from "../../lib/data/create-user";
import { disconnectPrisma } from "../../lib/db";
import { createSignedInUser, signIn, TEST_PASSWORD, type TestUser } from "../support/auth-session";
import { createTestDatabase, type TestDatabase } from "../support/test-database";

let database: TestDatabase;
let engineer: TestUser;

beforeAll(async () => {
  database = await createTestDatabase();
  process.env.DATABASE_URL = database.url;
  engineer = await createSignedInUser(database.prisma, "engineer");
});

afterAll(async () => {
  await disconnectPrisma();
  await database.drop();
});

const headersWith = (cookie: string) => new Headers({ cookie });
const apiRequest = (cookie: string) => new Request("http://localhost:3000/api/assets", { headers: { cookie } });

describe("passwords", () => {
  it("are stored as a salted scrypt hash that verifies, never as the plaintext", async () => {
    const account = await database.prisma.account.findFirstOrThrow({ where: { userId: engineer.id, providerId: "credential" } });
    expect(account.password).not.toBeNull();
    expect(account.password).not.toContain(TEST_PASSWORD);
    // better-auth's format (@better-auth/utils/password): 16-byte salt in hex, ":", 64-byte scrypt key in hex
    expect(account.password).toMatch(/^[0-9a-f]{32}:[0-9a-f]{128}$/);
    expect(await verifyPassword({ hash: account.password ?? "", password: TEST_PASSWORD })).toBe(true);
    expect(await verifyPassword({ hash: account.password ?? "", password: `${TEST_PASSWORD}!` })).toBe(false);
  });

  it("hash the same password differently for two users (salted)", async () => {
    const other = await createUser(database.prisma, { email: "salt@test.example", role: "viewer", password: TEST_PASSWORD }, { userId: null, name: "test" });
    const [first, second] = await Promise.all([engineer.id, other.id].map((userId) => database.prisma.account.findFirstOrThrow({ where: { userId } })));
    expect(first?.password).not.toBe(second?.password);
  });

  it("refuse a wrong password at sign-in", async () => {
    await expect(signIn(engineer.email, "not the password")).rejects.toMatchObject({ name: "APIError", status: "UNAUTHORIZED" });
  });

  it("must be 8 to 128 characters, and accounts need a known role and a fresh email", async () => {
    await expect(createUser(database.prisma, { email: "short@test.example", role: "viewer", password: "1234567" }, { userId: null, name: "test" })).rejects.toThrow(
      new UserAccountError("password: must be at least 8 characters"),
    );
    await expect(createUser(database.prisma, { email: "x@test.example", role: "root", password: "long enough" }, { userId: null, name: "test" })).rejects.toThrow(
      'role: must be one of viewer, engineer, planner, admin, got "root"',
    );
    await expect(createUser(database.prisma, { email: engineer.email.toUpperCase(), role: "viewer", password: "long enough" }, { userId: null, name: "test" })).rejects.toThrow(
      `email: a user ${engineer.email} already exists`,
    );
  });
});

describe("sessions", () => {
  it("identify the signed-in user and role from the cookie, and last 8 hours", async () => {
    const user = await sessionUser(headersWith(engineer.cookie));
    expect(user).toMatchObject({ id: engineer.id, email: engineer.email, role: "engineer" });
    const session = await database.prisma.session.findFirstOrThrow({ where: { userId: engineer.id }, orderBy: { createdAt: "desc" } });
    // SESSION_EXPIRES_IN_SECONDS = 8 h (README); one minute of slack for the test's own run time
    expect(Math.abs(session.expiresAt.getTime() - (Date.now() + SESSION_EXPIRES_IN_SECONDS * 1000))).toBeLessThan(60_000);
  });

  it("refuse a forged cookie (a real token with a wrong signature, or a made-up one)", async () => {
    const forged = engineer.cookie.replace(/\.[^.;]+$/, ".AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA%3D");
    expect(forged).not.toBe(engineer.cookie);
    expect(await sessionUser(headersWith(forged))).toBeNull();
    expect(await sessionUser(headersWith("better-auth.session_token=made-up"))).toBeNull();
  });

  it("are refused once expiresAt has passed, by pages, actions and the API alike", async () => {
    const user = await createSignedInUser(database.prisma, "engineer");
    expect((await listAssetsRoute(apiRequest(user.cookie), undefined)).status).toBe(200);
    await database.prisma.session.updateMany({ where: { userId: user.id }, data: { expiresAt: new Date(Date.now() - 1000) } });
    expect(await sessionUser(headersWith(user.cookie))).toBeNull();
    const response = await listAssetsRoute(apiRequest(user.cookie), undefined);
    expect(response.status).toBe(401);
    await expect(requireRole("read", apiRequest(user.cookie))).rejects.toMatchObject({ status: 401 });
  });

  it("are extended once an hour of their life has passed, and not written to before", async () => {
    const user = await createSignedInUser(database.prisma, "viewer");
    const fresh = await database.prisma.session.findFirstOrThrow({ where: { userId: user.id } });
    expect(await sessionUser(headersWith(user.cookie))).toMatchObject({ id: user.id });
    expect((await database.prisma.session.findFirstOrThrow({ where: { id: fresh.id } })).expiresAt).toEqual(fresh.expiresAt);
    // made 61 minutes ago: past SESSION_UPDATE_AGE_SECONDS (1 h), so the check slides expiresAt to now + 8 h
    const made = Date.now() - (SESSION_UPDATE_AGE_SECONDS + 60) * 1000;
    await database.prisma.session.update({ where: { id: fresh.id }, data: { expiresAt: new Date(made + SESSION_EXPIRES_IN_SECONDS * 1000) } });
    expect(await sessionUser(headersWith(user.cookie))).toMatchObject({ id: user.id, role: "viewer" });
    const slid = await database.prisma.session.findFirstOrThrow({ where: { id: fresh.id } });
    expect(Math.abs(slid.expiresAt.getTime() - (Date.now() + SESSION_EXPIRES_IN_SECONDS * 1000))).toBeLessThan(60_000);
  });

  it("end at sign-out: the token no longer works", async () => {
    const user = await createSignedInUser(database.prisma, "viewer");
    await getAuth().api.signOut({ headers: headersWith(user.cookie) });
    expect(await sessionUser(headersWith(user.cookie))).toBeNull();
    expect(await database.prisma.session.count({ where: { userId: user.id } })).toBe(0);
  });

  it("see a role change on the next request", async () => {
    const user = await createSignedInUser(database.prisma, "engineer");
    const request = () => new Request("http://localhost:3000/api/x", { method: "POST", headers: { cookie: user.cookie } });
    await expect(requireRole("data.import", request())).resolves.toMatchObject({ id: user.id });
    await changeUserRole(database.prisma, user.id, "viewer", { userId: null, name: "test" });
    const refused = await requireRole("data.import", request()).catch((error: unknown) => error);
    expect(refused).toBeInstanceOf(AccessDenied);
    expect(refused).toMatchObject({ status: 403, message: "your role (viewer) does not allow data.import; it needs one of: engineer, admin" });
  });
});

describe("verifiedSessionToken", () => {
  // RFC 4231 test case 2: HMAC-SHA-256 with key "Jefe" of "what do ya want for nothing?" is
  // 5bdcc146bf60754e6a042426089575c75a003f089d2739839dec58b964ec3843 (hex).
  const rfc4231Signature = Buffer.from("5bdcc146bf60754e6a042426089575c75a003f089d2739839dec58b964ec3843", "hex").toString("base64");

  it("accepts token.base64(HMAC-SHA-256(secret, token)) and nothing else", () => {
    expect(rfc4231Signature).toHaveLength(44);
    expect(verifiedSessionToken(`what do ya want for nothing?.${rfc4231Signature}`, "Jefe")).toBe("what do ya want for nothing?");
    expect(verifiedSessionToken(`what do ya want for nothing?.${rfc4231Signature}`, "jefe")).toBeNull();
    expect(verifiedSessionToken(`what do ya want for nothing!.${rfc4231Signature}`, "Jefe")).toBeNull();
    expect(verifiedSessionToken(`what do ya want for nothing?.${rfc4231Signature.slice(0, 43)}`, "Jefe")).toBeNull();
    expect(verifiedSessionToken(rfc4231Signature, "Jefe")).toBeNull();
    expect(verifiedSessionToken(undefined, "Jefe")).toBeNull();
  });

  it("accepts the cookie better-auth signs at sign-in", async () => {
    const value = decodeURIComponent(/session_token=([^;]+)/.exec(engineer.cookie)?.[1] ?? "");
    const token = verifiedSessionToken(value, (await getAuth().$context).secret);
    expect(token).not.toBeNull();
    expect(await database.prisma.session.count({ where: { token: token ?? "", userId: engineer.id } })).toBe(1);
  });
});

describe("changeUserRole", () => {
  it("refuses to demote the only admin, and allows it once there is another", async () => {
    const first = await createUser(database.prisma, { email: "only-admin@test.example", role: "admin", password: "long enough" }, { userId: null, name: "test" });
    // the test database may hold admins made by other tests in this file: demote them first
    for (const other of await database.prisma.user.findMany({ where: { role: "admin", id: { not: first.id } } })) {
      await changeUserRole(database.prisma, other.id, "viewer", { userId: null, name: "test" });
    }
    await expect(changeUserRole(database.prisma, first.id, "viewer", { userId: null, name: "test" })).rejects.toThrow("role: only-admin@test.example is the only admin; make another user admin first");
    const second = await createUser(database.prisma, { email: "second-admin@test.example", role: "admin", password: "long enough" }, { userId: null, name: "test" });
    await expect(changeUserRole(database.prisma, first.id, "planner", { userId: second.id, name: second.email })).resolves.toMatchObject({ before: "admin", after: "planner", changed: true });
  });
});
