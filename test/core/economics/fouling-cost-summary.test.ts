import { describe, expect, it } from "vitest";
import {
  cleaningEventCost,
  EconomicsInputError,
  foulingCostBetween,
  foulingCostSummary,
  type AssetEconomics,
} from "../../../lib/core/economics";
import { forecastFromCostRate, relativeError, unitEconomics } from "./support";

describe("foulingCostSummary", () => {
  const forecast = forecastFromCostRate((t) => 50 * t);

  it("gives the cost now, the cycle cost so far and the projection for a linear loss", () => {
    // closed form for c = a·t, a = 50 per day²: c(10) = 500/d; ∫₀^10 = 2500; ∫₁₀^40 = 25·(1600 − 100) = 37500
    const summary = foulingCostSummary(unitEconomics(1000), forecast, { elapsedDays: 10, projectionDays: [0, 30] });
    expect(relativeError(summary.costPerDay, 500)).toBeLessThan(1e-12);
    expect(relativeError(summary.cycleCostToDate, 2500)).toBeLessThan(1e-10);
    const later = summary.projection[1];
    expect(later?.elapsedDays).toBe(40);
    expect(relativeError(later?.costPerDay ?? 0, 2000)).toBeLessThan(1e-12);
    expect(relativeError(later?.costFromNow ?? 0, 37_500)).toBeLessThan(1e-10);
    expect(relativeError(later?.cycleCostToDate ?? 0, 40_000)).toBeLessThan(1e-10);
    expect(summary.projection[0]?.costFromNow).toBe(0);
  });

  it("reports fuel and CO2 per day", () => {
    // furnace balance: 1 MW lost, η = 0.8 → 86.4 GJ/day / 0.8 = 108 GJ fuel/day; CO2 at 56.1 kg/GJ → 6.0588 t/day
    const economics: AssetEconomics = {
      energy: { fuelPricePerGJ: 8, heaterEfficiency: 0.8, co2KgPerGJFuel: 56.1, co2PricePerTonne: 80 },
      method: { name: "hydro-blast", cost: 1, outageDays: 1 },
      outageLostProductionPerDay: 0,
    };
    const summary = foulingCostSummary(economics, { dutyLossW: () => 1e6 }, { elapsedDays: 3 });
    expect(relativeError(summary.fuelGJPerDay, 108)).toBeLessThan(1e-12);
    expect(relativeError(summary.co2TonnesPerDay, 6.0588)).toBeLessThan(1e-12);
    // 108 GJ · 8 + 6.0588 t · 80 = 864 + 484.704 = 1348.704 per day
    expect(relativeError(summary.energyCostPerDay, 1348.704)).toBeLessThan(1e-12);
  });

  it("rejects a negative age with a message", () => {
    expect(() => foulingCostSummary(unitEconomics(1), forecast, { elapsedDays: -1 })).toThrow(
      new EconomicsInputError("elapsed days", "elapsed days must be a finite number >= 0, got -1"),
    );
  });
});

describe("foulingCostBetween", () => {
  it("charges lost production only after the loss crosses the throughput limit", () => {
    // closed form: c = 50·t + 1000·[t > 12]: ∫₁₀^20 = 25·(400 − 100) + 1000·8 = 15500
    const economics: AssetEconomics = {
      ...unitEconomics(1),
      throughputLimit: { dutyLossW: 600 / 86_400e-9, lostProductionPerDay: 1000 },
    };
    const cost = foulingCostBetween(economics, forecastFromCostRate((t) => 50 * t), 10, 20);
    expect(relativeError(cost, 15_500)).toBeLessThan(1e-7);
  });
});

describe("cleaningEventCost", () => {
  it("adds outage production loss and bypass energy for the charged outage days", () => {
    // hand calculation: 20000 + 3·(5000 + 1e6 W·86400 s·1e-9 per J) = 20000 + 3·5086.4 = 35259.2
    const economics: AssetEconomics = {
      ...unitEconomics(20_000, 3),
      outageLostProductionPerDay: 5000,
      bypassDutyLossW: 1e6,
    };
    expect(relativeError(cleaningEventCost(economics), 35_259.2)).toBeLessThan(1e-12);
    // inside a turnaround nothing of the outage is charged
    expect(cleaningEventCost(economics, 0)).toBe(20_000);
  });
});
