import Link from "next/link";
import { AccessDenied } from "@/app/_components/access-denied";
import { AssetForm, EMPTY_ASSET } from "@/app/_components/asset-form";
import { requireSignedInUser } from "@/lib/auth/current-user";
import { can } from "@/lib/auth/permissions";

export const dynamic = "force-dynamic";

export default async function NewAssetPage() {
  const user = await requireSignedInUser();
  if (!can(user.role, "assets.edit")) return <AccessDenied user={user} permission="assets.edit" />;
  return (
    <>
      <p className="subtle"><Link href="/">Fleet</Link> / New asset</p>
      <h1>Register an exchanger</h1>
      <p className="subtle">The same fields as a JSON asset file (see docs/asset-file.md); every field is checked before anything is saved.</p>
      <AssetForm mode="create" initial={EMPTY_ASSET} />
    </>
  );
}
