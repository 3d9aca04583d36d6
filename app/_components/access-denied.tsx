import Link from "next/link";
import { deniedMessage } from "@/lib/auth/require-role";
import type { Permission } from "@/lib/auth/permissions";
import type { SignedInUser } from "@/lib/auth/session-user";

/** Shown instead of a page the signed-in user's role does not allow. */
export function AccessDenied({ user, permission }: { user: SignedInUser; permission: Permission }) {
  return (
    <>
      <h1>Not allowed</h1>
      <p className="form-errors" role="alert">Signed in as {user.email}: {deniedMessage(user.role, permission)}. Ask an administrator to change your role.</p>
      <p><Link href="/">Back to the fleet</Link></p>
    </>
  );
}
