// Browser tests: Debian's Chromium drives the production build the way the three kinds of users work.
// Skipped (with a message) when Chromium is not installed; .ci/run installs it. Screenshots of the main pages go
// to test-output/screenshots.
import fs from "node:fs";
import path from "node:path";
import { getDocument } from "pdfjs-dist/legacy/build/pdf.mjs";
import { chromium, type Browser, type Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PASSWORD, demoUserEmail } from "../../lib/data/seed-demo-users";
import { chromiumPath, startE2eApp, type E2eApp } from "./support/e2e-app";

const executablePath = chromiumPath();
if (!executablePath) {
  console.warn(
    process.env.FOULCAST_E2E === "0"
      ? "[e2e] browser tests turned off (FOULCAST_E2E=0)"
      : "[e2e] Chromium not found (set CHROMIUM_PATH, or apt-get install chromium): browser tests skipped",
  );
}
const SHOTS = path.join("test-output", "screenshots");

let app: E2eApp;
let browser: Browser;

beforeAll(async () => {
  if (!executablePath) return;
  fs.mkdirSync(SHOTS, { recursive: true });
  app = await startE2eApp();
  browser = await chromium.launch({ executablePath, headless: true, args: ["--no-sandbox", "--disable-gpu", "--disable-dev-shm-usage"] });
}, 900_000);

afterAll(async () => {
  await browser?.close();
  await app?.stop();
}, 60_000);

