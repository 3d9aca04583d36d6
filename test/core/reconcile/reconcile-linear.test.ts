import { describe, expect, it } from "vitest";
import { criticalValuesFor, reconcileLinear } from "../../../lib/core/reconcile";

describe("reconcileLinear", () => {
  // FIELD-NOTES §6 [C]: splitter y1 = y2 + y3, V = I, y = (100, 60, 38)
  const splitter = reconcileLinear({ measurements: [100, 60, 38], covariance: [1, 1, 1], constraints: [[1, -1, -1]] });

  it("reconciles the FIELD-NOTES splitter", () => {
    // FIELD-NOTES §6 [C]: r = 2
    expect(splitter.constraintResidual[0]).toBeCloseTo(2, 12);
    // FIELD-NOTES §6 [C]: x̂ = (99.3333, 60.6667, 38.6667)
    expect(splitter.estimates[0]).toBeCloseTo(99.3333, 4);
    expect(splitter.estimates[1]).toBeCloseTo(60.6667, 4);
    expect(splitter.estimates[2]).toBeCloseTo(38.6667, 4);
    // definition: the estimates satisfy A·x̂ = 0
    const [first, second, third] = splitter.estimates as [number, number, number];
    expect(first - second - third).toBeCloseTo(0, 12);
  });

  it("gives the FIELD-NOTES global test, measurement tests and Šidák values", () => {
    // FIELD-NOTES §6 [C]: γ = 1.3333 < χ²₀.₉₅(1) = 3.8415
    expect(splitter.globalTest).toBeCloseTo(1.3333, 4);
    expect(splitter.globalTestCritical).toBeCloseTo(3.8415, 4);
    expect(splitter.globalTestRejects).toBe(false);
    expect(splitter.degreesOfFreedom).toBe(1);
    // FIELD-NOTES §6 [C]: all z_i = 1.1547 (= √γ for one constraint)
    for (const z of splitter.measurementTests) expect(z).toBeCloseTo(1.1547, 4);
    // FIELD-NOTES §6 [C]: Šidák n = 3, α = 0.05: β = 0.016952, two-sided z_crit = 2.3877
    expect(splitter.sidakLevel).toBeCloseTo(0.016952, 6);
    expect(splitter.measurementTestCritical).toBeCloseTo(2.3877, 4);
    // same values from the shared helper
    expect(criticalValuesFor(0.05, 1, 3).measurementTestCritical).toBeCloseTo(2.3877, 4);
  });

  it("accepts a full covariance matrix and leaves unconstrained measurements untested", () => {
    const result = reconcileLinear({
      measurements: [100, 60, 38, 7],
      covariance: [
        [1, 0, 0, 0],
        [0, 1, 0, 0],
        [0, 0, 1, 0],
        [0, 0, 0, 4],
      ],
      constraints: [[1, -1, -1, 0]],
    });
    // FIELD-NOTES §6 [C]: the splitter part is unchanged by an extra measurement in no constraint
    expect(result.estimates[0]).toBeCloseTo(99.3333, 4);
    expect(result.estimates[3]).toBe(7);
    expect(result.measurementTests[3]).toBeNull();
    // definition: Šidák over the 3 measurements that are tested
    expect(result.sidakLevel).toBeCloseTo(0.016952, 6);
  });

  it("handles two constraints with m = 2 degrees of freedom", () => {
    // two splitters in series: y1 = y2 + y3, y3 = y4 + y5, V = I
    const result = reconcileLinear({
      measurements: [100, 60, 38, 20, 20],
      covariance: [1, 1, 1, 1, 1],
      constraints: [
        [1, -1, -1, 0, 0],
        [0, 0, 1, -1, -1],
      ],
    });
    expect(result.degreesOfFreedom).toBe(2);
    // scipy.stats.chi2.ppf(0.95, 2) = 5.991464547107979 (from memory; = −2 ln 0.05 exactly)
    expect(result.globalTestCritical).toBeCloseTo(5.991464547107979, 12);
    const [a, b, c, d, e] = result.estimates as [number, number, number, number, number];
    expect(a - b - c).toBeCloseTo(0, 10);
    expect(c - d - e).toBeCloseTo(0, 10);
    // definition: γ = aᵀV⁻¹a with V = I
    expect(result.globalTest).toBeCloseTo(result.adjustments.reduce((sum, value) => sum + value * value, 0), 10);
  });

  it("rejects dependent constraints with a clear message", () => {
    expect(() =>
      reconcileLinear({ measurements: [1, 2, 3], covariance: [1, 1, 1], constraints: [[1, -1, -1], [2, -2, -2]] }),
    ).toThrow("matrix is not positive definite (dependent constraints, or a constraint without uncertain measurements)");
  });
});
