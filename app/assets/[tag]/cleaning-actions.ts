"use server";

import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { requireRole } from "@/lib/auth/require-role";
import { CleaningRecordError, recordCleaning } from "@/lib/data/record-cleaning";
import { getPrisma } from "@/lib/db";

/**
 * Records a cleaning from the asset page. The asset is reassessed before the page reloads, or, when the web server has
 * a job queue (FOULCAST_QUEUE=on), queued for a worker; the page then says so. Engineers and admins.
 */
export async function recordCleaningAction(formData: FormData): Promise<void> {
  const user = await requireRole("cleanings.record");
  const tag = String(formData.get("tag") ?? "");
  const text = (name: string) => {
    const value = formData.get(name);
    return typeof value === "string" && value.trim() !== "" ? value.trim() : undefined;
  };
  const cost = text("cost");
  let error: string | null = null;
  let queued = false;
  try {
    queued = (await recordCleaning(getPrisma(), { tag, date: text("date"), endDate: text("endDate"), method: text("method") ?? "", cost: cost === undefined ? undefined : Number(cost), notes: text("notes") ?? "" }, user.email, user.id)).queued;
  } catch (caught) {
    if (!(caught instanceof CleaningRecordError)) throw caught;
    error = caught.message;
  }
  revalidatePath(`/assets/${encodeURIComponent(tag)}`);
  revalidatePath("/");
  redirect(`/assets/${encodeURIComponent(tag)}${error ? `?error=${encodeURIComponent(error)}` : `?saved=${queued ? "queued" : "1"}`}`);
}