async function signedIn(role: "viewer" | "engineer" | "planner" | "admin"): Promise<Page> {
  const page = await browser.newPage({ viewport: { width: 1400, height: 900 } });
  page.setDefaultTimeout(90_000);
  await page.goto(`${app.baseUrl}/sign-in`);
  await page.getByLabel("Email").fill(demoUserEmail(role));
  await page.getByLabel("Password").fill(DEMO_PASSWORD);
  await page.getByRole("button", { name: /sign in/i }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
  return page;
}

async function shot(page: Page, name: string): Promise<void> {
  await page.screenshot({ path: path.join(SHOTS, `${name}.png`), fullPage: true });
}

describe.skipIf(!executablePath)("in a real browser", () => {
  it("sends strangers to the sign-in page, refuses a wrong password and signs a user in", async () => {
    const page = await browser.newPage();
    await page.goto(`${app.baseUrl}/plan`);
    expect(new URL(page.url()).pathname).toBe("/sign-in");
    await page.getByLabel("Email").fill(demoUserEmail("viewer"));
    await page.getByLabel("Password").fill("not-the-password");
    await page.getByRole("button", { name: /sign in/i }).click();
    await expect.poll(async () => (await page.locator("#sign-in-error").allInnerTexts()).join(" "), { timeout: 60_000 }).toMatch(/password is wrong/i);
    await shot(page, "sign-in");
    await page.close();
    const viewer = await signedIn("viewer");
    await expect.poll(() => viewer.locator("h1").first().innerText(), { timeout: 60_000 }).toMatch(/fleet/i);
    expect(await viewer.getByText(demoUserEmail("viewer")).count()).toBeGreaterThan(0);
    await shot(viewer, "fleet");
    // the fleet API through the real server: compressed once for a client that accepts gzip (the client inflates it)
    const fleet = await viewer.request.get(`${app.baseUrl}/api/fleet`, { headers: { "accept-encoding": "gzip" } });
    expect(fleet.headers()["content-encoding"]).toBe("gzip");
    expect(((await fleet.json()) as { count: number }).count).toBe(await app.database.prisma.asset.count());
    await viewer.close();
  }, 180_000);

  it("imports a CSV through the upload page and the asset's forecast moves on", async () => {
    // three more days of hourly data for E-1105: its own last three days, shifted past the end of the demo data
    const tag = "E-1105";
    const last = await app.database.prisma.reading.findMany({ where: { asset: { tag } }, orderBy: { time: "desc" }, take: 72 });
    const c = (kelvin: number | null) => (kelvin === null ? "" : (kelvin - 273.15).toFixed(3));
    const rows = last.reverse().map((reading) => [new Date(reading.time.getTime() + 72 * 3_600_000).toISOString(), c(reading.hotInK), c(reading.hotOutK), c(reading.coldInK), c(reading.coldOutK), reading.hotFlowKgPerS?.toFixed(4) ?? "", reading.coldFlowKgPerS?.toFixed(4) ?? ""].join(","));
    const csv = ["timestamp,hot_in_C,hot_out_C,cold_in_C,cold_out_C,hot_flow_kg_s,cold_flow_kg_s", ...rows].join("\n");
    const file = path.join("test-output", "e2e-import.csv");
    fs.writeFileSync(file, csv);
    const before = await app.database.prisma.assetAssessment.findFirstOrThrow({ where: { asset: { tag } } });

    const page = await signedIn("engineer");
    await page.goto(`${app.baseUrl}/assets/${tag}/import`);
    // The form reads the file once React has hydrated it: choose the file again until the preview offers the import.
    await expect
      .poll(async () => {
        await page.getByLabel(/CSV file/).setInputFiles(file);
        return page.getByRole("button", { name: /^Import e2e-import\.csv/ }).count();
      }, { timeout: 90_000, interval: 1_000 })
      .toBe(1);
    await page.getByRole("button", { name: /^Import e2e-import\.csv/ }).click();
    await expect.poll(() => page.locator("#import-result-heading").count(), { timeout: 180_000 }).toBe(1);
    const summary = await page.locator("dl.facts").first().innerText();
    expect(summary).toMatch(/New\s+72/);
    expect(summary).toMatch(/Rejected\s+0/);
    await shot(page, "import-result");

    // the reassessment follows the import (inline or through the job queue): wait for a newer assessment
    await expect
      .poll(async () => (await app.database.prisma.assetAssessment.findFirstOrThrow({ where: { asset: { tag } } })).asOf.getTime(), { timeout: 180_000, interval: 2_000 })
      .toBe(before.asOf.getTime() + 72 * 3_600_000);
    await page.goto(`${app.baseUrl}/assets/${tag}`);
    const asOf = await page.getByText(/as of/i).first().innerText();
    expect(asOf).toMatch(/2026-12-0[34]|Dec(ember)? 0?[34]/);
    await shot(page, "asset");
    await page.close();
  }, 420_000);

  it("lets a planner plan, move a cleaning and see the re-plan's changes; a viewer cannot", async () => {
    const viewer = await signedIn("viewer");
    await viewer.goto(`${app.baseUrl}/plan`);
    expect(await viewer.getByRole("button", { name: /plan again|make the first plan/i }).count()).toBe(0);
    await viewer.close();

    const page = await signedIn("planner");
    await page.goto(`${app.baseUrl}/plan`);
    await page.getByRole("button", { name: /make the first plan|plan again/i }).click();
    await page.waitForURL(/message=/, { timeout: 180_000 });
    await expect.poll(() => page.getByRole("figure").count(), { timeout: 60_000 }).toBe(1); // the timeline
    const firstRow = page.locator("table[aria-label='Planned cleanings'] tbody tr").first();
    const tag = (await firstRow.locator("td").nth(1).innerText()).trim();
    const start = (await firstRow.locator("td").first().innerText()).trim();
    const moved = new Date(Date.parse(`${start}T00:00:00Z`) + 21 * 86_400_000).toISOString().slice(0, 10);
    await firstRow.locator("input[name=week]").fill(moved);
    await firstRow.getByRole("button", { name: "Move" }).click();
    await page.waitForURL(/message=Booked/, { timeout: 180_000 });
    const changes = await page.locator("#changes").innerText();
    expect(changes).toContain(tag);
    expect(changes).toMatch(/Total cost [+−-]?[\d,]+ EUR/);
    const booked = page.locator(`#clean-${tag}-${moved}`);
    expect(await booked.locator("td").nth(2).innerText()).toBe("booked");
    await shot(page, "plan");
    // the plan exports as iCalendar
    const ics = await page.request.get(`${app.baseUrl}${await page.getByRole("link", { name: "iCalendar" }).getAttribute("href")}`);
    expect(ics.headers()["content-type"]).toMatch(/text\/calendar/);
    expect((await ics.text()).match(/BEGIN:VEVENT/g)?.length ?? 0).toBeGreaterThan(0);
    await page.close();
  }, 600_000);

  it("gives a manager the monthly condition summary on screen and as a server-made PDF", async () => {
    const page = await signedIn("viewer");
    await page.goto(`${app.baseUrl}/reports/monthly?site=BWH&month=2026-11`, { timeout: 180_000 });
    // The report streams in behind the loading state (React puts it in a hidden element first): wait for what is shown.
    await expect.poll(() => page.locator("main").innerText(), { timeout: 180_000 }).toMatch(/Monthly condition summary[\s\S]*(November 2026|2026-11)/);
    await shot(page, "monthly-report");
    const response = await page.request.get(`${app.baseUrl}/api/reports/monthly.pdf?site=BWH&month=2026-11&paper=a4`, { timeout: 240_000 });
    expect(response.status()).toBe(200);
    expect(response.headers()["content-type"]).toBe("application/pdf");
    const bytes = new Uint8Array(await response.body());
    // PDF 1.7 (ISO 32000-1) §7.5.2: a file starts with the header %PDF-
    expect(new TextDecoder().decode(bytes.subarray(0, 5))).toBe("%PDF-");
    const pdf = await getDocument({ data: bytes, useSystemFonts: true }).promise;
    expect(pdf.numPages).toBeGreaterThanOrEqual(1);
    expect(pdf.numPages).toBeLessThanOrEqual(10);
    let text = "";
    for (let number = 1; number <= pdf.numPages; number += 1) {
      const content = await (await pdf.getPage(number)).getTextContent();
      text += content.items.map((item) => ("str" in item ? item.str : "")).join(" ") + "\n";
    }
    expect(text).toContain("Brakwater Haven");
    for (const tag of ["E-1101", "E-1105", "E-2201"]) expect(text).toContain(tag);
    expect(text).toMatch(/permit/i); // the advisory caution is printed
    fs.writeFileSync(path.join("test-output", "monthly-report.pdf"), bytes);
    await page.close();
  }, 600_000);
});
