import Link from "next/link";
import { notFound } from "next/navigation";
import { AccessDenied } from "@/app/_components/access-denied";
import { ImportUploadForm } from "@/app/_components/import-upload-form";
import { requireSignedInUser } from "@/lib/auth/current-user";
import { can } from "@/lib/auth/permissions";
import { getImportContext } from "@/lib/data/get-import-context";
import { getPrisma } from "@/lib/db";
import { resolveImportLimits } from "@/lib/import/import-limits";

export const dynamic = "force-dynamic";

export default async function ImportPage({ params }: { params: Promise<{ tag: string }> }) {
  const user = await requireSignedInUser();
  if (!can(user.role, "data.import")) return <AccessDenied user={user} permission="data.import" />;
  const { tag } = await params;
  const context = await getImportContext(getPrisma(), decodeURIComponent(tag));
  if (!context) notFound();
  const { maxBytes } = resolveImportLimits();
  return (
    <>
      <p className="subtle">
        <Link href="/">Fleet</Link> / <Link href={`/assets/${encodeURIComponent(context.tag)}`}>{context.tag}</Link> / Import
      </p>
      <h1>Import operating data — {context.tag} {context.name}</h1>
      <p className="subtle">
        One row per time, one column per measurement: hot and cold inlet and outlet temperatures, both mass flows, and
        optionally the pressure drops. The whole file is imported or nothing is: rows already stored for the same time
        are updated when their values differ, and rows that cannot be read are listed with their line and the reason.
        Local times are read in {context.siteTimeZone} unless you choose another zone.
      </p>
      <ImportUploadForm assetTag={context.tag} siteTimeZone={context.siteTimeZone} savedMapping={context.savedMapping} maxBytes={maxBytes} />
    </>
  );
}
