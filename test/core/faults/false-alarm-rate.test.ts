import { describe, expect, it } from "vitest";
import { assessDataQuality } from "../../../lib/core/data-quality";
import type { InstrumentAlert } from "../../../lib/core/faults";
import { readingColumnsFromRows } from "../../../lib/core/screening";
import { deriveSeed, simulateExchanger } from "../../../lib/core/simulate";
import { DEMO_END_MS, DEMO_START_MS, demoFleet } from "../../../lib/demo";
import { exchangerModelFromSpec } from "../data-quality/exchanger-model-from-spec";

const YEAR_MS = 365.25 * 86_400_000;

describe("instrument alerts on fault-free data", () => {
  it("stay below 0.5 per asset-year on the 24 demo exchangers without their faults (54 asset-years)", { timeout: 120_000 }, () => {
    let assetYears = 0;
    const alerts: (InstrumentAlert & { tag: string })[] = [];
    for (const asset of demoFleet().assets) {
      // simulation with known truth: the demo plans with no instrument faults and a seed of their own (spikes and
      // gaps still present)
      const plan = { ...asset.plan, faults: [] };
      const result = simulateExchanger(asset.spec, plan, { start: DEMO_START_MS, end: DEMO_END_MS, seed: deriveSeed(7, asset.spec.tag) });
      const assessment = assessDataQuality(readingColumnsFromRows(result.readings), exchangerModelFromSpec(asset.spec));
      assetYears += (DEMO_END_MS - DEMO_START_MS) / YEAR_MS;
      alerts.push(...assessment.alerts.map((alert) => ({ ...alert, tag: asset.spec.tag })));
    }
    const rate = alerts.length / assetYears;
    console.info(
      `false alerts: ${alerts.length} on ${assetYears.toFixed(1)} asset-years = ${rate.toFixed(3)} per asset-year` +
        (alerts.length > 0 ? `; ${alerts.map((alert) => `${alert.tag} ${alert.role} ${alert.kind}`).join(", ")}` : ""),
    );
    // brief: at most 0.5 false alerts per asset-year
    expect(rate).toBeLessThanOrEqual(0.5);
  });
});
