// Slows password guessing through the sign-in form: after 5 failed attempts for
// one email within 10 minutes, further attempts are refused until the window
// ends. (better-auth rate-limits its HTTP endpoint, 3 per 10 s per address, in
// production; a server action calls it directly, past that limiter.) Memory only,
// per process.
export const MAX_FAILURES = 5;
export const FAILURE_WINDOW_MS = 10 * 60 * 1000;

export class SignInThrottle {
  private readonly failures = new Map<string, number[]>();

  constructor(
    private readonly now: () => number = Date.now,
    private readonly maxFailures = MAX_FAILURES,
    private readonly windowMs = FAILURE_WINDOW_MS,
  ) {}

  private recent(key: string): number[] {
    const since = this.now() - this.windowMs;
    const kept = (this.failures.get(key) ?? []).filter((at) => at > since);
    if (kept.length === 0) this.failures.delete(key);
    else this.failures.set(key, kept);
    return kept;
  }

  /** Milliseconds until `key` may try again; 0 when it may now. */
  waitMs(key: string): number {
    const recent = this.recent(key);
    if (recent.length < this.maxFailures) return 0;
    return (recent[recent.length - this.maxFailures] ?? 0) + this.windowMs - this.now();
  }

  recordFailure(key: string): void {
    this.failures.set(key, [...this.recent(key), this.now()]);
  }

  reset(key: string): void {
    this.failures.delete(key);
  }
}

const globalForThrottle = globalThis as unknown as { foulcastSignInThrottle?: SignInThrottle };

export function signInThrottle(): SignInThrottle {
  globalForThrottle.foulcastSignInThrottle ??= new SignInThrottle();
  return globalForThrottle.foulcastSignInThrottle;
}
