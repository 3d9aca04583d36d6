// The sign-in form's server action, called as Next would call it (next/headers and redirect mocked).
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { signInAction, signOutAction } from "../../app/sign-in/actions";
import { MAX_FAILURES } from "../../lib/auth/sign-in-throttle";
import { disconnectPrisma } from "../../lib/db";
import { createSignedInUser, TEST_PASSWORD, type TestUser } from "../support/auth-session";
import { createTestDatabase, type TestDatabase } from "../support/test-database";

const request = vi.hoisted(() => ({ headers: new Headers() }));
vi.mock("next/headers", () => ({
  headers: async () => request.headers,
  cookies: async () => ({ get: () => undefined, getAll: () => [], set: () => undefined, delete: () => undefined }),
}));
vi.mock("next/navigation", async (original) => ({
  ...(await original<typeof import("next/navigation")>()),
  redirect: (url: string) => {
    throw Object.assign(new Error(`redirect to ${url}`), { redirectTo: url });
  },
}));

let database: TestDatabase;
let user: TestUser;

beforeAll(async () => {
  database = await createTestDatabase();
  process.env.DATABASE_URL = database.url;
  user = await createSignedInUser(database.prisma, "viewer");
});

afterAll(async () => {
  await disconnectPrisma();
  await database.drop();
});

function form(fields: Record<string, string>): FormData {
  const data = new FormData();
  for (const [key, value] of Object.entries(fields)) data.append(key, value);
  return data;
}
const empty = { error: null, email: "" };

describe("signInAction", () => {
  it("answers a wrong password with a plain message and keeps the email", async () => {
    request.headers = new Headers();
    expect(await signInAction(empty, form({ email: user.email, password: "nope-nope" }))).toEqual({ error: "The email or the password is wrong.", email: user.email });
    expect(await signInAction(empty, form({ email: "nobody@test.example", password: "nope-nope" }))).toEqual({ error: "The email or the password is wrong.", email: "nobody@test.example" });
    expect(await signInAction(empty, form({ email: user.email, password: "" }))).toEqual({ error: "Enter your password.", email: user.email });
  });

  it("signs in and goes to the requested local page, never to another site", async () => {
    const sessions = await database.prisma.session.count({ where: { userId: user.id } });
    await expect(signInAction(empty, form({ email: ` ${user.email.toUpperCase()} `, password: TEST_PASSWORD, next: "/assets/E-1105" }))).rejects.toMatchObject({ redirectTo: "/assets/E-1105" });
    expect(await database.prisma.session.count({ where: { userId: user.id } })).toBe(sessions + 1);
    await expect(signInAction(empty, form({ email: user.email, password: TEST_PASSWORD, next: "//evil.example" }))).rejects.toMatchObject({ redirectTo: "/" });
  });

  it(`blocks an email after ${MAX_FAILURES} wrong passwords, even with the right one`, async () => {
    const target = await createSignedInUser(database.prisma, "engineer");
    for (let attempt = 0; attempt < MAX_FAILURES; attempt++) await signInAction(empty, form({ email: target.email, password: "guess-guess" }));
    const blocked = await signInAction(empty, form({ email: target.email, password: TEST_PASSWORD }));
    expect(blocked.error).toBe(`Too many failed attempts for ${target.email}. Try again in 10 minutes.`);
  });
});

describe("signOutAction", () => {
  it("ends the session and goes to /sign-in", async () => {
    const other = await createSignedInUser(database.prisma, "planner");
    request.headers = new Headers({ cookie: other.cookie });
    await expect(signOutAction()).rejects.toMatchObject({ redirectTo: "/sign-in" });
    expect(await database.prisma.session.count({ where: { userId: other.id } })).toBe(0);
  });
});
