import { describe, expect, it } from "vitest";
import { criticalFouling, DEMO_END_MS, DEMO_START_MS, demoFleet } from "../../lib/demo";
import { CRUDE_PREHEAT_TRAIN } from "../../lib/demo/crude-preheat-train";
import { HYDROTREATER_EXCHANGERS } from "../../lib/demo/hydrotreater-exchangers";
import { PRODUCT_COOLERS } from "../../lib/demo/product-coolers";
import { cleanOverallCoefficient, referenceDuty, trueThresholdCrossing, type ExchangerSpec } from "../../lib/core/simulate";
import { correctionFactor, rate, specificHeat, type HeatCapacity } from "../../lib/core/thermal";

const DAY_MS = 86_400_000;
const MONTH_MS = 30.4375 * DAY_MS;
const fleet = demoFleet();
const definitions = [...CRUDE_PREHEAT_TRAIN, ...HYDROTREATER_EXCHANGERS, ...PRODUCT_COOLERS];

function cleanRating(spec: ExchangerSpec, cleanU: number) {
  const reference = spec.reference;
  return rate({
    uWPerM2K: cleanU,
    areaM2: spec.areaM2,
    arrangement: spec.arrangement,
    hot: { massFlowKgPerS: reference.hotFlowKgPerS, heatCapacity: spec.hotStream.heatCapacity, inletK: reference.hotInletK },
    cold: { massFlowKgPerS: reference.coldFlowKgPerS, heatCapacity: spec.coldStream.heatCapacity, inletK: reference.coldInletK },
  });
}

