import { NextResponse } from "next/server";
import { withRole } from "@/lib/auth/with-role";
import { listAssets } from "@/lib/data/list-assets";
import { getPrisma } from "@/lib/db";

export const dynamic = "force-dynamic";

/** GET /api/assets: the asset register with a summary of each asset's data (SI units). Any signed-in user. */
export const GET = withRole("read", async () => NextResponse.json({ assets: await listAssets(getPrisma()) }));
