// Saves full-page screenshots of app pages with Debian's Chromium, for reviewing
// the UI: `node --import tsx scripts/dev/screenshot.ts <url> <out.png> [<url> <out.png> ...]`.
import { chromium } from "playwright-core";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";

const args = process.argv.slice(2);
if (args.length === 0 || args.length % 2 !== 0) {
  console.error("Usage: screenshot.ts <url> <out.png> [<url> <out.png> ...]");
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