describe("demoFleet", () => {
  it("has an invented site with a valid IANA time zone and 20–28 assets in 3 units with unique tags", () => {
    expect(fleet.site).toEqual({ name: "Brakwater Haven Refinery", code: "BWH", timeZone: "Europe/Amsterdam" });
    expect(() => new Intl.DateTimeFormat("en-GB", { timeZone: fleet.site.timeZone })).not.toThrow();
    expect(fleet.units).toHaveLength(3);
    expect(fleet.assets.length).toBeGreaterThanOrEqual(20);
    expect(fleet.assets.length).toBeLessThanOrEqual(28);
    const tags = fleet.assets.map((asset) => asset.spec.tag);
    expect(new Set(tags).size).toBe(tags.length);
    const instrumentTags = fleet.assets.flatMap((asset) => asset.spec.instruments.map((instrument) => instrument.tag));
    expect(new Set(instrumentTags).size).toBe(instrumentTags.length);
    const unitCodes = new Set(fleet.units.map((unit) => unit.code));
    for (const asset of fleet.assets) expect(unitCodes.has(asset.spec.unitCode)).toBe(true);
  });

  it("has about 10 crude preheat exchangers, 8 cooling-water coolers and 6 others covering every arrangement", () => {
    const crude = fleet.assets.filter((asset) => asset.spec.coldStream.name === "crude");
    const coolers = fleet.assets.filter((asset) => asset.spec.coldStream.name === "cooling water");
    expect(crude).toHaveLength(10);
    expect(coolers).toHaveLength(8);
    expect(fleet.assets.length - crude.length - coolers.length).toBe(6);
    expect(crude.filter((asset) => asset.spec.arrangement.kind === "shell-and-tube" && asset.spec.arrangement.shells === 2).length).toBeGreaterThanOrEqual(2);
    const kinds = new Set(fleet.assets.map((asset) => asset.spec.arrangement.kind));
    expect([...kinds].sort()).toEqual(["counterflow", "crossflow-mixed", "crossflow-unmixed", "parallel", "shell-and-tube"]);
  });

  it("uses realistic areas, duties, coefficients, design fouling and instrument uncertainties", () => {
    for (const { spec } of fleet.assets) {
      expect(spec.areaM2).toBeGreaterThanOrEqual(20);
      expect(spec.areaM2).toBeLessThanOrEqual(800);
      expect(spec.designDutyW).toBeGreaterThanOrEqual(0.2e6);
      expect(spec.designDutyW).toBeLessThanOrEqual(15e6);
      expect(spec.designUWPerM2K).toBeGreaterThanOrEqual(200);
      expect(spec.designUWPerM2K).toBeLessThanOrEqual(900);
      // TEMA-like design fouling, FIELD-NOTES §3: 0.00035–0.0007 m²·K/W for the services here.
      expect(spec.designFoulingM2KPerW).toBeGreaterThanOrEqual(0.00035);
      expect(spec.designFoulingM2KPerW).toBeLessThanOrEqual(0.0007);
      expect(spec.instruments.map((instrument) => instrument.role)).toEqual(["hotIn", "hotOut", "coldIn", "coldOut", "hotFlow", "coldFlow"]);
      for (const instrument of spec.instruments) {
        if (instrument.role === "hotFlow" || instrument.role === "coldFlow") {
          const flow = instrument.role === "hotFlow" ? spec.reference.hotFlowKgPerS : spec.reference.coldFlowKgPerS;
          // Brief: flow meters 1–2 % of reading.
          expect(instrument.standardUncertainty / flow).toBeGreaterThanOrEqual(0.01 - 1e-12);
          expect(instrument.standardUncertainty / flow).toBeLessThanOrEqual(0.02 + 1e-12);
        } else {
          // Brief: thermocouples about 0.3–0.5 K.
          expect(instrument.standardUncertainty).toBeGreaterThanOrEqual(0.3);
          expect(instrument.standardUncertainty).toBeLessThanOrEqual(0.5);
        }
      }
    }
    const crude = fleet.assets.filter((asset) => asset.spec.coldStream.name === "crude");
    for (const { spec } of crude) expect(spec.designFoulingM2KPerW).toBeGreaterThanOrEqual(0.00035);
  });

  it("gives hydrocarbons 1.8–2.7 kJ/(kg·K) rising with temperature and water its FIELD-NOTES §7 value", () => {
    for (const { spec, plan } of fleet.assets) {
      const rating = cleanRating(spec, cleanOverallCoefficient(plan.cleanCoefficient, spec.reference.hotFlowKgPerS, spec.reference.coldFlowKgPerS));
      const ranges: [HeatCapacity, number, number][] = [
        [spec.hotStream.heatCapacity, rating.hotOutletK, spec.reference.hotInletK],
        [spec.coldStream.heatCapacity, spec.reference.coldInletK, rating.coldOutletK],
      ];
      for (const [heatCapacity, lowK, highK] of ranges) {
        if (heatCapacity.kind === "linear") {
          // Brief: hydrocarbon cp 1.8–2.7 kJ/(kg·K), slope about 3–5 J/(kg·K²); the fuel gas (2.5) is the one gas.
          expect(heatCapacity.slopeJPerKgK2, spec.tag).toBeGreaterThanOrEqual(2.5);
          expect(heatCapacity.slopeJPerKgK2, spec.tag).toBeLessThanOrEqual(5);
          expect(specificHeat(heatCapacity, lowK), spec.tag).toBeGreaterThanOrEqual(1800);
          expect(specificHeat(heatCapacity, highK), spec.tag).toBeLessThanOrEqual(2700);
        } else if (heatCapacity.kind === "constant" && heatCapacity.jPerKgK > 4000) {
          // IAPWS-95 via CoolProp, FIELD-NOTES §7 [C]: 4.18131 kJ/(kg·K) at 25 °C, 4.19675 at 80 °C; rel. tol. 1e-3.
          const nearest = Math.abs(heatCapacity.jPerKgK - 4181.31) < Math.abs(heatCapacity.jPerKgK - 4196.75) ? 4181.31 : 4196.75;
          expect(Math.abs(heatCapacity.jPerKgK / nearest - 1)).toBeLessThan(1e-3);
        }
      }
    }
  });

  it("puts the clean duty at reference conditions near the design duty, and the design fouling above the threshold duty", () => {
    for (const { spec, plan } of fleet.assets) {
      const fraction = definitions.find((definition) => definition.tag === spec.tag)?.thresholdFraction ?? Number.NaN;
      const cleanDuty = referenceDuty(spec, plan.cleanCoefficient, 0);
      const designDuty = referenceDuty(spec, plan.cleanCoefficient, spec.designFoulingM2KPerW);
      // Data-sheet duties are rounded to 3 significant figures: 0.5 % covers the rounding.
      expect(Math.abs(designDuty / spec.designDutyW - 1)).toBeLessThan(5e-3);
      expect(cleanDuty / spec.designDutyW).toBeGreaterThan(1);
      expect(cleanDuty / spec.designDutyW).toBeLessThan(1.2);
      // Brief: threshold about 80–85 % of the clean duty; the fleet rounds it to 1 kW.
      expect(Math.abs(spec.dutyThresholdW - fraction * cleanDuty)).toBeLessThanOrEqual(500);
      expect(fraction).toBeGreaterThanOrEqual(0.8);
      expect(fraction).toBeLessThanOrEqual(0.85);
      expect(designDuty).toBeGreaterThanOrEqual(spec.dutyThresholdW);
      // Service U of the data sheet is the clean U with the design fouling added in series.
      const cleanU = cleanOverallCoefficient(plan.cleanCoefficient, spec.reference.hotFlowKgPerS, spec.reference.coldFlowKgPerS);
      expect(1 / (1 / cleanU + spec.designFoulingM2KPerW)).toBeCloseTo(spec.designUWPerM2K, 9);
      expect(plan.cleanCoefficient.exponentHot).toBe(0.8);
      expect(plan.cleanCoefficient.exponentCold).toBe(0.8);
    }
  });

  it("keeps shell-and-tube designs at F ≥ 0.75 at clean reference conditions and no design has a temperature cross", () => {
    for (const { spec, plan } of fleet.assets) {
      const rating = cleanRating(spec, cleanOverallCoefficient(plan.cleanCoefficient, spec.reference.hotFlowKgPerS, spec.reference.coldFlowKgPerS));
      const factor = correctionFactor(
        { hotInK: spec.reference.hotInletK, hotOutK: rating.hotOutletK, coldInK: spec.reference.coldInletK, coldOutK: rating.coldOutletK },
        spec.arrangement,
      );
      // Design practice rejects F below about 0.75–0.8 (FIELD-NOTES §1, [M]; common practice).
      if (spec.arrangement.kind === "shell-and-tube") expect(factor).toBeGreaterThanOrEqual(0.75);
    }
  });

  it("has 0–3 cleanings per asset in the data window with effectiveness 0.7–1.0", () => {
    for (const { plan } of fleet.assets) {
      expect(plan.cleanings.length).toBeLessThanOrEqual(3);
      for (const cleaning of plan.cleanings) {
        expect(cleaning.effectiveness).toBeGreaterThanOrEqual(0.7);
        expect(cleaning.effectiveness).toBeLessThanOrEqual(1);
        expect(cleaning.startMs).toBeGreaterThanOrEqual(DEMO_START_MS);
        expect(cleaning.endMs).toBeLessThan(DEMO_END_MS);
      }
    }
    expect(fleet.assets.filter(({ plan }) => plan.cleanings.length === 0).length).toBeGreaterThanOrEqual(1);
    expect(fleet.assets.filter(({ plan }) => plan.cleanings.length >= 2).length).toBeGreaterThanOrEqual(3);
  });

  it("injects a drifting thermocouple, a stuck flow meter and one more fault on three assets in the last six months", () => {
    const faulty = fleet.assets.filter(({ plan }) => plan.faults.length > 0);
    expect(faulty).toHaveLength(3);
    const faults = faulty.flatMap(({ plan }) => plan.faults);
    expect(faults).toHaveLength(3);
    const drift = faults.find((fault) => fault.kind === "drift");
    expect(drift).toMatchObject({ size: 6, rampMs: 21 * DAY_MS });
    expect(["hotIn", "hotOut", "coldIn", "coldOut"]).toContain(drift?.role);
    const stuck = faults.find((fault) => fault.kind === "stuck");
    expect(["hotFlow", "coldFlow"]).toContain(stuck?.role);
    for (const fault of faults) {
      expect(fault.startMs).toBeGreaterThanOrEqual(DEMO_END_MS - 183 * DAY_MS);
      expect(fault.endMs === null || fault.endMs <= DEMO_END_MS).toBe(true);
    }
  });

  it("puts most true threshold crossings 1–18 months after the data end, a few close, one past and one never", () => {
    const crossings = fleet.assets.map(({ spec, plan }) => trueThresholdCrossing(spec, plan, DEMO_END_MS));
    const monthsAfterEnd = crossings.map((crossing) => (crossing === null ? null : (crossing - DEMO_END_MS) / MONTH_MS));
    const inWindow = monthsAfterEnd.filter((months) => months !== null && months >= 0.5 && months <= 18);
    expect(inWindow.length).toBeGreaterThanOrEqual(20);
    expect(monthsAfterEnd.filter((months) => months !== null && months >= 0 && months < 2).length).toBeGreaterThanOrEqual(2);
    expect(monthsAfterEnd.filter((months) => months !== null && months < 0)).toHaveLength(1);
    expect(monthsAfterEnd.filter((months) => months === null)).toHaveLength(1);
  });

  it("places each true crossing on the date its definition asks for", () => {
    for (const definition of definitions) {
      const asset = fleet.assets.find((candidate) => candidate.spec.tag === definition.tag);
      expect(asset).toBeDefined();
      if (!asset) continue;
      const crossing = trueThresholdCrossing(asset.spec, asset.plan, DEMO_END_MS);
      if ("crossing" in definition.fouling.target) {
        // Bisection tolerance 1 s (trueThresholdCrossing); 2 s allows for the rounding up to whole milliseconds.
        expect(Math.abs((crossing ?? Number.NaN) - Date.parse(definition.fouling.target.crossing))).toBeLessThan(2000);
      } else {
        expect(crossing).toBeNull();
        const current = asset.plan.fouling.cycles[asset.plan.fouling.cycles.length - 1];
        expect(current?.kind).toBe("asymptotic");
        const critical = criticalFouling(asset.spec, asset.plan.cleanCoefficient);
        if (current?.kind === "asymptotic") {
          expect(current.asymptoteM2KPerW / critical).toBeCloseTo(definition.fouling.target.ultimateFraction, 9);
        }
      }
    }
  });

  it("uses crude fouling that is asymptotic or linear and cooling-water fouling that is mostly falling-rate or asymptotic", () => {
    for (const { spec, plan } of fleet.assets) {
      const kinds = new Set(plan.fouling.cycles.map((cycle) => cycle.kind));
      if (spec.coldStream.name === "crude") expect([...kinds].every((kind) => kind === "asymptotic" || kind === "linear")).toBe(true);
    }
    const coolers = fleet.assets.filter(({ spec }) => spec.coldStream.name === "cooling water");
    const nonLinear = coolers.filter(({ plan }) => plan.fouling.cycles.every((cycle) => cycle.kind !== "linear"));
    expect(nonLinear.length).toBeGreaterThanOrEqual(6);
  });

  it("is pure: two calls give equal, separate objects", () => {
    const again = demoFleet();
    expect(again).toEqual(fleet);
    expect(again.assets[0]).not.toBe(fleet.assets[0]);
  });
});
