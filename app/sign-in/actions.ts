"use server";

import { isAPIError } from "better-auth/api";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { getAuth } from "@/lib/auth/auth";
import { safeNextPath } from "@/lib/auth/safe-next-path";
import { signInThrottle } from "@/lib/auth/sign-in-throttle";
import { normaliseEmail } from "@/lib/data/create-user";

export interface SignInState {
  error: string | null;
  email: string;
}

/** The sign-in form: checks the password with better-auth, which sets the session cookie (nextCookies plugin). Public. */
export async function signInAction(_previous: SignInState, formData: FormData): Promise<SignInState> {
  const email = normaliseEmail(String(formData.get("email") ?? ""));
  const password = String(formData.get("password") ?? "");
  if (!email) return { error: "Enter your email address.", email };
  if (!password) return { error: "Enter your password.", email };
  const throttle = signInThrottle();
  const waitMs = throttle.waitMs(email);
  if (waitMs > 0) return { error: `Too many failed attempts for ${email}. Try again in ${Math.ceil(waitMs / 60_000)} minutes.`, email };
  try {
    await getAuth().api.signInEmail({ body: { email, password }, headers: await headers() });
  } catch (error) {
    // isAPIError, not instanceof: the error class may come from another copy of the library in the server bundle
    if (!isAPIError(error)) throw error;
    throttle.recordFailure(email);
    return { error: "The email or the password is wrong.", email };
  }
  throttle.reset(email);
  redirect(safeNextPath(formData.get("next")));
}

/** The sign-out button in the header: ends the session (row and cookie). Public. */
export async function signOutAction(): Promise<void> {
  try {
    await getAuth().api.signOut({ headers: await headers() });
  } catch (error) {
    if (!isAPIError(error)) throw error;
  }
  redirect("/sign-in");
}
