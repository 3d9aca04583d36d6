import { NextResponse } from "next/server";
import { listAssets } from "@/lib/data/list-assets";
import { getPrisma } from "@/lib/db";

export const dynamic = "force-dynamic";

/** GET /api/assets: the asset register with a summary of each asset's data (SI units). */
export async function GET() {
  return NextResponse.json({ assets: await listAssets(getPrisma()) });
}
