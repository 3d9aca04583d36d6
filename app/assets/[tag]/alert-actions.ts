"use server";

import { revalidatePath } from "next/cache";
import { requireRole } from "@/lib/auth/require-role";
import { acknowledgeAlert, AlertNotFoundError } from "@/lib/data/acknowledge-alert";
import { getPrisma } from "@/lib/db";

/** Acknowledges an instrument alert from the asset page. Engineers and admins. */
export async function acknowledgeAlertAction(formData: FormData): Promise<void> {
  const user = await requireRole("alerts.acknowledge");
  const id = Number(formData.get("alertId"));
  const tag = String(formData.get("tag") ?? "");
  const note = String(formData.get("note") ?? "").slice(0, 500);
  if (!Number.isInteger(id) || id < 1) throw new Error("alertId must be a positive whole number");
  try {
    await acknowledgeAlert(getPrisma(), id, user.email, note, user.id);
  } catch (error) {
    if (!(error instanceof AlertNotFoundError)) throw error;
  }
  revalidatePath(`/assets/${encodeURIComponent(tag)}`);
  revalidatePath("/");
}
