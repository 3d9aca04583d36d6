import fs from "node:fs";
import { describe, expect, it } from "vitest";
import { parseAssetFile } from "../../lib/data/save-asset";
import { AssetValidationError, instrumentUncertaintySI } from "../../lib/validation/asset";

const example = () => JSON.parse(fs.readFileSync("docs/examples/asset-e-4101.json", "utf8")) as Record<string, unknown>;

function problems(raw: unknown): string[] {
  try {
    parseAssetFile(raw);
  } catch (error) {
    if (error instanceof AssetValidationError) return error.problems;
    throw error;
  }
  return [];
}

describe("parseAssetFile", () => {
  it("converts every quantity of the documented example to SI", () => {
    const asset = parseAssetFile(example());
    // NIST SP 811 B.8: ft² → m² 9.290 304 E−02 (exact): 1292 ft² = 120.030 727 68 m²
    expect(asset.area).toBeCloseTo(120.03072768, 8);
    // NIST SP 811 B.8: Btu/(h·ft²·°F) → W/(m²·K) 5.678 263: 95 × 5.678263 = 539.435
    expect(asset.designU).toBeCloseTo(539.435, 2);
    // FIELD-NOTES §3 [V]: TEMA cooling tower water, treated make-up, column (a): 0.001 h·ft²·°F/Btu = 0.000176 m²·K/W
    expect(asset.designFouling).toBeCloseTo(0.0001761, 6);
    // exact: 92 °C = 365.15 K; 46 t/h = 46000/3600 kg/s
    expect(asset.reference.hotInlet).toBeCloseTo(365.15, 10);
    expect(asset.reference.hotFlow).toBeCloseTo(46000 / 3600, 12);
    expect(asset.coldStream.heatCapacity).toEqual({ kind: "water", pressure: 4.5e5 });
    expect(asset.designDuty).toBe(1.45e6);
  });

  it("converts instrument uncertainties by role: °F differences to K, percent of reading at the reference flow", () => {
    const asset = parseAssetFile(example());
    const coldOut = asset.instruments.find((instrument) => instrument.role === "coldOut");
    const coldFlow = asset.instruments.find((instrument) => instrument.role === "coldFlow");
    // exact: a 0.6 °F difference is 0.6/1.8 K
    expect(instrumentUncertaintySI(coldOut!, asset.reference)).toBeCloseTo(0.6 / 1.8, 12);
    // 2 % of 120 t/h = 2.4 t/h = 0.6667 kg/s
    expect(instrumentUncertaintySI(coldFlow!, asset.reference)).toBeCloseTo(2400 / 3600, 12);
    expect(() => instrumentUncertaintySI({ role: "hotIn", tag: "TI-1", uncertainty: { percentOfReading: 1 } }, asset.reference)).toThrow(
      "instrument TI-1: percentOfReading applies to flow meters only",
    );
  });

  it("names each bad field and collects every problem at once", () => {
    const raw = example();
    raw.area = { value: -3, unit: "m2" };
    raw.designU = { value: 300, unit: "furlongs" };
    (raw.arrangement as Record<string, unknown>).tubePasses = 3;
    raw.tag = "";
    const found = problems(raw);
    expect(found).toEqual(
      expect.arrayContaining([
        "area: area must be positive",
        expect.stringMatching(/^designU: .*furlongs/),
        "arrangement.tubePasses: tubePasses must be even for an E shell (1 shell pass, 2N tube passes)",
        expect.stringMatching(/^tag: tag must be 1-40 letters/),
      ]),
    );
  });

  it("refuses reference conditions where the hot inlet is not above the cold inlet", () => {
    const raw = example();
    raw.reference = { ...(raw.reference as object), hotInlet: { value: 20, unit: "degC" } };
    expect(problems(raw)).toEqual(["reference.hotInlet: reference hot inlet (20.00 °C) must be above the cold inlet (24.00 °C)"]);
  });

  it("refuses a design duty above the thermodynamic limit Cmin·(hot inlet − cold inlet)", () => {
    const raw = example();
    raw.designDuty = { value: 5, unit: "MW" };
    // hot side is Cmin: 12.78 kg/s × (820 + 4.1 × 365.15) J/(kg K) × 68 K = 2.0137 MW (Incropera 6e Eq. 11.21 with cp at inlet)
    expect(problems(raw)).toEqual([expect.stringMatching(/^designDuty: designDuty 5\.000 MW exceeds .* 2\.01\d MW/)]);
  });

  it("refuses unknown fields and unknown TEMA services, naming them", () => {
    const raw = example();
    raw.colour = "blue";
    raw.designFouling = { tema: "swamp-water" };
    expect(problems(raw)).toEqual(
      expect.arrayContaining(['Unrecognized key: "colour"', expect.stringMatching(/^designFouling: unknown TEMA service "swamp-water"; known: cooling-tower-treated-low/)]),
    );
  });

  it("refuses an instrument role listed twice", () => {
    const raw = example();
    (raw.instruments as unknown[]).push({ role: "hotIn", tag: "TI-9", uncertainty: 0.5 });
    expect(problems(raw)).toEqual(["instruments.6.role: instrument role hotIn is listed twice"]);
  });
});
