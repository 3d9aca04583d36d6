import Link from "next/link";
import { AssetForm, EMPTY_ASSET } from "@/app/_components/asset-form";

export const dynamic = "force-dynamic";

export default function NewAssetPage() {
  return (
    <>
      <p className="subtle"><Link href="/">Fleet</Link> / New asset</p>
      <h1>Register an exchanger</h1>
      <p className="subtle">The same fields as a JSON asset file (see docs/asset-file.md); every field is checked before anything is saved.</p>
      <AssetForm mode="create" initial={EMPTY_ASSET} />
    </>
  );
}
