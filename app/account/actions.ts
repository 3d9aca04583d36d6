"use server";

import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { requireRole } from "@/lib/auth/require-role";
import { setUnitSystem } from "@/lib/data/set-unit-system";
import { getPrisma } from "@/lib/db";
import { isUnitSystem } from "@/lib/present/display-units";

/** Sets the signed-in user's own unit system (every role may; it changes only their own display). */
export async function setUnitSystemAction(formData: FormData): Promise<void> {
  const user = await requireRole("read");
  const unitSystem = formData.get("unitSystem");
  if (!isUnitSystem(unitSystem)) redirect("/account?error=choose+SI+or+US+customary");
  await setUnitSystem(getPrisma(), user, unitSystem);
  revalidatePath("/", "layout");
  redirect("/account?saved=1");
}
