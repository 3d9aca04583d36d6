import { NextResponse } from "next/server";
import { withRole } from "@/lib/auth/with-role";
import { getImportBatch } from "@/lib/data/get-import-batch";
import { getPrisma } from "@/lib/db";

export const dynamic = "force-dynamic";

/** GET /api/imports/{id}: one import batch (status, counts, time span, rejects, options used); 404 when unknown. */
export const GET = withRole("read", async (_request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const { id } = await params;
  if (!/^\d{1,10}$/.test(id)) return NextResponse.json({ error: "the import id must be a whole number", code: "bad-request" }, { status: 400 });
  const batch = await getImportBatch(getPrisma(), Number(id));
  if (!batch) return NextResponse.json({ error: `no import with id ${id}`, code: "not-found" }, { status: 404 });
  return NextResponse.json(batch);
});
