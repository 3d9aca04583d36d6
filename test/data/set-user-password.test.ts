// An admin's password reset: the new password signs in, the old one does not, and every session of the user ends.
import { execFile } from "node:child_process";
import os from "node:os";
import { promisify } from "node:util";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sessionUser } from "../../lib/auth/session-user";
import { createUser, MAX_PASSWORD_LENGTH, UserAccountError } from "../../lib/data/create-user";
import { setUserPassword } from "../../lib/data/set-user-password";
import { disconnectPrisma } from "../../lib/db";
import { createSignedInUser, signIn, TEST_PASSWORD, type TestUser } from "../support/auth-session";
import { createTestDatabase, type TestDatabase } from "../support/test-database";

let database: TestDatabase;
let admin: TestUser;
const NEW_PASSWORD = "a new and different password";
const byAdmin = () => ({ userId: admin.id, name: admin.email });
const headersWith = (cookie: string) => new Headers({ cookie });
const latestEvent = () => database.prisma.auditEvent.findFirstOrThrow({ orderBy: { id: "desc" } });
const credentialHash = async (userId: string) => (await database.prisma.account.findFirstOrThrow({ where: { userId, providerId: "credential" } })).password;

beforeAll(async () => {
  database = await createTestDatabase();
  process.env.DATABASE_URL = database.url;
  admin = await createSignedInUser(database.prisma, "admin");
});

afterAll(async () => {
  await disconnectPrisma();
  await database.drop();
});

describe("setUserPassword", () => {
  it("lets the user sign in with the new password and no longer with the old one", async () => {
    const user = await createSignedInUser(database.prisma, "engineer");
    await setUserPassword(database.prisma, user.id, NEW_PASSWORD, byAdmin());
    await expect(signIn(user.email, TEST_PASSWORD)).rejects.toMatchObject({ name: "APIError", status: "UNAUTHORIZED" });
    const cookie = await signIn(user.email, NEW_PASSWORD);
    expect(await sessionUser(headersWith(cookie))).toMatchObject({ id: user.id, email: user.email, role: "engineer" });
  });

  it("ends every session of that user at once (old cookies no longer resolve), and no one else's", async () => {
    const user = await createSignedInUser(database.prisma, "planner");
    const secondCookie = await signIn(user.email);
    const bystander = await createSignedInUser(database.prisma, "viewer");
    // control: both of the user's cookies work before the reset
    expect(await sessionUser(headersWith(user.cookie))).toMatchObject({ id: user.id });
    expect(await sessionUser(headersWith(secondCookie))).toMatchObject({ id: user.id });
    const result = await setUserPassword(database.prisma, user.id, NEW_PASSWORD, byAdmin());
    expect(result).toEqual({ email: user.email, sessionsEnded: 2 });
    expect(await sessionUser(headersWith(user.cookie))).toBeNull();
    expect(await sessionUser(headersWith(secondCookie))).toBeNull();
    expect(await database.prisma.session.count({ where: { userId: user.id } })).toBe(0);
    expect(await sessionUser(headersWith(bystander.cookie))).toMatchObject({ id: bystander.id });
  });

  it("writes a user.password-reset audit event naming the admin and the user, without the password or its hash", async () => {
    const user = await createSignedInUser(database.prisma, "viewer");
    await setUserPassword(database.prisma, user.id, NEW_PASSWORD, byAdmin());
    const event = await latestEvent();
    expect(event).toMatchObject({
      action: "user.password-reset",
      entity: "user",
      entityId: user.id,
      actor: admin.email,
      userId: admin.id,
      summary: `set a new password for ${user.email} and ended 1 session`,
      details: { email: user.email, sessionsEnded: 1 },
    });
    const stored = JSON.stringify(event);
    expect(stored).not.toContain(NEW_PASSWORD);
    expect(stored).not.toContain((await credentialHash(user.id)) ?? "no hash stored");
  });

  it("accepts the longest allowed password", async () => {
    const user = await createSignedInUser(database.prisma, "viewer");
    // MAX_PASSWORD_LENGTH (128) is better-auth's default maximum, which its sign-in applies too
    const longest = "p".repeat(MAX_PASSWORD_LENGTH);
    await setUserPassword(database.prisma, user.id, longest, byAdmin());
    expect(await sessionUser(headersWith(await signIn(user.email, longest)))).toMatchObject({ id: user.id });
  });

  it("refuses a password that is too short or too long, naming the field and changing nothing", async () => {
    const user = await createSignedInUser(database.prisma, "engineer");
    const hashBefore = await credentialHash(user.id);
    const eventsBefore = await database.prisma.auditEvent.count();
    await expect(setUserPassword(database.prisma, user.id, "1234567", byAdmin())).rejects.toThrow(new UserAccountError("password: must be at least 8 characters"));
    await expect(setUserPassword(database.prisma, user.id, "p".repeat(MAX_PASSWORD_LENGTH + 1), byAdmin())).rejects.toThrow(new UserAccountError("password: must be at most 128 characters"));
    expect(await credentialHash(user.id)).toBe(hashBefore);
    expect(await sessionUser(headersWith(user.cookie))).toMatchObject({ id: user.id });
    expect(await database.prisma.auditEvent.count()).toBe(eventsBefore);
  });

  it("refuses an unknown user, naming the id", async () => {
    await expect(setUserPassword(database.prisma, "no-such-user", NEW_PASSWORD, byAdmin())).rejects.toThrow(new UserAccountError("user: no user with id no-such-user"));
  });

  it("gives a user without an email-and-password account one, so they can sign in", async () => {
    const user = await createUser(database.prisma, { email: "no-credential@test.example", role: "viewer", password: TEST_PASSWORD }, { userId: null, name: "test" });
    await database.prisma.account.deleteMany({ where: { userId: user.id } });
    await expect(signIn(user.email, NEW_PASSWORD)).rejects.toMatchObject({ status: "UNAUTHORIZED" });
    await setUserPassword(database.prisma, user.id, NEW_PASSWORD, byAdmin());
    expect(await database.prisma.account.count({ where: { userId: user.id, providerId: "credential", accountId: user.id } })).toBe(1);
    expect(await sessionUser(headersWith(await signIn(user.email, NEW_PASSWORD)))).toMatchObject({ id: user.id });
  });
});

