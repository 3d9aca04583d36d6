// Removing a user: the account, its sessions and sign-in accounts go; the audit events naming the user stay.
import { execFile } from "node:child_process";
import os from "node:os";
import { promisify } from "node:util";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sessionUser } from "../../lib/auth/session-user";
import { changeUserRole } from "../../lib/data/change-user-role";
import { createUser, UserAccountError } from "../../lib/data/create-user";
import { removeUser } from "../../lib/data/remove-user";
import { disconnectPrisma } from "../../lib/db";
import { createSignedInUser, signIn, TEST_PASSWORD, type TestUser } from "../support/auth-session";
import { createTestDatabase, type TestDatabase } from "../support/test-database";

let database: TestDatabase;
let admin: TestUser;
const byAdmin = () => ({ userId: admin.id, name: admin.email });
const headersWith = (cookie: string) => new Headers({ cookie });
const cliActor = { userId: null, name: "cli:test" };

/** Leaves `keep` as the only admin: every other admin becomes a viewer. */
async function makeOnlyAdmin(keep: string): Promise<void> {
  for (const other of await database.prisma.user.findMany({ where: { role: "admin", id: { not: keep } } })) {
    await changeUserRole(database.prisma, other.id, "viewer", cliActor);
  }
}

beforeAll(async () => {
  database = await createTestDatabase();
  process.env.DATABASE_URL = database.url;
  admin = await createSignedInUser(database.prisma, "admin");
});

afterAll(async () => {
  await disconnectPrisma();
  await database.drop();
});

