// The signed-in user for pages and layouts (server components).
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { PATH_HEADER } from "./path-header";
import { sessionUser, type SignedInUser } from "./session-user";

/** The signed-in user, or null. */
export async function getCurrentUser(): Promise<SignedInUser | null> {
  return sessionUser(await headers());
}

/** The signed-in user; an anonymous visitor (or an expired session) is sent to /sign-in?next=<this page>. */
export async function requireSignedInUser(): Promise<SignedInUser> {
  const requestHeaders = await headers();
  const user = await sessionUser(requestHeaders);
  if (!user) {
    const path = requestHeaders.get(PATH_HEADER);
    redirect(path && path !== "/" ? `/sign-in?next=${encodeURIComponent(path)}` : "/sign-in");
  }
  return user;
}
