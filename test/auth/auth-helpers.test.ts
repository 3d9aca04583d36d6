import { describe, expect, it } from "vitest";
import { authSettings } from "../../lib/auth/auth-settings";
import { safeNextPath } from "../../lib/auth/safe-next-path";
import { FAILURE_WINDOW_MS, MAX_FAILURES, SignInThrottle } from "../../lib/auth/sign-in-throttle";

describe("authSettings", () => {
  it("serves http://localhost:3000 by default and trusts the same port on 127.0.0.1, without Secure cookies", () => {
    expect(authSettings({})).toEqual({ baseUrl: "http://localhost:3000", trustedOrigins: ["http://localhost:3000", "http://127.0.0.1:3000"], secureCookies: false });
  });

  it("follows PORT, and a configured https base URL turns on Secure cookies", () => {
    expect(authSettings({ PORT: "3100" }).baseUrl).toBe("http://localhost:3100");
    const site = authSettings({ FOULCAST_BASE_URL: "https://foulcast.plant.example/", FOULCAST_TRUSTED_ORIGINS: "https://intranet.plant.example, https://other.example" });
    expect(site).toEqual({ baseUrl: "https://foulcast.plant.example", trustedOrigins: ["https://foulcast.plant.example", "https://intranet.plant.example", "https://other.example"], secureCookies: true });
  });

  it("names the setting that is not a URL", () => {
    expect(() => authSettings({ FOULCAST_BASE_URL: "foulcast.local" })).toThrow('FOULCAST_BASE_URL must be an http(s) URL such as https://foulcast.plant.example, got "foulcast.local"');
    expect(() => authSettings({ FOULCAST_TRUSTED_ORIGINS: "ftp://x.example" })).toThrow("FOULCAST_TRUSTED_ORIGINS must be an http(s) URL");
  });
});

describe("safeNextPath", () => {
  it("keeps local paths and refuses other sites, the sign-in page itself and the API", () => {
    expect(safeNextPath("/assets/E-1105?tab=alerts")).toBe("/assets/E-1105?tab=alerts");
    for (const value of ["//evil.example", "/\\evil.example", "https://evil.example", "javascript:alert(1)", "/sign-in?next=/", "/api/assets", undefined, 3]) expect(safeNextPath(value)).toBe("/");
  });
});

describe("SignInThrottle", () => {
  it(`refuses after ${MAX_FAILURES} failures in the window, until the oldest of them leaves it`, () => {
    let now = 0;
    const throttle = new SignInThrottle(() => now);
    for (let attempt = 0; attempt < MAX_FAILURES - 1; attempt++) {
      throttle.recordFailure("a@x.example");
      now += 1000;
    }
    expect(throttle.waitMs("a@x.example")).toBe(0);
    throttle.recordFailure("a@x.example");
    expect(throttle.waitMs("a@x.example")).toBe(FAILURE_WINDOW_MS - (MAX_FAILURES - 1) * 1000);
    expect(throttle.waitMs("b@x.example")).toBe(0);
    now = FAILURE_WINDOW_MS + 1;
    expect(throttle.waitMs("a@x.example")).toBe(0);
  });

  it("forgets failures after a successful sign-in", () => {
    const throttle = new SignInThrottle(() => 0);
    for (let attempt = 0; attempt < MAX_FAILURES; attempt++) throttle.recordFailure("a@x.example");
    expect(throttle.waitMs("a@x.example")).toBeGreaterThan(0);
    throttle.reset("a@x.example");
    expect(throttle.waitMs("a@x.example")).toBe(0);
  });
});
