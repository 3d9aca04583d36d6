import { describe, expect, it } from "vitest";
import { findPressureUnit, PASCALS_PER_PSI, pressureToPascal } from "../../lib/import/pressure-units";
import { lookUpRoleUnit, roleValueToSI, unitChoicesFor } from "../../lib/import/role-units";

describe("pressureToPascal", () => {
  it("converts kPa and bar exactly and psi to NIST's printed digits", () => {
    // NIST SP 811 (2008) B.8: kilopascal 1 E+03 Pa, bar 1.0 E+05 Pa (exact)
    expect(pressureToPascal(1, "Pa")).toBe(1);
    expect(pressureToPascal(12.5, "kPa")).toBe(12_500);
    expect(pressureToPascal(0.35, "bar")).toBeCloseTo(35_000, 9);
    // NIST SP 811 (2008) B.8: pound-force per square inch (psi) 6.894 757 E+03 Pa (7 significant digits printed)
    expect(Math.abs(PASCALS_PER_PSI - 6894.757) / 6894.757).toBeLessThan(5e-8);
    expect(pressureToPascal(2, "psi")).toBeCloseTo(2 * PASCALS_PER_PSI, 9);
  });

  it("reads unit spellings in any letter case", () => {
    // spellings listed in lib/import/pressure-units.ts
    expect(findPressureUnit("KPA")?.id).toBe("kPa");
    expect(findPressureUnit(" psid ")?.id).toBe("psi");
    expect(findPressureUnit("mmHg")).toBeNull();
  });
});

describe("roleValueToSI", () => {
  it("converts temperatures, flows and pressure drops through lib/core/units and the pressure table", () => {
    // NIST SP 811 (2008) B.9: T/K = t/°C + 273.15; T/K = (t/°F + 459.67)/1.8; T/K = (T/°R)/1.8
    expect(roleValueToSI("temperature", 100, "degC")).toBeCloseTo(373.15, 12);
    expect(roleValueToSI("temperature", 212, "degF")).toBeCloseTo(373.15, 12);
    expect(roleValueToSI("temperature", 671.67, "degR")).toBeCloseTo(373.15, 12);
    // NIST SP 811 (2008) B.8: 1 t = 1000 kg, 1 h = 3600 s, 1 lb = 0.453 592 37 kg (exact)
    expect(roleValueToSI("massFlow", 36, "t/h")).toBeCloseTo(10, 12);
    expect(roleValueToSI("massFlow", 3600, "kg/h")).toBeCloseTo(1, 12);
    expect(roleValueToSI("massFlow", 1, "lb/s")).toBe(0.45359237);
    expect(roleValueToSI("pressureDrop", 0.5, "bar")).toBeCloseTo(50_000, 9);
  });
});

describe("lookUpRoleUnit", () => {
  it("accepts ids and common spellings and lists the allowed units otherwise", () => {
    // spellings from lib/core/units UNIT_TABLE (parseUnit) and lib/import/pressure-units.ts
    expect(lookUpRoleUnit("temperature", "°C")).toEqual({ ok: true, unit: "degC" });
    expect(lookUpRoleUnit("massFlow", "tph")).toEqual({ ok: true, unit: "t/h" });
    expect(lookUpRoleUnit("pressureDrop", "bar")).toEqual({ ok: true, unit: "bar" });
    expect(lookUpRoleUnit("temperature", "degX")).toEqual({ ok: false, message: 'unknown temperature unit "degX"; allowed: K, °C, °F, °R' });
    expect(lookUpRoleUnit("pressureDrop", "mmHg")).toEqual({ ok: false, message: 'unknown pressure unit "mmHg"; allowed: Pa, kPa, bar, psi' });
  });

  it("offers every unit of the quantity for the unit selects, SI first", () => {
    // lib/core/units UNIT_TABLE order and lib/import/pressure-units.ts
    expect(unitChoicesFor("temperature").map((unit) => unit.id)).toEqual(["K", "degC", "degF", "degR"]);
    expect(unitChoicesFor("massFlow").map((unit) => unit.id)).toEqual(["kg/s", "kg/h", "t/h", "lb/h", "lb/s"]);
    expect(unitChoicesFor("pressureDrop").map((unit) => unit.id)).toEqual(["Pa", "kPa", "bar", "psi"]);
  });
});
