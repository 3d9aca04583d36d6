import { describe, expect, it } from "vitest";
import { TEMA_DESIGN_FOULING, temaDesignFouling } from "../../../lib/core/fouling-allowance";

describe("temaDesignFouling", () => {
  it("converts the table's imperial values to SI", () => {
    // FIELD-NOTES §3 [V]: cooling tower, treated make-up, column (a) 0.001 h ft² °F/Btu = 0.000176 m² K/W
    expect(temaDesignFouling("cooling-tower-treated-low")?.m2KPerW).toBeCloseTo(0.000176, 6);
    // FIELD-NOTES §3 [V]: cooling tower, untreated, column (c) 0.005 = 0.00088 m² K/W
    expect(temaDesignFouling("cooling-tower-untreated-high")?.m2KPerW).toBeCloseTo(0.00088, 5);
    // FIELD-NOTES §3 [V]: sea water, column (a) 0.0005 = 0.000088 m² K/W
    expect(temaDesignFouling("sea-water-low")?.m2KPerW).toBeCloseTo(0.000088, 6);
  });

  it("has unique ids and positive values, and marks refinery-stream values as not checked against the table", () => {
    const ids = TEMA_DESIGN_FOULING.map((entry) => entry.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const entry of TEMA_DESIGN_FOULING) expect(entry.m2KPerW).toBeGreaterThan(0);
    // FIELD-NOTES §3 marks the crude and refinery-stream values [M]
    expect(temaDesignFouling("crude-dry-300-499f")?.provenance).toBe("from memory");
    expect(temaDesignFouling("nonexistent")).toBeUndefined();
  });
});
