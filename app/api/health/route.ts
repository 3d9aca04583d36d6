import { NextResponse } from "next/server";
import { getPrisma } from "@/lib/db";

export const dynamic = "force-dynamic";

/** GET /api/health: 200 when the database answers, 503 with the reason otherwise. */
export async function GET() {
  try {
    await getPrisma().$queryRaw`select 1`;
    return NextResponse.json({ status: "ok" });
  } catch (error) {
    return NextResponse.json({ status: "database-unavailable", message: (error as Error).message }, { status: 503 });
  }
}
