import { describe, expect, it } from "vitest";
import { assessDataQuality } from "../../../lib/core/data-quality";
import { readingColumnsFromRows } from "../../../lib/core/screening";
import { deriveSeed, simulateExchanger, type PlannedFault } from "../../../lib/core/simulate";
import { demoFleet } from "../../../lib/demo";
import { exchangerModelFromSpec } from "../data-quality/exchanger-model-from-spec";

const DAY_MS = 86_400_000;
const START_MS = Date.UTC(2025, 4, 15);
const FAULT_MS = Date.UTC(2025, 5, 20);
const END_MS = Date.UTC(2025, 6, 26);
const TAGS = ["E-1101", "E-1105", "E-2201", "E-2203", "E-2206", "E-3103"];
const FAULTS: Pick<PlannedFault, "role" | "kind" | "size" | "rampMs">[] = [
  { role: "hotIn", kind: "bias", size: 3 },
  { role: "hotOut", kind: "bias", size: -3 },
  { role: "coldIn", kind: "bias", size: 2 },
  { role: "coldOut", kind: "bias", size: 2 },
  { role: "hotFlow", kind: "scale", size: 0.06 },
  { role: "coldFlow", kind: "scale", size: -0.06 },
  { role: "coldOut", kind: "drift", size: 4, rampMs: 14 * DAY_MS },
];

describe("fault isolation study: 7 fault types on 6 demo exchangers of five arrangements", () => {
  it("detects nearly every fault and names most of them; the confusions are reported", { timeout: 120_000 }, () => {
    let detected = 0;
    let named = 0;
    const wrong: string[] = [];
    for (const asset of demoFleet().assets.filter((candidate) => TAGS.includes(candidate.spec.tag))) {
      for (const planned of FAULTS) {
        // simulation with known truth: one 30-day fault from 2025-06-20, seeds fixed per case
        const fault: PlannedFault = { ...planned, startMs: FAULT_MS, endMs: FAULT_MS + 30 * DAY_MS, description: "injected for the study" };
        const result = simulateExchanger(asset.spec, { ...asset.plan, faults: [fault] }, {
          start: START_MS,
          end: END_MS,
          seed: deriveSeed(11, `${asset.spec.tag}${fault.role}${fault.kind}`),
        });
        const alerts = assessDataQuality(readingColumnsFromRows(result.readings), exchangerModelFromSpec(asset.spec)).alerts.filter((alert) => alert.kind !== "spikes");
        const first = alerts[0];
        if (first !== undefined) detected += 1;
        if (first?.role === fault.role) named += 1;
        else wrong.push(`${asset.spec.tag} ${fault.role} ${fault.kind} → ${first === undefined ? "none" : `${first.role} ${first.kind}${first.evidence.includes("not clearly separated") ? " (flagged not clearly separated)" : ""}`}`);
      }
    }
    const total = TAGS.length * FAULTS.length;
    console.info(`isolation study: ${detected} of ${total} detected, ${named} named right; wrong: ${wrong.join("; ")}`);
    // simulation with known truth: measured 40 of 42 detected (±3 K on an E-1105 hot thermometer moves the balance by
    // only 0.4 σ, below the CUSUM's k = 0.5) and 22 of 42 named right; the bounds guard against regressions
    expect(detected).toBeGreaterThanOrEqual(38);
    expect(named).toBeGreaterThanOrEqual(20);
  });
});
