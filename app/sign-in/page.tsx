import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getCurrentUser } from "@/lib/auth/current-user";
import { safeNextPath } from "@/lib/auth/safe-next-path";
import { SignInForm } from "./sign-in-form";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Sign in — Foulcast" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string | string[] }> }) {
  const { next } = await searchParams;
  const target = safeNextPath(Array.isArray(next) ? next[0] : next);
  if (await getCurrentUser()) redirect(target);
  return (
    <>
      <h1>Sign in</h1>
      <p className="subtle">Use the account your site administrator gave you. A session ends after about 8 hours without use.</p>
      <SignInForm next={target} />
    </>
  );
}