describe("npm run cli -- user password", () => {
  it("reads the new password from standard input, ends the sessions and audits as cli:<os user>", async () => {
    const user = await createSignedInUser(database.prisma, "engineer");
    const run = promisify(execFile);
    const child = run(process.execPath, ["--import", "tsx", "scripts/cli.ts", "user", "password", "--email", user.email.toUpperCase()], { env: { ...process.env, DATABASE_URL: database.url } });
    child.child.stdin?.end(`${NEW_PASSWORD}\n`);
    const { stdout } = await child;
    expect(stdout).toContain(`Set a new password for ${user.email}; ended 1 session.`);
    expect(await sessionUser(headersWith(user.cookie))).toBeNull();
    expect(await sessionUser(headersWith(await signIn(user.email, NEW_PASSWORD)))).toMatchObject({ id: user.id });
    const event = await database.prisma.auditEvent.findFirstOrThrow({ where: { action: "user.password-reset" }, orderBy: { id: "desc" } });
    expect(event).toMatchObject({ actor: `cli:${os.userInfo().username}`, userId: null, entityId: user.id });
  }, 60_000);

  it("refuses a short password with the field named and exit code 1", async () => {
    const run = promisify(execFile);
    const failure = await run(process.execPath, ["--import", "tsx", "scripts/cli.ts", "user", "password", "--email", admin.email, "--password", "short"], { env: { ...process.env, DATABASE_URL: database.url } }).catch(
      (error: unknown) => error as { code: number; stderr: string },
    );
    expect(failure).toMatchObject({ code: 1 });
    expect((failure as { stderr: string }).stderr).toContain("password: must be at least 8 characters");
  }, 60_000);
});
