import { describe, expect, it } from "vitest";
import { maximumEffectiveness } from "../../../lib/core/thermal";
import { relativeError } from "./relative-error";

describe("maximumEffectiveness", () => {
  it("is 1 for counterflow at every capacity ratio, including Cr = 1", () => {
    // limit NTU → ∞ of Incropera 6e Table 11.3 counterflow (and of NTU/(1 + NTU) at Cr = 1), derived
    for (const capacityRatio of [0, 0.5, 0.99, 1]) {
      expect(maximumEffectiveness(capacityRatio, "counterflow")).toBe(1);
    }
  });

  it("is 1/(1 + Cr) for parallel flow", () => {
    // limit NTU → ∞ of Incropera 6e Table 11.3 parallel flow, derived
    expect(maximumEffectiveness(1, "parallel")).toBe(0.5);
    expect(relativeError(maximumEffectiveness(0.25, "parallel"), 0.8)).toBeLessThan(1e-15);
  });

  it("is 2/(1 + Cr + √(1 + Cr²)) for one shell", () => {
    // limit NTU → ∞ of Incropera 6e Table 11.3 (1 shell, 2n passes), derived; Cr = 1 gives 2 − √2
    expect(relativeError(maximumEffectiveness(1, { shells: 1 }), 2 - Math.SQRT2)).toBeLessThan(1e-15);
    expect(relativeError(maximumEffectiveness(0.5, { shells: 1 }), 2 / (1.5 + Math.sqrt(1.25)))).toBeLessThan(1e-15);
  });

  it("rises with the number of shells towards the counterflow limit", () => {
    // series formula of Incropera 6e Table 11.3 applied to the one-shell limit, derived; N·ε₁/(1 + (N − 1)·ε₁) at Cr = 1
    const oneShell = 2 - Math.SQRT2;
    for (const shells of [2, 3, 10]) {
      const expected = (shells * oneShell) / (1 + (shells - 1) * oneShell);
      expect(relativeError(maximumEffectiveness(1, { shells }), expected)).toBeLessThan(1e-14);
    }
    expect(maximumEffectiveness(0.5, { shells: 200 })).toBeGreaterThan(1 - 1e-12);
  });

  it("gives the crossflow limits 1 (unmixed), (1 − e^(−Cr))/Cr (Cmax mixed) and 1 − e^(−1/Cr) (Cmin mixed)", () => {
    // limits NTU → ∞ of Incropera 6e Table 11.3 crossflow relations, derived
    expect(maximumEffectiveness(1, "crossflow-unmixed")).toBe(1);
    expect(relativeError(maximumEffectiveness(0.5, "crossflow-cmax-mixed"), (1 - Math.exp(-0.5)) / 0.5)).toBeLessThan(1e-15);
    expect(relativeError(maximumEffectiveness(0.5, "crossflow-cmin-mixed"), 1 - Math.exp(-2))).toBeLessThan(1e-15);
  });

  it("is 1 for every flow kind when Cr = 0", () => {
    // Cr = 0: ε = 1 − e^(−NTU) → 1 (Incropera 6e Table 11.3), derived
    for (const flow of ["parallel", "crossflow-cmax-mixed", "crossflow-cmin-mixed", { shells: 1 }, { shells: 4 }] as const) {
      expect(maximumEffectiveness(0, flow)).toBe(1);
    }
  });

  it("rejects a capacity ratio above 1", () => {
    expect(() => maximumEffectiveness(1.5, "parallel")).toThrow(
      "capacity ratio Cmin/Cmax must be between 0 and 1, got 1.5",
    );
  });
});
