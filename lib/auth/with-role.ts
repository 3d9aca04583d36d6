// Wraps a route handler so it runs only for a signed-in user with the permission.
import type { Permission } from "./permissions";
import { AccessDenied, requireRole } from "./require-role";
import type { SignedInUser } from "./session-user";

/**
 * `export const POST = withRole("data.import", async (request, context, user) => ...)`: answers 401/403 as JSON
 * ({ error, code }) before the handler runs, otherwise passes the user on.
 */
export function withRole<Context>(permission: Permission, handler: (request: Request, context: Context, user: SignedInUser) => Promise<Response>) {
  return async (request: Request, context: Context): Promise<Response> => {
    let user: SignedInUser;
    try {
      user = await requireRole(permission, request);
    } catch (error) {
      if (error instanceof AccessDenied) return error.toResponse();
      throw error;
    }
    return handler(request, context, user);
  };
}
