import { describe, expect, it } from "vitest";
import { memoizeRecent } from "../../lib/data/memoize-recent";

/** A computation the test finishes by hand, counting its calls. */
function controlled() {
  const calls: { key: string; resolve: (value: string) => void; reject: (error: Error) => void }[] = [];
  const compute = (key: string) => new Promise<string>((resolve, reject) => calls.push({ key, resolve, reject }));
  return { calls, compute };
}

describe("memoizeRecent", () => {
  it("lets concurrent calls for one key share one computation", async () => {
    const { calls, compute } = controlled();
    const cached = memoizeRecent(compute, { maxAgeMs: 1000, now: () => 0 });
    const first = cached("a");
    const second = cached("a");
    expect(calls).toHaveLength(1);
    calls[0]?.resolve("A1");
    expect(await Promise.all([first, second])).toEqual(["A1", "A1"]);
  });

  it("reuses a fresh result, refreshes in the background after half its age, and waits once it has expired", async () => {
    let clock = 0;
    const { calls, compute } = controlled();
    const cached = memoizeRecent(compute, { maxAgeMs: 1000, now: () => clock });
    const first = cached("a");
    calls[0]?.resolve("A1");
    await first;
    clock = 400;
    expect(await cached("a")).toBe("A1");
    expect(calls).toHaveLength(1);
    // older than half of maxAgeMs: the old result at once, and one refresh started
    clock = 600;
    expect(await cached("a")).toBe("A1");
    expect(await cached("a")).toBe("A1");
    expect(calls).toHaveLength(2);
    calls[1]?.resolve("A2");
    await Promise.resolve();
    await Promise.resolve();
    expect(await cached("a")).toBe("A2");
    // the refreshed result started at 600: expired at 1600, so a call then waits for a new computation
    clock = 1600;
    const late = cached("a");
    expect(calls).toHaveLength(3);
    calls[2]?.resolve("A3");
    expect(await late).toBe("A3");
  });

  it("keeps keys apart, does not cache failures, and computes every time with maxAgeMs 0", async () => {
    const { calls, compute } = controlled();
    const cached = memoizeRecent(compute, { maxAgeMs: 1000, now: () => 0 });
    const a = cached("a");
    const b = cached("b");
    expect(calls.map((call) => call.key)).toEqual(["a", "b"]);
    calls[0]?.reject(new Error("database gone"));
    calls[1]?.resolve("B1");
    await expect(a).rejects.toThrow("database gone");
    expect(await b).toBe("B1");
    const retried = cached("a");
    expect(calls).toHaveLength(3);
    calls[2]?.resolve("A1");
    expect(await retried).toBe("A1");

    const direct = controlled();
    const uncached = memoizeRecent(direct.compute, { maxAgeMs: 0 });
    void uncached("a");
    void uncached("a");
    expect(direct.calls).toHaveLength(2);
  });

  it("drops the oldest key beyond maxEntries", async () => {
    let clock = 0;
    let computed = 0;
    const cached = memoizeRecent(async (key) => `${key}${++computed}`, { maxAgeMs: 1000, maxEntries: 2, now: () => clock });
    await cached("a");
    clock = 1;
    await cached("b");
    clock = 2;
    await cached("c"); // "a" is dropped
    expect(await cached("b")).toBe("b2");
    expect(await cached("a")).toBe("a4");
  });
});
