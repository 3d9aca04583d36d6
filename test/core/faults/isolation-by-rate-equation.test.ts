import { describe, expect, it } from "vitest";
import { assessDataQuality } from "../../../lib/core/data-quality";
import { readingColumnsFromRows, type InstrumentRole } from "../../../lib/core/screening";
import { deriveSeed, simulateExchanger, type PlannedFault } from "../../../lib/core/simulate";
import { demoFleet } from "../../../lib/demo";
import { exchangerModelFromSpec } from "../data-quality/exchanger-model-from-spec";

const DAY_MS = 86_400_000;
const START_MS = Date.UTC(2025, 3, 1);
const FAULT_MS = Date.UTC(2025, 5, 20);
const END_MS = Date.UTC(2025, 7, 31);

function firstAlert(tag: string, role: InstrumentRole, size: number) {
  const asset = demoFleet().assets.find((candidate) => candidate.spec.tag === tag);
  if (asset === undefined) throw new Error(`no demo asset ${tag}`);
  const fault: PlannedFault = { role, kind: "bias", size, startMs: FAULT_MS, endMs: FAULT_MS + 30 * DAY_MS, description: "injected for the test" };
  const result = simulateExchanger(asset.spec, { ...asset.plan, faults: [fault] }, { start: START_MS, end: END_MS, seed: deriveSeed(11, `${tag}${role}bias`) });
  const alerts = assessDataQuality(readingColumnsFromRows(result.readings), exchangerModelFromSpec(asset.spec)).alerts.filter((alert) => alert.kind !== "spikes");
  return alerts[0];
}

describe("isolation of thermometers with equal energy-balance signatures", () => {
  // simulation with known truth: a 30-day offset injected into a demo exchanger; +b on an outlet and −b on the inlet
  // of the same stream change the energy balance alike, so only the rate equation can tell them apart
  it.each([
    ["E-1105", "coldIn", 2],
    ["E-1105", "coldOut", 2],
    ["E-2203", "coldIn", 2],
    ["E-2203", "coldOut", 2],
  ] as const)("%s: a %s offset of %s K is put on the right thermometer", (tag, role, size) => {
    const alert = firstAlert(tag, role, size);
    expect(alert?.role).toBe(role);
    expect(alert?.kind).toBe("bias");
    // stated bounds: named within 3 days (measured 0.6–1.5 days), size within 0.3 K (measured within 0.1 K), ended
    // within 1 day of the repair
    expect((alert?.detectedMs ?? Infinity) - FAULT_MS).toBeLessThanOrEqual(3 * DAY_MS);
    expect(Math.abs((alert?.size ?? 0) - size)).toBeLessThanOrEqual(0.3);
    expect(Math.abs((alert?.endMs ?? 0) - (FAULT_MS + 30 * DAY_MS))).toBeLessThanOrEqual(DAY_MS);
  });
});
