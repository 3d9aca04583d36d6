// Next 16 proxy (formerly middleware): the cheap check only. A page request
// without a session cookie goes to /sign-in; pages, actions and API routes still
// check the session and the role themselves (lib/auth), since a cookie can be stale.
import { getSessionCookie } from "better-auth/cookies";
import { NextResponse, type NextRequest } from "next/server";
import { PATH_HEADER } from "./lib/auth/path-header";

export function proxy(request: NextRequest) {
  const path = `${request.nextUrl.pathname}${request.nextUrl.search}`;
  if (!getSessionCookie(request)) {
    const target = new URL("/sign-in", request.url);
    if (path !== "/") target.searchParams.set("next", path);
    return NextResponse.redirect(target);
  }
  // Tell the page which path was asked for, so an expired session can come back to it after signing in.
  const headers = new Headers(request.headers);
  headers.set(PATH_HEADER, path);
  return NextResponse.next({ request: { headers } });
}

export const config = {
  // Every page except the sign-in page; API routes answer 401 themselves; Next's assets and icons pass.
  matcher: ["/((?!api/|sign-in|_next/static|_next/image|favicon\\.ico|.*\\.(?:png|svg|ico|css|js)$).*)"],
};
