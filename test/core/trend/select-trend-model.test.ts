import { describe, expect, it } from "vitest";
import { seededRandom } from "../../../lib/core/simulate";
import { fitTrendModel, selectTrendModel, type TrendModelKind } from "../../../lib/core/trend";

const DAYS = Array.from({ length: 250 }, (_, day) => day);

function noisy(truth: (day: number) => number, seed: number, sigma = 1.5e-5, days = DAYS): number[] {
  const random = seededRandom(seed);
  return days.map((day) => truth(day) + sigma * random.normal());
}

function fitAll(days: number[], values: number[]) {
  return (["linear", "asymptotic", "falling-rate"] as TrendModelKind[]).map((kind) => fitTrendModel(kind, { timeDays: days, foulingM2KPerW: values }));
}

describe("selectTrendModel", () => {
  it("picks the asymptotic model for a strongly levelling cycle and explains why", () => {
    // simulation with known truth: Kern–Seaton curve with θ = 60 d over 250 days
    const values = noisy((day) => 1e-5 + 6e-4 * -Math.expm1(-day / 60), 21);
    const selection = selectTrendModel(fitAll(DAYS, values));
    expect(selection.chosen?.kind).toBe("asymptotic");
    expect(selection.reason).toMatch(/^asymptotic: lowest AICc/);
    // Akaike weights sum to 1 (Burnham & Anderson 2002, definition)
    expect(selection.table.reduce((sum, row) => sum + row.akaikeWeight, 0)).toBeCloseTo(1, 12);
    expect(selection.table.find((row) => row.kind === "asymptotic")?.deltaAicc).toBe(0);
  });

  it("does not prefer a curved model for a straight cycle by much", () => {
    // simulation with known truth: a straight line; the extra parameter of a curved model buys < 2 AICc units at best
    const values = noisy((day) => 1e-4 + 2e-6 * day, 33);
    const selection = selectTrendModel(fitAll(DAYS, values));
    const linear = selection.table.find((row) => row.kind === "linear");
    expect(linear?.deltaAicc).toBeLessThan(2.5);
  });

  it("falls back to the straight line with too few points for AICc", () => {
    const selection = selectTrendModel([fitTrendModel("linear", { timeDays: [0, 1, 2, 3], foulingM2KPerW: [0, 1e-6, 2.2e-6, 2.9e-6] })]);
    expect(selection.chosen?.kind).toBe("linear");
    expect(selection.reason).toBe("linear: too few points (4) to compare models by AICc, so the straight line is used.");
  });
});
