"use server";

import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { requireRole } from "@/lib/auth/require-role";
import { changeUserRole } from "@/lib/data/change-user-role";
import { createUser, UserAccountError } from "@/lib/data/create-user";
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
