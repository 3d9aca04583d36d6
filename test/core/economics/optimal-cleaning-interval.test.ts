import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  averageCostRate,
  EconomicsInputError,
  foulingCostRate,
  optimalCleaningInterval,
  optimalCleaningMethod,
  type AssetEconomics,
} from "../../../lib/core/economics";
import { forecastFromCostRate, relativeError, unitEconomics, UNIT_PRICES } from "./support";

describe("optimalCleaningInterval", () => {
  it("matches the closed form for linear fouling with a linear loss", () => {
    // FIELD-NOTES §5 [C]: c = a·t, C = 10000, a = 50 per day² → τ* = sqrt(2C/a) = 20 d, J* = sqrt(2aC) = 1000 per day
    // (literature line Epstein; Ma & Epstein 1981, Can. J. Chem. Eng. 59:631; attribution from memory)
    const optimum = optimalCleaningInterval(unitEconomics(10_000), forecastFromCostRate((t) => 50 * t), {
      includeDowntime: false,
    });
    expect(optimum.status).toBe("optimum");
    expect(relativeError(optimum.intervalDays, 20)).toBeLessThan(1e-9);
    expect(relativeError(optimum.averageCostPerDay, 1000)).toBeLessThan(1e-12);
    expect(relativeError(optimum.costRateAtIntervalPerDay, 1000)).toBeLessThan(1e-9);
    expect(optimum.eventCost).toBe(10_000);
    // closed form: cycle fouling cost a·τ*²/2 = 10000
    expect(relativeError(optimum.cycleFoulingCost, 10_000)).toBeLessThan(1e-9);
  });

  it("matches the closed form with cleaning downtime", () => {
    // FIELD-NOTES §5 [C]: τ* = −τd + sqrt(τd² + 2C/a); τd = 5 d → τ* = −5 + sqrt(425) = 15.615528128088304 d,
    // J* = c(τ*) = 50·τ* = 780.7764064044152 per day (values from Python float arithmetic)
    const optimum = optimalCleaningInterval(unitEconomics(10_000, 5), forecastFromCostRate((t) => 50 * t));
    expect(optimum.downtimeDays).toBe(5);
    expect(relativeError(optimum.intervalDays, 15.615528128088304)).toBeLessThan(1e-9);
    expect(relativeError(optimum.averageCostPerDay, 780.7764064044152)).toBeLessThan(1e-12);
  });

  it("matches the asymptotic check values", () => {
    // FIELD-NOTES §5 [C]: c = b·Rf∞(1 − e^(−t/θ)), b·Rf∞ = 100 per day, θ = 30 d, C = 1000
    // → τ* = 35.665 d, J* = 69.542 per day (quoted to 3 decimals, hence the 5e-4 tolerance)
    const optimum = optimalCleaningInterval(
      unitEconomics(1000),
      forecastFromCostRate((t) => -100 * Math.expm1(-t / 30)),
      { includeDowntime: false },
    );
    expect(optimum.status).toBe("optimum");
    expect(Math.abs(optimum.intervalDays - 35.665)).toBeLessThan(5e-4);
    expect(Math.abs(optimum.averageCostPerDay - 69.542)).toBeLessThan(5e-4);
  });

  it("reports no optimum when cleaning never pays for asymptotic fouling", () => {
    // FIELD-NOTES §5 [C]: an optimum exists only if C < b·Rf∞·θ = 3000 here
    const optimum = optimalCleaningInterval(unitEconomics(3500), forecastFromCostRate((t) => -100 * Math.expm1(-t / 30)), {
      includeDowntime: false,
      maximumDays: 2000,
    });
    expect(optimum.status).toBe("no-optimum-within-maximum");
    expect(optimum.intervalDays).toBe(2000);
  });

  it("reports no optimum without fouling", () => {
    // definition: with c ≡ 0, J(τ) = C/τ falls for ever
    const optimum = optimalCleaningInterval(unitEconomics(1000), forecastFromCostRate(() => 0));
    expect(optimum.status).toBe("no-optimum-within-maximum");
  });

  it("satisfies the optimality condition c(τ*) = J(τ*) and beats its neighbours", () => {
    // FIELD-NOTES §5 [C]: at the optimum the loss rate equals the cycle-average cost, for any Rf(t)
    const curve = fc.oneof(
      fc.record({ kind: fc.constant("linear" as const), rate: fc.double({ min: 0.01, max: 500, noNaN: true }), offset: fc.double({ min: 0, max: 50, noNaN: true }) }),
      fc.record({ kind: fc.constant("asymptotic" as const), rate: fc.double({ min: 10, max: 1000, noNaN: true }), offset: fc.double({ min: 5, max: 200, noNaN: true }) }),
      fc.record({ kind: fc.constant("power" as const), rate: fc.double({ min: 1, max: 500, noNaN: true }), offset: fc.double({ min: 0.3, max: 0.9, noNaN: true }) }),
    );
    fc.assert(
      fc.property(curve, fc.double({ min: 100, max: 50_000, noNaN: true }), fc.double({ min: 0.5, max: 10, noNaN: true }), (shape, cleaningCost, outageDays) => {
        const rate =
          shape.kind === "linear"
            ? (t: number) => shape.offset + shape.rate * t
            : shape.kind === "asymptotic"
              ? (t: number) => -shape.rate * Math.expm1(-t / shape.offset)
              : (t: number) => shape.rate * Math.pow(t, shape.offset);
        const economics = unitEconomics(cleaningCost, outageDays);
        const forecast = forecastFromCostRate(rate);
        const optimum = optimalCleaningInterval(economics, forecast);
        if (optimum.status !== "optimum") return;
        expect(relativeError(optimum.costRateAtIntervalPerDay, optimum.averageCostPerDay)).toBeLessThan(1e-7);
        const j = (days: number) => averageCostRate(economics, forecast, days);
        expect(j(optimum.intervalDays * 0.99)).toBeGreaterThanOrEqual(optimum.averageCostPerDay * (1 - 1e-12));
        expect(j(optimum.intervalDays * 1.01)).toBeGreaterThanOrEqual(optimum.averageCostPerDay * (1 - 1e-12));
      }),
      { seed: 11, numRuns: 150 },
    );
  });

  it("puts the optimum at the throughput-limit jump when the penalty makes running on unprofitable", () => {
    // definition of J: with c = a·t + L·[t > t_limit] and L large, J is minimised at t_limit when t_limit < sqrt(2C/a)
    const economics: AssetEconomics = {
      ...unitEconomics(10_000),
      throughputLimit: { dutyLossW: (50 * 12) / 86_400e-9, lostProductionPerDay: 1e6 },
    };
    const forecast = forecastFromCostRate((t) => 50 * t);
    const optimum = optimalCleaningInterval(economics, forecast, { includeDowntime: false });
    expect(Math.abs(optimum.intervalDays - 12)).toBeLessThan(1e-6);
    // closed form at τ = 12: J = (10000 + 25·144)/12 = 1133.33…
    expect(relativeError(optimum.averageCostPerDay, 13_600 / 12)).toBeLessThan(1e-6);
    expect(foulingCostRate(economics, forecast.dutyLossW(12.001)).lostProductionPerDay).toBe(1e6);
  });

  it("rejects an empty search range with a message", () => {
    expect(() => optimalCleaningInterval(unitEconomics(1), forecastFromCostRate((t) => t), { minimumDays: 5, maximumDays: 5 })).toThrow(
      new EconomicsInputError("cycle search range", "cycle search range needs 0 < minimumDays < maximumDays < Infinity, got [5, 5] days"),
    );
    expect(() => optimalCleaningInterval({ ...unitEconomics(1), method: { name: "x", cost: 1, outageDays: 0 } }, forecastFromCostRate((t) => t))).toThrow(
      "outage duration must be a finite number > 0, got 0 days",
    );
  });
});

