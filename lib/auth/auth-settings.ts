// Where the app is served and which origins may post to it, from the environment.
export interface AuthSettings {
  /** The URL users open, e.g. http://localhost:3000 or https://foulcast.plant.example */
  baseUrl: string;
  /** Origins allowed to send state-changing requests (sign-in, imports, actions). */
  trustedOrigins: string[];
  /** Cookies marked Secure (and named __Secure-…): when the base URL is https. */
  secureCookies: boolean;
}

/** Session lifetime: 8 hours, extended (sliding) at most once an hour while the user is active. */
export const SESSION_EXPIRES_IN_SECONDS = 8 * 60 * 60;
export const SESSION_UPDATE_AGE_SECONDS = 60 * 60;

type Environment = Readonly<Record<string, string | undefined>>;

function origin(text: string, name: string): string {
  try {
    const url = new URL(text);
    if (url.protocol !== "http:" && url.protocol !== "https:") throw new Error("not http");
    return url.origin;
  } catch {
    throw new Error(`${name} must be an http(s) URL such as https://foulcast.plant.example, got "${text}"`);
  }
}

/**
 * FOULCAST_BASE_URL (or BETTER_AUTH_URL) names the public URL; default http://localhost:$PORT (3000).
 * FOULCAST_TRUSTED_ORIGINS adds origins, comma-separated. With the default base URL, the same port on
 * 127.0.0.1 is trusted too.
 */
export function authSettings(env: Environment = process.env): AuthSettings {
  const port = env.PORT?.trim() || "3000";
  const configured = env.FOULCAST_BASE_URL?.trim() || env.BETTER_AUTH_URL?.trim();
  const baseUrl = configured ? origin(configured, env.FOULCAST_BASE_URL?.trim() ? "FOULCAST_BASE_URL" : "BETTER_AUTH_URL") : `http://localhost:${port}`;
  const extra = (env.FOULCAST_TRUSTED_ORIGINS ?? "")
    .split(",")
    .map((entry) => entry.trim())
    .filter((entry) => entry !== "")
    .map((entry) => origin(entry, "FOULCAST_TRUSTED_ORIGINS"));
  const local = configured ? [] : [`http://127.0.0.1:${port}`];
  return { baseUrl, trustedOrigins: [...new Set([baseUrl, ...local, ...extra])], secureCookies: baseUrl.startsWith("https://") };
}
