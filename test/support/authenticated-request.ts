// A request as a signed-in caller sends it, for calling route handlers (app/api/**/route.ts) directly in tests.
// The session belongs to a test user of the given role (default engineer, who may import), made once per
// database and role in the database DATABASE_URL names (set it to the test database first, as route tests do).
import { isRole, type Role } from "../../lib/auth/permissions";
import { getPrisma } from "../../lib/db";
import { createSignedInUser } from "./auth-session";

export interface AuthenticatedRequestInit extends RequestInit {
  /** Role of the test user the session belongs to: viewer, engineer (default), planner or admin. */
  role?: string;
}

const sessions = new Map<string, Promise<string>>();

/** The Cookie header of a signed-in test user of `role` in the current DATABASE_URL's database. */
export function sessionCookieFor(role: Role): Promise<string> {
  const key = `${process.env.DATABASE_URL ?? ""}|${role}`;
  let cookie = sessions.get(key);
  if (!cookie) {
    cookie = createSignedInUser(getPrisma(), role).then((user) => user.cookie);
    sessions.set(key, cookie);
  }
  return cookie;
}

/** `new Request(url, init)` with the test session's cookie attached; a streamed body gets `duplex: "half"`. */
export async function authenticatedRequest(url: string, init: AuthenticatedRequestInit = {}): Promise<Request> {
  const { role = "engineer", ...rest } = init;
  if (!isRole(role)) throw new Error(`authenticatedRequest: role must be viewer, engineer, planner or admin, got "${role}"`);
  const headers = new Headers(rest.headers);
  if (!headers.has("cookie")) headers.set("cookie", await sessionCookieFor(role));
  const streamed = rest.body instanceof ReadableStream;
  return new Request(url, { ...rest, headers, ...(streamed ? { duplex: "half" } : {}) } as RequestInit);
}
