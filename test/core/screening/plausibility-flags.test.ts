import { describe, expect, it } from "vitest";
import { IMPOSSIBLE_CHECKS, plausibilityFlags, type InstrumentUncertainties, type ReadingColumns } from "../../../lib/core/screening";
import type { Arrangement } from "../../../lib/core/thermal";

const SIGMA: InstrumentUncertainties = {
  hotIn: 0.5,
  hotOut: 0.5,
  coldIn: 0.5,
  coldOut: 0.5,
  hotFlow: 0.02,
  coldFlow: 0.02,
  referenceFlows: { hotKgPerS: 10, coldKgPerS: 20 },
};

/** One-sample columns. */
function sample(hotIn: number, hotOut: number, coldIn: number, coldOut: number, hotFlow = 10, coldFlow = 20): ReadingColumns {
  const one = (value: number) => Float64Array.of(value);
  return { timeMs: one(0), hotInK: one(hotIn), hotOutK: one(hotOut), coldInK: one(coldIn), coldOutK: one(coldOut), hotFlowKgPerS: one(hotFlow), coldFlowKgPerS: one(coldFlow) };
}

function check(columns: ReadingColumns, arrangement: Arrangement = { kind: "counterflow" }): string | null {
  const result = plausibilityFlags(columns, arrangement, SIGMA);
  const code = result.code[0] as number;
  expect(result.impossible[0]).toBe(code > 0 ? 1 : 0);
  return code === 0 ? null : (IMPOSSIBLE_CHECKS[code - 1] as string);
}

describe("plausibilityFlags", () => {
  it("accepts a normal operating point", () => {
    // Kern ex. 7.3 terminals (FIELD-NOTES §1): valid for one shell
    expect(check(sample(663.15, 473.15, 373.15, 443.15), { kind: "shell-and-tube", shells: 1 })).toBeNull();
  });

  it("tolerates a hot stream that seems to warm by less than 3 combined σ, not by more", () => {
    // common practice: 3σ coverage; combined σ = √(0.5² + 0.5²) = 0.707 K, so 2 K passes and 2.2 K fails
    expect(check(sample(400, 402, 300, 320))).toBeNull();
    expect(check(sample(400, 402.2, 300, 320))).toBe("hot outlet above hot inlet");
    expect(check(sample(400, 350, 300, 297.7))).toBe("cold outlet below cold inlet");
  });

  it("rejects a hot inlet not above the cold inlet and a non-positive flow", () => {
    // second law: no heat flows from the colder to the warmer inlet
    expect(check(sample(300, 300, 300, 300))).toBe("hot inlet not above cold inlet");
    expect(check(sample(400, 350, 300, 320, 0))).toBe("non-positive flow or temperature");
  });

  it("rejects temperature crosses the arrangement cannot reach, beyond the measurement tolerance", () => {
    // Incropera et al. (2007), Sect. 11.3: in parallel flow the cold outlet stays below the hot outlet
    expect(check(sample(400, 330, 300, 340), { kind: "parallel" })).toBe("temperature cross for the arrangement");
    // within 3σ of touching (cold outlet 1 K above the hot outlet) is still accepted
    expect(check(sample(400, 331, 300, 332), { kind: "parallel" })).toBeNull();
    // FIELD-NOTES §1: one shell-and-tube shell cannot reach P = 0.9 at R = 1 (its limit is about 0.59)
    expect(check(sample(400, 310, 300, 390), { kind: "shell-and-tube", shells: 1 })).toBe("temperature cross for the arrangement");
    // counterflow can (a cross at the ends is the only limit)
    expect(check(sample(400, 310, 300, 390))).toBeNull();
  });

  it("does not judge samples with a missing value", () => {
    // definition: missing samples are "missing", not "impossible"
    expect(check(sample(400, Number.NaN, 300, 320))).toBeNull();
  });
});
