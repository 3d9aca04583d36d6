import Link from "next/link";
import { notFound } from "next/navigation";
import { AccessDenied } from "@/app/_components/access-denied";
import { AssetForm, type AssetDraft } from "@/app/_components/asset-form";
import { requireSignedInUser } from "@/lib/auth/current-user";
import { can } from "@/lib/auth/permissions";
import { exportAssetFile } from "@/lib/data/export-asset-file";
import { getPrisma } from "@/lib/db";

export const dynamic = "force-dynamic";

export default async function EditAssetPage({ params }: { params: Promise<{ tag: string }> }) {
  const user = await requireSignedInUser();
  if (!can(user.role, "assets.edit")) return <AccessDenied user={user} permission="assets.edit" />;
  const tag = decodeURIComponent((await params).tag);
  const file = await exportAssetFile(getPrisma(), tag);
  if (!file) notFound();
  // The exported document is already in the form's shape (quantities as { value, unit }).
  const draft: AssetDraft = file;
  return (
    <>
      <p className="subtle"><Link href="/">Fleet</Link> / <Link href={`/assets/${encodeURIComponent(tag)}`}>{tag}</Link> / Edit</p>
      <h1>Edit {tag}</h1>
      <p className="subtle">Changes are recorded in the asset&apos;s history with the values before and after.</p>
      <AssetForm mode="update" initial={draft} />
    </>
  );
}
