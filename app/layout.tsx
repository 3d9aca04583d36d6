import type { Metadata } from "next";
import Link from "next/link";
import type { ReactNode } from "react";
import "./globals.css";

export const metadata: Metadata = {
  title: "Foulcast",
  description: "Heat-exchanger fouling monitoring, forecasting and cleaning planning",
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en">
      <body>
        <header className="topbar">
          <Link href="/" className="brand">Foulcast</Link>
          <nav aria-label="Main">
            <Link href="/">Fleet</Link>
          </nav>
        </header>
        <main>{children}</main>
      </body>
    </html>
  );
}
