import { describe, expect, it } from "vitest";
import { checkUnitPlausibility, median } from "../../lib/import/check-unit-plausibility";
import type { ResolvedColumn } from "../../lib/import/resolve-columns";

const hotInKelvin: ResolvedColumn = { role: "hotIn", quantity: "temperature", column: "hot_in", index: 1, unit: "K" };
const hotInCelsius: ResolvedColumn = { ...hotInKelvin, unit: "degC" };
const flowKgPerS: ResolvedColumn = { role: "hotFlow", quantity: "massFlow", column: "hot_flow", index: 2, unit: "kg/s" };
const dropKPa: ResolvedColumn = { role: "hotPressureDrop", quantity: "pressureDrop", column: "dp", index: 3, unit: "kPa" };

describe("median", () => {
  it("is the middle value, or the mean of the two middle values", () => {
    // definition (e.g. R: median(c(3, 1, 2)) = 2; median(c(4, 1, 2, 3)) = 2.5)
    expect(median([3, 1, 2])).toBe(2);
    expect(median([4, 1, 2, 3])).toBe(2.5);
    expect(median([])).toBeNull();
  });
});

describe("checkUnitPlausibility", () => {
  it("says that °C values mapped as K look like °C or °F", () => {
    // median 62 K is below the plausible 150 K; 62 °C = 335.15 K and 62 °F = 289.8 K are plausible (NIST SP 811 B.9)
    expect(checkUnitPlausibility([hotInKelvin], [[60, 62, 64]], 3)).toBe(
      'values of "hot_in" (hot inlet temperature) look like °C or °F, not K: the median of its first 3 rows is 62 K = 62 K, outside the plausible 150–973.15 K. Correct the unit, or trust the units to import anyway',
    );
  });

  it("says that K values mapped as °C look like K, °F or °R", () => {
    // 750 °C = 1023.15 K > 973.15 K (700 °C); 750 K, 750 °F = 672 K and 750 °R = 416.7 K are plausible (NIST SP 811 B.9)
    const message = checkUnitPlausibility([hotInCelsius], [[740, 750, 760]], 3);
    expect(message).toContain('values of "hot_in" (hot inlet temperature) look like K, °F or °R, not °C');
  });

  it("says that kg/h values mapped as kg/s look like a per-hour unit", () => {
    // 360000 kg/s > 1e5 kg/s; 360000 kg/h = 100 kg/s (NIST SP 811 B.8: 1 h = 3600 s)
    expect(checkUnitPlausibility([flowKgPerS], [[360_000]], 1)).toContain("look like kg/h, t/h or lb/h, not kg/s");
  });

  it("says that Pa values mapped as kPa look like Pa", () => {
    // 50 000 kPa = 5e7 Pa > 1e7 Pa; 50 000 Pa is plausible
    expect(checkUnitPlausibility([dropKPa], [[50_000]], 1)).toContain("look like Pa, not kPa");
  });

  it("passes plausible columns and columns without values", () => {
    expect(checkUnitPlausibility([hotInCelsius, flowKgPerS], [[120, 130], []], 2)).toBeNull();
  });
});
