// Prints a page (by URL, with the caller's cookies) or an HTML document to PDF in headless Chromium (playwright-core).
import fs from "node:fs/promises";
import { chromium, type Browser } from "playwright-core";

export type Paper = "a4" | "letter";
export const PAPERS: readonly Paper[] = ["a4", "letter"];

/** Debian's Chromium; CHROMIUM_PATH overrides. */
export const DEFAULT_CHROMIUM_PATH = "/usr/bin/chromium";
/** Whole render (launch, load, print) must finish within this, ms. */
export const DEFAULT_PDF_TIMEOUT_MS = 60_000;
/** How long a loaded page may take to show `readySelector`, ms. */
const READY_WAIT_MS = 15_000;

/**
 * Launch flags: no sandbox (containers and root), no GPU, /tmp instead of a small /dev/shm, and no background
 * traffic (component updates, sync) that would otherwise knock on a closed network (STACK-NOTES, verified).
 */
const CHROMIUM_ARGS = [
  "--no-sandbox",
  "--disable-gpu",
  "--disable-dev-shm-usage",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

/** Chromium is not installed where expected. */
export class ChromiumUnavailableError extends Error {
  constructor(readonly executablePath: string) {
    super(`Chromium is not installed at ${executablePath}: install it (Debian: apt-get install chromium) or set CHROMIUM_PATH`);
    this.name = "ChromiumUnavailableError";
  }
}

/** The page could not be printed (timeout, error status, or it was not the expected page). */
export class PdfRenderError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "PdfRenderError";
  }
}

export interface RenderPdfOptions {
  /** What to print: a page URL (loaded with `cookies`) or a complete HTML document. */
  source: { url: string; cookies?: { name: string; value: string }[] } | { html: string };
  paper: Paper;
  /** A CSS selector that only the expected page has; printing waits until it is visible and refuses without it (e.g. after a redirect to sign-in). */
  readySelector?: string;
  /** How long a loaded page may take to show `readySelector`, ms [15,000]. */
  readyTimeoutMs?: number;
  /** Small grey footer: this text on the left, "page n of N" on the right. */
  footerText?: string;
  timeoutMs?: number;
  executablePath?: string;
}

export interface RenderedPdf {
  pdf: Buffer;
  /** Wall time of launch, load and print, ms. */
  elapsedMs: number;
}

/** The executable from CHROMIUM_PATH, or Debian's. */
export function chromiumPath(env: Record<string, string | undefined> = process.env): string {
  return env.CHROMIUM_PATH?.trim() || DEFAULT_CHROMIUM_PATH;
}

/**
 * requireChromium: the executable path when it exists and may be executed.
 *
 * @throws ChromiumUnavailableError otherwise
 */
export async function requireChromium(executablePath: string = chromiumPath()): Promise<string> {
  try {
    await fs.access(executablePath, fs.constants.X_OK);
  } catch {
    throw new ChromiumUnavailableError(executablePath);
  }
  return executablePath;
}

/** Cookie pairs of a Cookie request header ("a=1; b=2"); malformed pairs are skipped. */
export function parseCookieHeader(header: string | null): { name: string; value: string }[] {
  if (!header) return [];
  return header.split(";").flatMap((part) => {
    const index = part.indexOf("=");
    if (index <= 0) return [];
    const name = part.slice(0, index).trim();
    return name ? [{ name, value: part.slice(index + 1).trim() }] : [];
  });
}

function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (character) => `&#${character.charCodeAt(0)};`);
}

async function withTimeout<T>(work: Promise<T>, timeoutMs: number, what: string): Promise<T> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(new PdfRenderError(`${what} took longer than ${Math.round(timeoutMs / 1000)} s`)), timeoutMs);
  });
  try {
    return await Promise.race([work, timeout]);
  } finally {
    clearTimeout(timer);
  }
}

