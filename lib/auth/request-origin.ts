// CSRF defence for our own state-changing route handlers (better-auth checks its
// own endpoints; Next compares Origin with Host for server actions).

/**
 * Why a state-changing request must be refused as cross-site, or null to let it through:
 * - `Sec-Fetch-Site` (sent by current browsers) must be "same-origin" or "none" (typed by the user);
 * - an `Origin` header must be one of the trusted origins (the same list as sign-in);
 * - a request with neither comes from a program (curl, a script), which a browser page cannot impersonate:
 *   it still needs a valid session cookie, so it is let through.
 */
export function crossSiteReason(headers: Headers, trustedOrigins: readonly string[]): string | null {
  const site = headers.get("sec-fetch-site");
  if (site && site !== "same-origin" && site !== "none") return `cross-site request refused (Sec-Fetch-Site: ${site})`;
  const origin = headers.get("origin");
  if (origin !== null && !trustedOrigins.includes(origin)) return `cross-site request refused: origin ${origin} is not trusted (FOULCAST_BASE_URL, FOULCAST_TRUSTED_ORIGINS)`;
  return null;
}

export const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);
