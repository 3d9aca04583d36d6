import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  effectivenessFromNTU,
  maximumEffectiveness,
  ntuFromEffectiveness,
  ThermalInputError,
} from "../../../lib/core/thermal";
import { FLOW_KINDS } from "./flow-kinds";
import { relativeError } from "./relative-error";

describe("ntuFromEffectiveness", () => {
  it("inverts the counterflow relation at Cr = 1 exactly", () => {
    // NTU = ε/(1 − ε) at Cr = 1, Incropera 6e Table 11.4; ε = 0.9 ↔ NTU = 9 [FIELD-NOTES §2, V]
    expect(relativeError(ntuFromEffectiveness(0.9, 1, "counterflow"), 9)).toBeLessThan(1e-14);
  });

  it.each([
    // inverse of the CalebBell/ht doctest values at NTU = 5, Cr = 0.7 [FIELD-NOTES §2, V]
    { flow: "parallel" as const, effectiveness: 0.5881156068417585 },
    // same source
    { flow: "counterflow" as const, effectiveness: 0.920670368605 },
    // same source
    { flow: { shells: 1 }, effectiveness: 0.683497704431 },
    // same source
    { flow: { shells: 50 }, effectiveness: 0.920505870278 },
    // same source (Triboix 2009 exact)
    { flow: "crossflow-unmixed" as const, effectiveness: 0.8444821799748551 },
    // same source
    { flow: "crossflow-cmin-mixed" as const, effectiveness: 0.7497843941508544 },
    // same source
    { flow: "crossflow-cmax-mixed" as const, effectiveness: 0.7158099831204696 },
  ])("recovers NTU = 5 from the published ε at Cr = 0.7 ($flow)", ({ flow, effectiveness }) => {
    // tolerance: 12-digit published ε, amplified by 1/(dε/dNTU), which is largest (≈ 3e3) for 50 shells
    expect(relativeError(ntuFromEffectiveness(effectiveness, 0.7, flow), 5)).toBeLessThan(1e-7);
  });

  it.each(FLOW_KINDS)("round-trips effectivenessFromNTU over a grid of NTU and Cr ($name)", ({ flow }) => {
    // inverse relations of Incropera 6e Table 11.4 against the forward ones of Table 11.3 (closed forms; Brent for
    // unmixed crossflow); the grid stays where ε is not within rounding of its limit
    for (const capacityRatio of [0, 0.1, 0.5, 0.9, 0.999999, 1]) {
      for (const ntu of [1e-6, 0.01, 0.3, 1, 2, 5, 10]) {
        const effectiveness = effectivenessFromNTU(ntu, capacityRatio, flow);
        expect(relativeError(ntuFromEffectiveness(effectiveness, capacityRatio, flow), ntu)).toBeLessThan(1e-8);
      }
    }
  });

  it.each(FLOW_KINDS)("round-trips random NTU and Cr ($name)", ({ flow }) => {
    // same relations; property test over NTU in [1e-4, 8]
    fc.assert(
      fc.property(
        fc.double({ min: 1e-4, max: 8, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (ntu, capacityRatio) => {
          const effectiveness = effectivenessFromNTU(ntu, capacityRatio, flow);
          return relativeError(ntuFromEffectiveness(effectiveness, capacityRatio, flow), ntu) < 1e-7;
        },
      ),
      { numRuns: 60 },
    );
  });

  it("returns 0 for zero effectiveness", () => {
    // NTU = 0 ↔ ε = 0 for every relation (Incropera 6e Table 11.4)
    expect(ntuFromEffectiveness(0, 0.4, "crossflow-unmixed")).toBe(0);
  });

  it.each(FLOW_KINDS)("rejects an effectiveness at or above the limit as exceeding it ($name)", ({ flow, inMessages }) => {
    const limit = maximumEffectiveness(0.8, flow);
    try {
      ntuFromEffectiveness(Math.min(limit, 1), 0.8, flow);
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(ThermalInputError);
      expect((error as ThermalInputError).reason).toBe("exceeds-limit");
      expect((error as Error).message).toContain(`(the infinite-area limit for ${inMessages} at capacity ratio 0.8)`);
    }
  });

  it("names the parallel-flow limit in the message", () => {
    // parallel flow cannot pass 1/(1 + Cr) = 0.5 at Cr = 1 (Incropera 6e Table 11.3 as NTU → ∞)
    expect(() => ntuFromEffectiveness(0.6, 1, "parallel")).toThrow(
      "effectiveness must be below 0.5 (the infinite-area limit for parallel at capacity ratio 1), got 0.6",
    );
  });

  it("names the shell limit in the message", () => {
    // one shell at Cr = 1: 2/(2 + √2) = 0.58578643762690495 (Incropera 6e Table 11.3 as NTU → ∞)
    expect(() => ntuFromEffectiveness(0.6, 1, { shells: 1 })).toThrow(
      /^effectiveness must be below 0\.58578643762690\d* \(the infinite-area limit for 1 shell at capacity ratio 1\), got 0\.6$/,
    );
  });

  it("rejects an unmixed-crossflow effectiveness that needs more than the supported NTU", () => {
    // 1 − ε ≈ 1/√(π·NTU) at Cr = 1 (derived, see effectivenessFromNTU tests): ε = 0.99999 needs NTU ≈ 3e9
    expect(() => ntuFromEffectiveness(0.99999, 1, "crossflow-unmixed")).toThrow(
      "effectiveness 0.99999 for unmixed crossflow at capacity ratio 1 needs NTU above 100000000, beyond the supported range",
    );
  });

  it("rejects negative and non-finite effectiveness", () => {
    expect(() => ntuFromEffectiveness(-0.1, 0.5, "counterflow")).toThrow("effectiveness must not be negative, got -0.1");
    expect(() => ntuFromEffectiveness(Number.POSITIVE_INFINITY, 0.5, "counterflow")).toThrow(
      "effectiveness must be a finite number, got Infinity",
    );
  });
});
