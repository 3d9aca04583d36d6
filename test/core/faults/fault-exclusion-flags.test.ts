import { describe, expect, it } from "vitest";
import { faultExclusionFlags, type InstrumentAlert } from "../../../lib/core/faults";

const alert = (role: InstrumentAlert["role"], kind: InstrumentAlert["kind"], startMs: number, endMs: number | null): InstrumentAlert => ({
  role,
  instrumentTag: "",
  kind,
  startMs,
  endMs,
  detectedMs: startMs,
  size: 1,
  sizeUnit: "K",
  evidence: "",
});

describe("faultExclusionFlags", () => {
  const time = Float64Array.from({ length: 10 }, (_, index) => index * 10);

  it("marks samples from start to end (exclusive), or to the end of the data, earliest alert first, spikes left out", () => {
    const result = faultExclusionFlags(time, [alert("coldFlow", "stuck", 45, null), alert("coldOut", "drift", 20, 50), alert("hotIn", "spikes", 0, 100)]);
    expect(result.faultLabels).toEqual(["coldOut drift", "coldFlow stuck"]);
    // definition: [20, 50) → samples 2–4 label 1; [45, end) → samples 5–9 label 2
    expect(Array.from(result.fault)).toEqual([0, 0, 1, 1, 1, 2, 2, 2, 2, 2]);
    const withSpikes = faultExclusionFlags(time, [alert("hotIn", "spikes", 0, 100)], { kinds: ["spikes"] });
    expect(Array.from(withSpikes.fault).every((value) => value === 1)).toBe(true);
  });
});
