// A small per-process cache for expensive reads that many callers ask for at once (the fleet API under load):
// concurrent calls for one key share one computation, and a result is reused while it is younger than maxAgeMs.

export interface MemoizeRecentOptions {
  /** Oldest result handed out, ms, counted from the start of the computation that made it; 0 turns caching off. */
  maxAgeMs: number;
  /** Keys kept; the oldest results are dropped beyond this (default 32). */
  maxEntries?: number;
  /** Clock, ms (tests). */
  now?: () => number;
}

interface Entry<T> {
  value?: { result: T; startedAt: number };
  pending?: Promise<T>;
}

/**
 * memoizeRecent: wraps `compute(key)` so that (1) calls while a computation for the key runs wait for it instead of
 * starting another (request coalescing), (2) a result younger than maxAgeMs is returned at once, and (3) a result
 * older than half of maxAgeMs is still returned while one refresh runs in the background, so a steady stream of
 * callers rarely waits and never sees a result older than maxAgeMs. Failures are not cached (the next call retries);
 * a failed background refresh leaves the older result until it expires.
 */
export function memoizeRecent<T>(compute: (key: string) => Promise<T>, options: MemoizeRecentOptions): (key: string) => Promise<T> {
  const now = options.now ?? Date.now;
  const maxEntries = options.maxEntries ?? 32;
  const entries = new Map<string, Entry<T>>();

  const start = (key: string, entry: Entry<T>): Promise<T> => {
    const startedAt = now();
    const pending = compute(key).then(
      (result) => {
        entry.value = { result, startedAt };
        if (entry.pending === pending) entry.pending = undefined;
        return result;
      },
      (error: unknown) => {
        if (entry.pending === pending) entry.pending = undefined;
        throw error;
      },
    );
    entry.pending = pending;
    if (!entries.has(key)) {
      entries.set(key, entry);
      if (entries.size > maxEntries) {
        const oldest = [...entries.entries()].filter(([, candidate]) => !candidate.pending).sort(([, a], [, b]) => (a.value?.startedAt ?? 0) - (b.value?.startedAt ?? 0))[0];
        if (oldest) entries.delete(oldest[0]);
      }
    }
    return pending;
  };

  return (key: string) => {
    if (options.maxAgeMs <= 0) return compute(key);
    const entry = entries.get(key) ?? {};
    const age = entry.value ? now() - entry.value.startedAt : Number.POSITIVE_INFINITY;
    if (entry.value && age < options.maxAgeMs) {
      if (age >= options.maxAgeMs / 2 && !entry.pending) start(key, entry).catch(() => undefined);
      return Promise.resolve(entry.value.result);
    }
    return entry.pending ?? start(key, entry);
  };
}