describe("removeUser", () => {
  it("deletes the user with their sessions and accounts, so their cookie no longer resolves", async () => {
    const user = await createSignedInUser(database.prisma, "engineer");
    await signIn(user.email);
    // control: the rows exist and the cookie works before the removal
    expect(await database.prisma.session.count({ where: { userId: user.id } })).toBe(2);
    expect(await database.prisma.account.count({ where: { userId: user.id } })).toBe(1);
    expect(await sessionUser(headersWith(user.cookie))).toMatchObject({ id: user.id });
    const result = await removeUser(database.prisma, user.id, byAdmin());
    expect(result).toEqual({ email: user.email, role: "engineer", sessionsEnded: 2, accountsRemoved: 1 });
    expect(await database.prisma.user.count({ where: { id: user.id } })).toBe(0);
    expect(await database.prisma.session.count({ where: { userId: user.id } })).toBe(0);
    expect(await database.prisma.account.count({ where: { userId: user.id } })).toBe(0);
    expect(await sessionUser(headersWith(user.cookie))).toBeNull();
    await expect(signIn(user.email, TEST_PASSWORD)).rejects.toMatchObject({ status: "UNAUTHORIZED" });
    // the admin who removed them is untouched
    expect(await sessionUser(headersWith(admin.cookie))).toMatchObject({ id: admin.id });
  });

  it("keeps every audit event that names the user, unchanged", async () => {
    // an admin who leaves: events about them (create, sign-in) and by them (a role change they made)
    const leaver = await createSignedInUser(database.prisma, "admin");
    const colleague = await createUser(database.prisma, { email: "colleague@test.example", role: "viewer", password: TEST_PASSWORD }, { userId: null, name: "test" });
    await changeUserRole(database.prisma, colleague.id, "engineer", { userId: leaver.id, name: leaver.email });
    const naming = { OR: [{ userId: leaver.id }, { entityId: leaver.id }] };
    const before = await database.prisma.auditEvent.findMany({ where: naming, orderBy: { id: "asc" } });
    expect(before.map((event) => event.action)).toEqual(["user.create", "user.sign-in", "user.change-role"]);
    await removeUser(database.prisma, leaver.id, byAdmin());
    const after = await database.prisma.auditEvent.findMany({ where: naming, orderBy: { id: "asc" } });
    expect(after.slice(0, before.length)).toEqual(before);
    expect(after.map((event) => event.action)).toEqual(["user.create", "user.sign-in", "user.change-role", "user.remove"]);
  });

  it("writes a user.remove audit event naming the admin, the user and what was deleted", async () => {
    const user = await createSignedInUser(database.prisma, "planner");
    await removeUser(database.prisma, user.id, byAdmin());
    const event = await database.prisma.auditEvent.findFirstOrThrow({ orderBy: { id: "desc" } });
    expect(event).toMatchObject({
      action: "user.remove",
      entity: "user",
      entityId: user.id,
      actor: admin.email,
      userId: admin.id,
      summary: `removed user ${user.email} (planner)`,
      details: { email: user.email, role: "planner", sessionsEnded: 1, accountsRemoved: 1 },
    });
  });

  it("refuses to remove the caller's own account, changing nothing", async () => {
    // a second admin exists, so the refusal is about the account being the caller's own
    await createUser(database.prisma, { email: "other-admin@test.example", role: "admin", password: TEST_PASSWORD }, { userId: null, name: "test" });
    const eventsBefore = await database.prisma.auditEvent.count();
    await expect(removeUser(database.prisma, admin.id, byAdmin())).rejects.toThrow(new UserAccountError(`user: ${admin.email} is your own account; another admin must remove it`));
    expect(await database.prisma.user.count({ where: { id: admin.id } })).toBe(1);
    expect(await sessionUser(headersWith(admin.cookie))).toMatchObject({ id: admin.id });
    expect(await database.prisma.auditEvent.count()).toBe(eventsBefore);
  });

  it("refuses to remove the only admin, and allows it once there is another", async () => {
    const only = await createUser(database.prisma, { email: "only-admin@test.example", role: "admin", password: TEST_PASSWORD }, { userId: null, name: "test" });
    await makeOnlyAdmin(only.id);
    const eventsBefore = await database.prisma.auditEvent.count();
    await expect(removeUser(database.prisma, only.id, cliActor)).rejects.toThrow(new UserAccountError("user: only-admin@test.example is the only admin; make another user admin first"));
    expect(await database.prisma.user.count({ where: { id: only.id } })).toBe(1);
    expect(await database.prisma.auditEvent.count()).toBe(eventsBefore);
    await changeUserRole(database.prisma, admin.id, "admin", cliActor);
    await expect(removeUser(database.prisma, only.id, byAdmin())).resolves.toMatchObject({ email: "only-admin@test.example", role: "admin" });
  });

  it("lets only one of two admins remove the other when both try at once", async () => {
    const first = await createUser(database.prisma, { email: "first-admin@test.example", role: "admin", password: TEST_PASSWORD }, { userId: null, name: "test" });
    const second = await createUser(database.prisma, { email: "second-admin@test.example", role: "admin", password: TEST_PASSWORD }, { userId: null, name: "test" });
    await makeOnlyAdmin(first.id);
    await changeUserRole(database.prisma, second.id, "admin", cliActor);
    const outcomes = await Promise.allSettled([
      removeUser(database.prisma, second.id, { userId: first.id, name: first.email }),
      removeUser(database.prisma, first.id, { userId: second.id, name: second.email }),
    ]);
    expect(outcomes.map((outcome) => outcome.status).sort()).toEqual(["fulfilled", "rejected"]);
    const refusal = outcomes.find((outcome) => outcome.status === "rejected");
    expect(String(refusal?.reason)).toMatch(/^Error: user: (first|second)-admin@test\.example is the only admin; make another user admin first$/);
    expect(await database.prisma.user.count({ where: { role: "admin" } })).toBe(1);
  });

  it("refuses an unknown user, naming the id", async () => {
    await expect(removeUser(database.prisma, "no-such-user", byAdmin())).rejects.toThrow(new UserAccountError("user: no user with id no-such-user"));
  });
});

describe("npm run cli -- user remove", () => {
  it("removes the user named by email and audits as cli:<os user>", async () => {
    const user = await createSignedInUser(database.prisma, "viewer");
    const run = promisify(execFile);
    const { stdout } = await run(process.execPath, ["--import", "tsx", "scripts/cli.ts", "user", "remove", "--email", user.email], { env: { ...process.env, DATABASE_URL: database.url } });
    expect(stdout).toContain(`Removed ${user.email} (viewer); ended 1 session.`);
    expect(await database.prisma.user.count({ where: { id: user.id } })).toBe(0);
    expect(await sessionUser(headersWith(user.cookie))).toBeNull();
    const event = await database.prisma.auditEvent.findFirstOrThrow({ where: { action: "user.remove" }, orderBy: { id: "desc" } });
    expect(event).toMatchObject({ actor: `cli:${os.userInfo().username}`, userId: null, entityId: user.id });
  }, 60_000);

  it("refuses an unknown email with exit code 1", async () => {
    const run = promisify(execFile);
    const failure = await run(process.execPath, ["--import", "tsx", "scripts/cli.ts", "user", "remove", "--email", "Nobody@Test.Example"], { env: { ...process.env, DATABASE_URL: database.url } }).catch(
      (error: unknown) => error as { code: number; stderr: string },
    );
    expect(failure).toMatchObject({ code: 1 });
    expect((failure as { stderr: string }).stderr).toContain("no user with email nobody@test.example");
  }, 60_000);
});
