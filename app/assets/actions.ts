"use server";

import { revalidatePath } from "next/cache";
import { AccessDenied, requireRole } from "@/lib/auth/require-role";
import { AssetRegisterError, createAsset, parseAssetFile, updateAsset } from "@/lib/data/save-asset";
import { getPrisma } from "@/lib/db";
import { AssetValidationError } from "@/lib/validation/asset";

export interface SaveAssetState {
  ok: boolean;
  problems: string[];
  tag?: string;
  message?: string;
}

/** Server action behind the asset form: validates the entry (same schema as asset files) and saves it. Engineers and admins. */
export async function saveAssetAction(mode: "create" | "update", json: string): Promise<SaveAssetState> {
  let user;
  try {
    user = await requireRole("assets.edit");
  } catch (error) {
    if (error instanceof AccessDenied) return { ok: false, problems: [error.message] };
    throw error;
  }
  let raw: unknown;
  try {
    raw = JSON.parse(json);
  } catch {
    return { ok: false, problems: ["the form sent malformed data; reload the page and try again"] };
  }
  try {
    const asset = parseAssetFile(raw);
    const save = mode === "create" ? createAsset : updateAsset;
    const result = await save(getPrisma(), asset, user.email, user.id);
    revalidatePath("/");
    revalidatePath(`/assets/${encodeURIComponent(asset.tag)}`);
    return {
      ok: true,
      problems: [],
      tag: asset.tag,
      message: result.action === "unchanged" ? "Nothing changed." : result.action === "created" ? "Asset created." : `Saved: ${result.changedFields.join(", ")} changed.`,
    };
  } catch (error) {
    if (error instanceof AssetValidationError) return { ok: false, problems: error.problems };
    if (error instanceof AssetRegisterError) return { ok: false, problems: [error.message] };
    throw error;
  }
}
