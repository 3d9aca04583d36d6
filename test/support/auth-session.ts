// Signed-in users for tests: an account made with createUser and a real
// better-auth session, returned as the Cookie header a browser would send.
// Point DATABASE_URL at the test database before calling (lib/db.ts reads it on first use).
import { randomBytes } from "node:crypto";
import type { PrismaClient } from "../../generated/prisma/client";
import { getAuth } from "../../lib/auth/auth";
import type { Role } from "../../lib/auth/permissions";
import { createUser } from "../../lib/data/create-user";

// A secret for this test process only, so tests never write .foulcast/auth-secret.
process.env.BETTER_AUTH_SECRET ??= randomBytes(32).toString("base64url");

export const TEST_PASSWORD = "correct horse battery";

export interface TestUser {
  id: string;
  email: string;
  role: Role;
  /** Cookie header value carrying the signed session token. */
  cookie: string;
}

/** The name=value pairs of Set-Cookie headers, joined as one Cookie header. */
export function cookieFromSetCookie(headers: Headers): string {
  return headers
    .getSetCookie()
    .map((line) => line.split(";")[0] ?? "")
    .filter((pair) => pair !== "" && !pair.endsWith("="))
    .join("; ");
}

/** Signs in through better-auth's API (the same check as the form and POST /api/auth/sign-in/email). */
export async function signIn(email: string, password = TEST_PASSWORD): Promise<string> {
  const { headers } = await getAuth().api.signInEmail({ body: { email, password }, returnHeaders: true });
  const cookie = cookieFromSetCookie(headers);
  if (!cookie.includes("session_token")) throw new Error(`signing in ${email} set no session cookie`);
  return cookie;
}

/** Creates a user with `role` (email <role>-<random>@test.example) and signs them in. */
export async function createSignedInUser(prisma: PrismaClient, role: Role): Promise<TestUser> {
  const email = `${role}-${randomBytes(3).toString("hex")}@test.example`;
  const user = await createUser(prisma, { email, role, password: TEST_PASSWORD }, { userId: null, name: "test" });
  return { id: user.id, email: user.email, role, cookie: await signIn(email) };
}
