// Authorization for server actions and route handlers: the signed-in user with
// the permission, or an AccessDenied error (401 anonymous, 403 wrong role or cross-site).
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { authSettings } from "./auth-settings";
import { can, PERMISSIONS, type Permission } from "./permissions";
import { crossSiteReason, SAFE_METHODS } from "./request-origin";
import { sessionUser, type SignedInUser } from "./session-user";

export class AccessDenied extends Error {
  constructor(
    readonly status: 401 | 403,
    message: string,
  ) {
    super(message);
    this.name = "AccessDenied";
  }

  /** The JSON answer of a route handler: { error, code }. */
  toResponse(): Response {
    return Response.json({ error: this.message, code: this.status === 401 ? "unauthenticated" : "forbidden" }, { status: this.status });
  }
}

export function deniedMessage(role: string, permission: Permission): string {
  return `your role (${role}) does not allow ${permission}; it needs one of: ${PERMISSIONS[permission].join(", ")}`;
}

/**
 * The signed-in user if their role grants `permission`.
 * - With `request` (route handlers): throws AccessDenied 401 when no valid session, 403 for a role without the
 *   permission or a cross-site state-changing request (see request-origin.ts).
 * - Without (server actions): reads the request through next/headers; an anonymous caller is redirected to
 *   /sign-in, a role without the permission gets AccessDenied 403.
 */
export async function requireRole(permission: Permission, request?: Request): Promise<SignedInUser> {
  const requestHeaders = request ? request.headers : await headers();
  if (request && !SAFE_METHODS.has(request.method.toUpperCase())) {
    const reason = crossSiteReason(request.headers, authSettings().trustedOrigins);
    if (reason) throw new AccessDenied(403, reason);
  }
  const user = await sessionUser(requestHeaders);
  if (!user) {
    if (!request) redirect("/sign-in");
    throw new AccessDenied(401, "sign in first: send the session cookie from POST /api/auth/sign-in/email");
  }
  if (!can(user.role, permission)) throw new AccessDenied(403, deniedMessage(user.role, permission));
  return user;
}
