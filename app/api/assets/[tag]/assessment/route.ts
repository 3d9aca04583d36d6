import { NextResponse } from "next/server";
import { withRole } from "@/lib/auth/with-role";
import { assessmentDocument } from "@/lib/data/assessment-document";
import { getPrisma } from "@/lib/db";
import { badPathParameterMessage, pathParameter } from "@/lib/validation/path-parameter";

export const dynamic = "force-dynamic";

/**
 * GET /api/assets/{tag}/assessment[?detail=1]: the asset's fouling assessment (README, "Assessment JSON").
 * 404 for an unknown tag, 409 when the asset has no usable screened data yet.
 */
export const GET = withRole("read", async (request: Request, { params }: { params: Promise<{ tag: string }> }) => {
  const segment = (await params).tag;
  const tag = pathParameter(segment);
  if (tag === null) return NextResponse.json({ error: badPathParameterMessage("asset tag", segment) }, { status: 400 });
  const detail = new URL(request.url).searchParams.get("detail") === "1";
  const lookup = await assessmentDocument(getPrisma(), tag, { detail });
  if (lookup.kind === "unknown-asset") return NextResponse.json({ error: `unknown asset ${tag}` }, { status: 404 });
  if (lookup.kind === "no-usable-data") return NextResponse.json({ error: `${tag} has no usable screened data to assess yet` }, { status: 409 });
  return NextResponse.json(lookup.document);
});
