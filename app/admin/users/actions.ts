"use server";

import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { requireRole } from "@/lib/auth/require-role";
import { changeUserRole } from "@/lib/data/change-user-role";
import { createUser, UserAccountError } from "@/lib/data/create-user";
import { removeUser } from "@/lib/data/remove-user";
import { sessionCount, setUserPassword } from "@/lib/data/set-user-password";
import { getPrisma } from "@/lib/db";

function back(result: { saved?: string; error?: string }): never {
  revalidatePath("/admin/users");
  const query = new URLSearchParams(result.saved ? { saved: result.saved } : { error: result.error ?? "" });
  redirect(`/admin/users?${query.toString()}`);
}

/** Creates a user with a role and an initial password. Admins only. */
export async function createUserAction(formData: FormData): Promise<void> {
  const admin = await requireRole("users.manage");
  const field = (name: string) => String(formData.get(name) ?? "");
  try {
    const user = await createUser(getPrisma(), { email: field("email"), role: field("role"), password: field("password"), name: field("name") }, { userId: admin.id, name: admin.email });
    back({ saved: `Created ${user.email} (${user.role}).` });
  } catch (error) {
    if (!(error instanceof UserAccountError)) throw error;
    back({ error: error.message });
  }
}

/** Changes a user's role; refuses to remove the last admin. Admins only. */
export async function changeUserRoleAction(formData: FormData): Promise<void> {
  const admin = await requireRole("users.manage");
  try {
    const result = await changeUserRole(getPrisma(), String(formData.get("userId") ?? ""), String(formData.get("role") ?? ""), { userId: admin.id, name: admin.email });
    back({ saved: result.changed ? `${result.email} is now ${result.after}.` : `${result.email} already had the role ${result.after}.` });
  } catch (error) {
    if (!(error instanceof UserAccountError)) throw error;
    back({ error: error.message });
  }
}

/** Gives a user a new password and signs them out everywhere (all their sessions end). Admins only. */
export async function setUserPasswordAction(formData: FormData): Promise<void> {
  const admin = await requireRole("users.manage");
  try {
    const result = await setUserPassword(getPrisma(), String(formData.get("userId") ?? ""), String(formData.get("password") ?? ""), { userId: admin.id, name: admin.email });
    back({ saved: `Set a new password for ${result.email}; ${sessionCount(result.sessionsEnded)} ended.` });
  } catch (error) {
    if (!(error instanceof UserAccountError)) throw error;
    back({ error: error.message });
  }
}

/**
 * Removes a user with their sessions and sign-in accounts; the audit log keeps their events. Needs the row's
 * "confirm" box ticked (a confirmation that works without client JavaScript); refuses the caller's own account and
 * the only admin. Admins only.
 */
export async function removeUserAction(formData: FormData): Promise<void> {
  const admin = await requireRole("users.manage");
  if (formData.get("confirm") !== "yes") {
    // The email is the row's label, used for this message only; the user is identified by userId.
    const email = String(formData.get("email") ?? "").trim() || "the user";
    back({ error: `confirm: tick "confirm" beside ${email} to remove the account; nothing was removed` });
  }
  try {
    const result = await removeUser(getPrisma(), String(formData.get("userId") ?? ""), { userId: admin.id, name: admin.email });
    back({ saved: `Removed ${result.email} (${result.role}).` });
  } catch (error) {
    if (!(error instanceof UserAccountError)) throw error;
    back({ error: error.message });
  }
}
