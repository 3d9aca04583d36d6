import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { effectivenessFromNTU, maximumEffectiveness, ThermalInputError } from "../../../lib/core/thermal";
import { FLOW_KINDS } from "./flow-kinds";
import { relativeError } from "./relative-error";

describe("effectivenessFromNTU", () => {
  it.each([
    // Incropera 6e Table 11.3 via CalebBell/ht hx.py doctest, 16 digits [FIELD-NOTES §2, V]
    { name: "parallel", flow: "parallel" as const, expected: 0.5881156068417585, tolerance: 1e-15 },
    // Incropera 6e Table 11.3 via CalebBell/ht hx.py doctest, 12 decimals (printed digits may be truncated, so
    // the tolerance is one unit in the 12th decimal, relative) [FIELD-NOTES §2, V]
    { name: "counterflow", flow: "counterflow" as const, expected: 0.920670368605, tolerance: 1.1e-12 },
    // Incropera 6e Table 11.3 via CalebBell/ht hx.py doctest, 12 decimals [FIELD-NOTES §2, V]
    { name: "1 shell, 2n passes", flow: { shells: 1 }, expected: 0.683497704431, tolerance: 1.5e-12 },
    // Incropera 6e Table 11.3 via CalebBell/ht hx.py doctest, 12 decimals, truncated: mpmath 1.3.0 at 40 digits
    // gives 0.92050587027892541 (50 shells tend to counterflow) [FIELD-NOTES §2, V]
    { name: "50 shells", flow: { shells: 50 }, expected: 0.920505870278, tolerance: 1.1e-12 },
    // Incropera 6e Table 11.3 with N = 50 evaluated by mpmath 1.3.0 at 40 digits (computed)
    { name: "50 shells (40-digit value)", flow: { shells: 50 }, expected: 0.92050587027892541, tolerance: 1e-15 },
    // Triboix 2009 exact integral via CalebBell/ht tests/test_hx.py [FIELD-NOTES §2, V]; this code sums the
    // equivalent exact series (Mason 1954), not the Incropera approximation
    { name: "crossflow both unmixed", flow: "crossflow-unmixed" as const, expected: 0.8444821799748551, tolerance: 1e-14 },
    // Incropera 6e Table 11.3 via CalebBell/ht tests/test_hx.py [FIELD-NOTES §2, V]
    { name: "crossflow Cmin mixed", flow: "crossflow-cmin-mixed" as const, expected: 0.7497843941508544, tolerance: 1e-14 },
    // Incropera 6e Table 11.3 via CalebBell/ht tests/test_hx.py [FIELD-NOTES §2, V]
    { name: "crossflow Cmax mixed", flow: "crossflow-cmax-mixed" as const, expected: 0.7158099831204696, tolerance: 1e-14 },
  ])("gives $expected for $name at NTU = 5, Cr = 0.7", ({ flow, expected, tolerance }) => {
    expect(relativeError(effectivenessFromNTU(5, 0.7, flow), expected)).toBeLessThan(tolerance);
  });

  it("differs from the Incropera unmixed-crossflow approximation by its known small error", () => {
    // approximation 1 − exp[(1/Cr)·NTU^0.22·(exp(−Cr·NTU^0.78) − 1)] at NTU = 5, Cr = 0.7 gives 0.84448
    // [FIELD-NOTES §2, C]; the exact value is 0.844482 (above), 2e-6 apart
    const exact = effectivenessFromNTU(5, 0.7, "crossflow-unmixed");
    const approximation = 1 - Math.exp((1 / 0.7) * Math.pow(5, 0.22) * (Math.exp(-0.7 * Math.pow(5, 0.78)) - 1));
    expect(Math.abs(approximation - 0.84448)).toBeLessThan(5e-6);
    expect(Math.abs(exact - approximation)).toBeLessThan(1e-5);
  });

  it.each([
    // exact series (Mason 1954) = Triboix (2009) integral, mpmath 1.3.0 at 50 digits (computed)
    { ntu: 1, capacityRatio: 0.5, expected: 0.54748983388114005 },
    // same source and method
    { ntu: 0.01, capacityRatio: 0.3, expected: 0.0099353302687991916 },
    // same source and method
    { ntu: 30, capacityRatio: 0.9, expected: 0.93557177676082075 },
    // same source and method; exercises the windowed sum (Cr·NTU above 477)
    { ntu: 1000, capacityRatio: 1, expected: 0.98215987402061609 },
  ])(
    "sums the exact unmixed-crossflow series to $expected at NTU = $ntu, Cr = $capacityRatio",
    ({ ntu, capacityRatio, expected }) => {
      expect(relativeError(effectivenessFromNTU(ntu, capacityRatio, "crossflow-unmixed"), expected)).toBeLessThan(1e-14);
    },
  );

  it("approaches 1 as 1 − 1/√(π·NTU) for unmixed crossflow at Cr = 1", () => {
    // large-NTU normal approximation of the Poisson series, derived here (not a published value):
    // 1 − ε ≈ Σ U(1 − U)/NTU ≈ 1/√(π·NTU); at NTU = 1e6 the neglected terms are below 1e-10
    const ntu = 1e6;
    expect(Math.abs(1 - effectivenessFromNTU(ntu, 1, "crossflow-unmixed") - 1 / Math.sqrt(Math.PI * ntu))).toBeLessThan(1e-10);
  });

  it.each([
    // Incropera 6e Table 11.3, computed to 6 decimals [FIELD-NOTES §2, C]
    { flow: "counterflow" as const, expected: 0.564733 },
    // same source
    { flow: "parallel" as const, expected: 0.517913 },
    // same source
    { flow: { shells: 1 }, expected: 0.53994 },
  ])("gives $expected at NTU = 1, Cr = 0.5 ($flow)", ({ flow, expected }) => {
    expect(Math.abs(effectivenessFromNTU(1, 0.5, flow) - expected)).toBeLessThan(5e-7);
  });

  it("gives exactly 0.9 for counterflow at Cr = 1, NTU = 9", () => {
    // ε = NTU/(1 + NTU), CalebBell/ht tests/test_hx.py [FIELD-NOTES §2, V]
    expect(Math.abs(effectivenessFromNTU(9, 1, "counterflow") - 0.9)).toBeLessThan(1e-15);
  });

  it("is continuous at Cr = 1 for counterflow and shells", () => {
    // the Cr < 1 forms tend to the Cr = 1 forms (Incropera 6e Table 11.3); ε is smooth in Cr, so 1e-9 away
    // the values differ by O(1e-9)
    for (const flow of ["counterflow" as const, { shells: 3 }]) {
      const atOne = effectivenessFromNTU(2, 1, flow);
      const near = effectivenessFromNTU(2, 1 - 1e-9, flow);
      expect(Math.abs(atOne - near)).toBeLessThan(1e-8);
    }
  });

  it.each(FLOW_KINDS)("equals 1 − e^(−NTU) when Cr = 0 ($name)", ({ flow }) => {
    // Cr = 0 (condensing or boiling side): ε = 1 − exp(−NTU) for every arrangement, Incropera 6e Eq. 11.35a
    // (from memory) via CalebBell/ht tests: 0.9932620530009145 at NTU = 5 [FIELD-NOTES §2, V]
    expect(relativeError(effectivenessFromNTU(5, 0, flow), 0.9932620530009145)).toBeLessThan(1e-15);
    // limit Cr → 0 is continuous: Cr = 1e-12 within 1e-11 (derived, ε depends smoothly on Cr)
    expect(Math.abs(effectivenessFromNTU(5, 1e-12, flow) - 0.9932620530009145)).toBeLessThan(1e-11);
  });

  it.each(FLOW_KINDS)("tends to NTU as NTU → 0 ($name)", ({ flow }) => {
    // first-order expansion ε = NTU − O(NTU²) for every arrangement (derived from Incropera 6e Table 11.3)
    for (const capacityRatio of [0, 0.5, 1]) {
      const ntu = 1e-8;
      expect(relativeError(effectivenessFromNTU(ntu, capacityRatio, flow), ntu)).toBeLessThan(2e-8);
    }
    // NTU = 0 exactly gives no heat transfer
    expect(effectivenessFromNTU(0, 0.5, flow)).toBe(0);
  });

  it.each(FLOW_KINDS)("tends to maximumEffectiveness as NTU → ∞ ($name)", ({ flow }) => {
    // limit NTU → ∞ of the Table 11.3 relations (derived); exponential approach for all but unmixed crossflow
    // and counterflow at Cr = 1, which approach algebraically
    // unmixed crossflow approaches its limit slowly (1 − ε ≈ 7e-4 at NTU = 200, Cr = 0.8), hence NTU = 1e4 there
    const ntu = flow === "crossflow-unmixed" ? 1e4 : 200;
    for (const capacityRatio of [0, 0.3, 0.8]) {
      const atLarge = effectivenessFromNTU(ntu, capacityRatio, flow);
      expect(Math.abs(atLarge - maximumEffectiveness(capacityRatio, flow))).toBeLessThan(1e-12);
    }
  });

  it.each(FLOW_KINDS)("increases with NTU and stays between 0 and its limit ($name)", ({ flow }) => {
    // monotonicity and boundedness are properties of every relation in Incropera 6e Table 11.3
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 50, noNaN: true }),
        fc.double({ min: 0, max: 50, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (first, second, capacityRatio) => {
          const lower = Math.min(first, second);
          const upper = Math.max(first, second);
          const atLower = effectivenessFromNTU(lower, capacityRatio, flow);
          const atUpper = effectivenessFromNTU(upper, capacityRatio, flow);
          const limit = maximumEffectiveness(capacityRatio, flow);
          return atLower <= atUpper + 1e-15 && atLower >= 0 && atUpper <= limit;
        },
      ),
    );
  });

  it.each(FLOW_KINDS)("decreases as the capacity ratio rises at fixed NTU ($name)", ({ flow }) => {
    // property of the relations of Incropera 6e Table 11.3 (see its Figs. 11.14–11.19, from memory)
    fc.assert(
      fc.property(
        fc.double({ min: 1e-3, max: 30, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (ntu, first, second) => {
          const lower = Math.min(first, second);
          const upper = Math.max(first, second);
          return effectivenessFromNTU(ntu, upper, flow) <= effectivenessFromNTU(ntu, lower, flow) + 1e-15;
        },
      ),
    );
  });

  it("orders the arrangements: parallel ≤ 1 shell ≤ crossflow unmixed ≤ counterflow", () => {
    // ordering shown by the NTU = 5, Cr = 0.7 doctest values of CalebBell/ht [FIELD-NOTES §2, V]
    const values = ["parallel" as const, { shells: 1 }, "crossflow-unmixed" as const, "counterflow" as const].map(
      (flow) => effectivenessFromNTU(5, 0.7, flow),
    );
    expect([...values].sort((a, b) => a - b)).toEqual(values);
  });

  it("rejects negative, non-finite and out-of-range inputs with named quantities", () => {
    expect(() => effectivenessFromNTU(-1, 0.5, "counterflow")).toThrow("NTU must not be negative, got -1");
    expect(() => effectivenessFromNTU(Number.NaN, 0.5, "counterflow")).toThrow("NTU must be a finite number, got NaN");
    expect(() => effectivenessFromNTU(1, 1.2, "counterflow")).toThrow(
      "capacity ratio Cmin/Cmax must be between 0 and 1, got 1.2",
    );
    expect(() => effectivenessFromNTU(1, -0.2, "parallel")).toThrow("capacity ratio must not be negative, got -0.2");
    expect(() => effectivenessFromNTU(1, 0.5, { shells: 0 })).toThrow(
      "number of shells must be a whole number of at least 1, got 0",
    );
    expect(() => effectivenessFromNTU(2e8, 0.5, "crossflow-unmixed")).toThrow(
      "NTU for unmixed crossflow must not exceed 100000000, got 200000000",
    );
    try {
      effectivenessFromNTU(1, 1.2, "counterflow");
    } catch (error) {
      expect(error).toBeInstanceOf(ThermalInputError);
      expect((error as ThermalInputError).reason).toBe("out-of-range");
    }
  });
});
