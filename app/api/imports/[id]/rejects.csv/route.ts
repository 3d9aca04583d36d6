import { NextResponse } from "next/server";
import { withRole } from "@/lib/auth/with-role";
import { getImportBatch } from "@/lib/data/get-import-batch";
import { getPrisma } from "@/lib/db";
import { rejectsToCsv } from "@/lib/import/reject-report-csv";
import { attachmentDisposition } from "@/lib/present/attachment-disposition";

export const dynamic = "force-dynamic";

/**
 * GET /api/imports/{id}/rejects.csv: the reject report (line, reason) of an import as a CSV download, cells that
 * a spreadsheet would read as formulas neutralised (see lib/import/reject-report-csv.ts).
 */
export const GET = withRole("read", async (_request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const { id } = await params;
  if (!/^\d{1,10}$/.test(id)) return NextResponse.json({ error: "the import id must be a whole number", code: "bad-request" }, { status: 400 });
  const batch = await getImportBatch(getPrisma(), Number(id));
  if (!batch) return NextResponse.json({ error: `no import with id ${id}`, code: "not-found" }, { status: 404 });
  return new Response(rejectsToCsv(batch.rejects), {
    headers: {
      "Content-Type": "text/csv; charset=utf-8",
      "Content-Disposition": attachmentDisposition(`import-${batch.id}-rejects.csv`),
      "X-Content-Type-Options": "nosniff",
    },
  });
});
