import type { Metadata } from "next";
import Link from "next/link";
import type { ReactNode } from "react";
import { getCurrentUser } from "@/lib/auth/current-user";
import { can } from "@/lib/auth/permissions";
import { signOutAction } from "./sign-in/actions";
import "./globals.css";

export const metadata: Metadata = {
  title: "Foulcast",
  description: "Heat-exchanger fouling monitoring, forecasting and cleaning planning",
};

export default async function RootLayout({ children }: { children: ReactNode }) {
  const user = await getCurrentUser();
  return (
    <html lang="en">
      <body>
        <header className="topbar">
          <Link href="/" className="brand">Foulcast</Link>
          {user ? (
            <>
              <nav aria-label="Main">
                <Link href="/">Fleet</Link>
                <Link href="/plan">Cleaning plan</Link>
                <Link href="/reports">Reports</Link>
                {can(user.role, "audit.read") ? <Link href="/audit">Audit log</Link> : null}
                {can(user.role, "users.manage") ? <Link href="/admin/users">Users</Link> : null}
              </nav>
              <form action={signOutAction} className="account">
                <span>
                  <Link href="/account" title="Your account and units">{user.email}</Link> <span className="role">({user.role}, {user.unitSystem === "us" ? "US units" : "SI units"})</span>
                </span>
                <button type="submit">Sign out</button>
              </form>
            </>
          ) : null}
        </header>
        <main>{children}</main>
      </body>
    </html>
  );
}
