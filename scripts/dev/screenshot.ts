// Saves full-page screenshots of app pages with Debian's Chromium, for reviewing
// the UI: `node --import tsx scripts/dev/screenshot.ts [--sign-in <email> <password>] <url> <out.png> [<url> <out.png> ...]`.
// With --sign-in, the browser first signs in on the first URL's /sign-in page (demo: engineer@brakwater.example foulcast-demo).
import { chromium } from "playwright-core";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";

let args = process.argv.slice(2);
let signIn: { email: string; password: string } | null = null;
if (args[0] === "--sign-in") {
  signIn = { email: args[1] ?? "", password: args[2] ?? "" };
  args = args.slice(3);
}
if (args.length === 0 || args.length % 2 !== 0 || (signIn && (!signIn.email || !signIn.password))) {
  console.error("Usage: screenshot.ts [--sign-in <email> <password>] <url> <out.png> [<url> <out.png> ...]");
  process.exit(2);
}
const profile = fs.mkdtempSync(path.join(os.tmpdir(), "foulcast-chromium-"));
const context = await chromium.launchPersistentContext(profile, {
  executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
  headless: true,
  viewport: { width: 1400, height: 900 },
  args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
});
try {
  const page = await context.newPage();
  if (signIn) {
    await page.goto(new URL("/sign-in", args[0]).toString(), { waitUntil: "networkidle" });
    await page.getByLabel("Email").fill(signIn.email);
    await page.getByLabel("Password").fill(signIn.password);
    await page.getByLabel("Password").press("Enter"); // the keyboard path: Enter submits the form
    await page.waitForURL((url) => url.pathname !== "/sign-in", { timeout: 15_000 });
    console.log(`signed in as ${signIn.email}`);
  }
  for (let index = 0; index < args.length; index += 2) {
    const url = args[index] ?? "";
    const out = args[index + 1] ?? "";
    await page.goto(url, { waitUntil: "networkidle" });
    await page.screenshot({ path: out, fullPage: true });
    console.log(`${url} -> ${out}`);
  }
} finally {
  await context.close();
  fs.rmSync(profile, { recursive: true, force: true });
}
