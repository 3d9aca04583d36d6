// The signed-in user of a request, read from its session cookie.
import { getAuth } from "./auth";
import { isRole, type Role } from "./permissions";

export interface SignedInUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  unitSystem: "si" | "us";
}

/**
 * The user whose valid session the cookie names, or null (no cookie, a forged or unknown token, an expired
 * session: better-auth checks the signature, then the session row and its expiresAt). The role is read from the
 * database on every request, so a role change applies at once.
 */
export async function sessionUser(headers: Headers): Promise<SignedInUser | null> {
  if (!headers.get("cookie")) return null;
  const session = await getAuth().api.getSession({ headers });
  if (!session) return null;
  const { id, email, name, role, unitSystem } = session.user;
  return { id, email, name, role: isRole(role) ? role : "viewer", unitSystem: unitSystem === "us" ? "us" : "si" };
}
