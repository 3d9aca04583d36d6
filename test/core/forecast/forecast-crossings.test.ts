import { describe, expect, it } from "vitest";
import { forecastCrossings } from "../../../lib/core/forecast";
import { seededRandom } from "../../../lib/core/simulate";
import { fitTrendModel } from "../../../lib/core/trend";

const DAY_MS = 86_400_000;

describe("forecastCrossings", () => {
  const days = Array.from({ length: 301 }, (_, day) => day);
  const exact = fitTrendModel("linear", { timeDays: days, foulingM2KPerW: days.map((day) => 1e-4 + 1e-6 * day) })!;
  const origin = Date.UTC(2025, 0, 1);
  const target = { criterion: "fouling-allowance" as const, critical: { foulingM2KPerW: 5e-4, status: "found" as const } };

  it("dates the crossing of an exact straight line (band of zero width)", () => {
    // exact data: Rf = 1e-4 + 1e-6·t reaches 5e-4 at t = 400 d; tolerance 1e-4 day (bisection) = 8.64 s
    const [forecast] = forecastCrossings({ targets: [target], fit: exact, cycleOriginMs: origin, asOfMs: origin + 300 * DAY_MS, horizonDays: 1826 });
    expect(forecast?.status).toBe("ahead");
    for (const ms of [forecast?.p10Ms, forecast?.p50Ms, forecast?.p90Ms]) expect(Math.abs((ms as number) - (origin + 400 * DAY_MS))).toBeLessThan(9000);
    expect(forecast?.p50).toBe(new Date(forecast?.p50Ms as number).toISOString());
  });

  it("reports an already-crossed limit with the date it crossed, and null beyond the horizon", () => {
    const [crossed] = forecastCrossings({ targets: [target], fit: exact, cycleOriginMs: origin, asOfMs: origin + 450 * DAY_MS, horizonDays: 1826 });
    expect(crossed?.status).toBe("already-crossed");
    expect(Math.abs((crossed?.crossedAtMs as number) - (origin + 400 * DAY_MS))).toBeLessThan(9000);
    const [far] = forecastCrossings({ targets: [target], fit: exact, cycleOriginMs: origin, asOfMs: origin + 300 * DAY_MS, horizonDays: 50 });
    expect(far?.status).toBe("beyond-horizon");
    expect([far?.p10, far?.p50, far?.p90]).toEqual([null, null, null]);
  });

  it("orders P10 ≤ P50 ≤ P90 for a noisy rising trend", () => {
    // simulation with known truth: same line plus σ = 2e-5 white noise
    const random = seededRandom(3);
    const noisy = fitTrendModel("linear", { timeDays: days, foulingM2KPerW: days.map((day) => 1e-4 + 1e-6 * day + 2e-5 * random.normal()) })!;
    const [forecast] = forecastCrossings({ targets: [target], fit: noisy, cycleOriginMs: origin, asOfMs: origin + 300 * DAY_MS, horizonDays: 1826 });
    expect((forecast?.p10Ms as number) < (forecast?.p50Ms as number)).toBe(true);
    expect((forecast?.p50Ms as number) < (forecast?.p90Ms as number)).toBe(true);
  });

  it("passes limit statuses through and says when there is no trend", () => {
    const [clean, never, noTrend] = forecastCrossings({
      targets: [
        { criterion: "duty", critical: { foulingM2KPerW: 0, status: "broken-when-clean" } },
        { criterion: "duty", critical: { foulingM2KPerW: null, status: "never-broken" } },
        target,
      ],
      fit: null,
      cycleOriginMs: origin,
      asOfMs: origin,
      horizonDays: 10,
    });
    expect([clean?.status, never?.status, noTrend?.status]).toEqual(["broken-when-clean", "never-broken", "no-trend"]);
  });
});