/**
 * renderPdf: one headless Chromium per call (closed afterwards, also on failure): loads the page, or sets the HTML,
 * waits until `readySelector` is visible (not only present in a hidden streaming template), and prints it with the
 * page's print styles on A4 or Letter, backgrounds included.
 * Cookies are set for the URL's origin only (host-only, path /); `__Secure-`/`__Host-` cookies keep their Secure flag.
 *
 * @throws ChromiumUnavailableError when the executable is missing; PdfRenderError on timeout, an HTTP error status
 *   or a page without `readySelector`
 */
export async function renderPdf(options: RenderPdfOptions): Promise<RenderedPdf> {
  const executablePath = await requireChromium(options.executablePath ?? chromiumPath());
  const started = performance.now();
  const timeoutMs = options.timeoutMs ?? DEFAULT_PDF_TIMEOUT_MS;
  let browser: Browser | undefined;
  let settled = false;
  const work = async (): Promise<Buffer> => {
    browser = await chromium.launch({ executablePath, headless: true, args: CHROMIUM_ARGS, timeout: timeoutMs });
    // a launch that outlived the timeout closes its own browser
    if (settled) await browser.close();
    // JavaScript stays on: a streamed page (a loading.tsx boundary) shows its content only after Next's inline
    // scripts move it out of the hidden streaming template.
    const context = await browser.newContext();
    const page = await context.newPage();
    page.setDefaultTimeout(timeoutMs);
    if ("url" in options.source) {
      const url = new URL(options.source.url);
      const cookies = options.source.cookies ?? [];
      if (cookies.length > 0) {
        await context.addCookies(
          cookies.map((cookie) => ({
            name: cookie.name,
            value: cookie.value,
            domain: url.hostname,
            path: "/",
            secure: url.protocol === "https:" || /^__(Secure|Host)-/.test(cookie.name),
            httpOnly: true,
            sameSite: "Lax" as const,
          })),
        );
      }
      const response = await page.goto(url.toString(), { waitUntil: "load" });
      if (response && response.status() >= 400) throw new PdfRenderError(`the page answered HTTP ${response.status()}`);
    } else {
      await page.setContent(options.source.html, { waitUntil: "load" });
    }
    const ready = options.readySelector
      ? await page
          .locator(options.readySelector)
          .first()
          .waitFor({ state: "visible", timeout: Math.min(timeoutMs, options.readyTimeoutMs ?? READY_WAIT_MS) })
          .then(() => true)
          .catch(() => false)
      : true;
    if (!ready) {
      const landed = new URL(page.url());
      const title = await page.title().catch(() => "");
      throw new PdfRenderError(
        landed.pathname.startsWith("/sign-in") ? "the page asked for a sign-in: the session did not reach it" : `the page "${title}" (${landed.href}) shows no ${options.readySelector}: it is not the expected page, or not finished`,
      );
    }
    const footer = options.footerText ?? "";
    return page.pdf({
      format: options.paper === "letter" ? "Letter" : "A4",
      printBackground: true,
      preferCSSPageSize: false,
      displayHeaderFooter: true,
      headerTemplate: "<span></span>",
      footerTemplate:
        `<div style="font: 7.5pt sans-serif; color: #555; width: 100%; padding: 0 14mm; display: flex; justify-content: space-between;">` +
        `<span>${escapeHtml(footer)}</span><span>page <span class="pageNumber"></span> of <span class="totalPages"></span></span></div>`,
      // margins that fit both papers (A4 is 210 mm wide, Letter 216 mm; A4 297 mm tall, Letter 279 mm)
      margin: { top: "14mm", bottom: "16mm", left: "14mm", right: "14mm" },
    });
  };
  try {
    const pdf = await withTimeout(work(), timeoutMs, "printing the report");
    return { pdf, elapsedMs: performance.now() - started };
  } finally {
    settled = true;
    await (browser as Browser | undefined)?.close().catch(() => undefined);
  }
}
