import fs from "node:fs";
import path from "node:path";
import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";
import { proxy } from "../../proxy";
import { PATH_HEADER } from "../../lib/auth/path-header";

describe("proxy", () => {
  it("sends a visitor without a session cookie to /sign-in, remembering the page", () => {
    const response = proxy(new NextRequest("http://localhost:3000/assets/E-1105?tab=alerts"));
    expect(response.status).toBe(307);
    expect(response.headers.get("location")).toBe("http://localhost:3000/sign-in?next=%2Fassets%2FE-1105%3Ftab%3Dalerts");
    expect(proxy(new NextRequest("http://localhost:3000/")).headers.get("location")).toBe("http://localhost:3000/sign-in");
  });

  it("lets a request with a session cookie through and tells the page its path", () => {
    const response = proxy(new NextRequest("http://localhost:3000/audit?page=2", { headers: { cookie: "better-auth.session_token=abc.def" } }));
    expect(response.status).toBe(200);
    expect(response.headers.get("location")).toBeNull();
    // NextResponse.next({ request: { headers } }) passes overridden request headers as x-middleware-request-*
    expect(response.headers.get(`x-middleware-request-${PATH_HEADER}`)).toBe("/audit?page=2");
  });
});

describe("pages", () => {
  // proxy.ts only looks for a cookie; each page must check the session itself (a cookie can be stale or forged).
  const pages = fs
    .readdirSync("app", { recursive: true, withFileTypes: true })
    .filter((entry) => entry.isFile() && entry.name === "page.tsx")
    .map((entry) => path.join(entry.parentPath, entry.name).split(path.sep).join("/"));

  it.each(pages.filter((page) => page !== "app/sign-in/page.tsx"))("%s checks the signed-in user", (page) => {
    expect(fs.readFileSync(page, "utf8")).toMatch(/await requireSignedInUser\(\)/);
  });
});
