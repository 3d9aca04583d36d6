import { describe, expect, it } from "vitest";
import {
  foulingCostSummary,
  optimalCleaningInterval,
  sampledDutyLoss,
  type AssetEconomics,
} from "../../../lib/core/economics";
import { deepFreeze } from "./support";

describe("purity of the economics core", () => {
  it("evaluates frozen inputs without mutating them and repeats its answers", () => {
    // STYLE.md: tests freeze inputs to prove purity
    const economics: AssetEconomics = deepFreeze({
      energy: { fuelPricePerGJ: 8, heaterEfficiency: 0.85, co2KgPerGJFuel: 56.1, co2PricePerTonne: 80 },
      method: { name: "hydro-blast", cost: 30_000, outageDays: 4 },
      outageLostProductionPerDay: 2000,
      bypassDutyLossW: 2e6,
      throughputLimit: { dutyLossW: 1.5e6, lostProductionPerDay: 10_000 },
    });
    const series = deepFreeze({ elapsedDays: [0, 100, 400], dutyLossW: [0, 5e5, 2e6] });
    const forecast = sampledDutyLoss(series);
    const first = optimalCleaningInterval(economics, forecast);
    expect(optimalCleaningInterval(economics, forecast)).toEqual(first);
    const summary = foulingCostSummary(economics, forecast, deepFreeze({ elapsedDays: 50, projectionDays: [10, 20] }));
    expect(foulingCostSummary(economics, forecast, { elapsedDays: 50, projectionDays: [10, 20] })).toEqual(summary);
  });
});