describe("averageCostRate", () => {
  it("is C/τ + a·τ/2 for a linear loss without downtime", () => {
    // closed form of J(τ) for c = a·t (FIELD-NOTES §5)
    const j = averageCostRate(unitEconomics(10_000), forecastFromCostRate((t) => 50 * t), 10, { includeDowntime: false });
    expect(relativeError(j, 1000 + 250)).toBeLessThan(1e-12);
  });
});

describe("optimalCleaningMethod", () => {
  it("prefers the method with the lower steady cost per day", () => {
    // closed form J* = sqrt(2aC) without downtime: C = 10000 → 1000/d, C = 2500 → 500/d (FIELD-NOTES §5 [C])
    const choice = optimalCleaningMethod(
      { energy: UNIT_PRICES, method: { name: "unused", cost: 0, outageDays: 1 }, outageLostProductionPerDay: 0 },
      [
        { name: "bundle pull", cost: 10_000, outageDays: 4 },
        { name: "online chemical", cost: 2_500, outageDays: 1 },
      ],
      forecastFromCostRate((t) => 50 * t),
      { includeDowntime: false },
    );
    expect(choice.best.method.name).toBe("online chemical");
    expect(relativeError(choice.best.interval.averageCostPerDay, 500)).toBeLessThan(1e-9);
    expect(relativeError((choice.methods[0]?.interval.averageCostPerDay ?? 0), 1000)).toBeLessThan(1e-9);
  });
});
