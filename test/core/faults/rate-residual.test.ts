import { describe, expect, it } from "vitest";
import { exchangerBalance } from "../../../lib/core/reconcile";
import { rateResidual, type RateEquationSetup } from "../../../lib/core/faults";
import { counterflowLMTD, rate, type HeatCapacity } from "../../../lib/core/thermal";
import type { OperatingPoint } from "../../../lib/core/screening";

// A counterflow exchanger with constant cp, rated by the thermal core so that the balance closes and U is known.
const HOT: HeatCapacity = { kind: "constant", jPerKgK: 2400 };
const COLD: HeatCapacity = { kind: "constant", jPerKgK: 2000 };
const U = 300;
const AREA = 150;
const rated = rate({
  uWPerM2K: U,
  areaM2: AREA,
  arrangement: { kind: "counterflow" },
  hot: { massFlowKgPerS: 10, heatCapacity: HOT, inletK: 560 },
  cold: { massFlowKgPerS: 100, heatCapacity: COLD, inletK: 400 },
});
const TRUE_POINT: OperatingPoint = { hotInK: 560, hotOutK: rated.hotOutletK, coldInK: 400, coldOutK: rated.coldOutletK, hotFlowKgPerS: 10, coldFlowKgPerS: 100 };
const SETUP: RateEquationSetup = {
  areaM2: AREA,
  arrangement: { kind: "counterflow" },
  hotHeatCapacity: HOT,
  coldHeatCapacity: COLD,
  // U independent of flow and time: 1/U = intercept
  coefficient: { intercept: 1 / U, hotCoefficient: 0, coldCoefficient: 0, exponent: 0.8, timeCoefficient: 0, referenceTimeMs: 0, relativeResidualStandardDeviation: 0, count: 100 },
  hotWeight: 0.5,
};

describe("rateResidual: the physics that separates an inlet from an outlet thermometer", () => {
  it("is zero at the true operating point", () => {
    const result = rateResidual(TRUE_POINT, 0, SETUP);
    // thermal core rate(): Q = U·A·LMTD at its outlets, to its 1e-9 K tolerance
    expect(Math.abs(result.residualW) / result.dutyW).toBeLessThan(1e-9);
    expect(Math.abs(result.balanceW) / result.dutyW).toBeLessThan(1e-9);
  });

  it("sees the same energy-balance change for +b on the cold outlet and −b on the cold inlet, but different rate changes", () => {
    const bias = 2;
    const outlet = rateResidual({ ...TRUE_POINT, coldOutK: TRUE_POINT.coldOutK + bias }, 0, SETUP);
    const inlet = rateResidual({ ...TRUE_POINT, coldInK: TRUE_POINT.coldInK - bias }, 0, SETUP);
    // exchangerBalance: ∂g/∂t_co = −m_c·cp_c = −∂g/∂t_ci with constant cp, so the balance cannot tell them apart
    expect(outlet.balanceW).toBeCloseTo(inlet.balanceW, 6);
    expect(outlet.balanceW).toBeCloseTo(-100 * 2000 * bias, 6);
    // rate equation: h changes by ½·m_c·cp_c·b (the duty weight) minus U·A·ΔLMTD; the LMTD moves through ΔT₁ = T_hi − t_co
    // for the outlet and through ΔT₂ = T_ho − t_ci for the inlet, by different amounts (exact LMTDs from the thermal core)
    const lmtd = counterflowLMTD(TRUE_POINT);
    const lmtdOutlet = counterflowLMTD({ ...TRUE_POINT, coldOutK: TRUE_POINT.coldOutK + bias });
    const lmtdInlet = counterflowLMTD({ ...TRUE_POINT, coldInK: TRUE_POINT.coldInK - bias });
    const expectedOutlet = 0.5 * 100 * 2000 * bias - U * AREA * (lmtdOutlet - lmtd);
    const expectedInlet = 0.5 * 100 * 2000 * bias - U * AREA * (lmtdInlet - lmtd);
    expect(outlet.residualW).toBeCloseTo(expectedOutlet, 3);
    expect(inlet.residualW).toBeCloseTo(expectedInlet, 3);
    // the two differ by far more than the balance's own difference (here by about 80 kW on a 1.5 MW duty)
    expect(Math.abs(outlet.residualW - inlet.residualW)).toBeGreaterThan(0.03 * outlet.dutyW);
  });

  it("separates a hot-flow span error from an equivalent cold-flow span error by the sign of the rate change", () => {
    const duty = exchangerBalance(TRUE_POINT, HOT, COLD).hotDutyW;
    const hot = rateResidual({ ...TRUE_POINT, hotFlowKgPerS: TRUE_POINT.hotFlowKgPerS * 1.05 }, 0, SETUP);
    const cold = rateResidual({ ...TRUE_POINT, coldFlowKgPerS: TRUE_POINT.coldFlowKgPerS * 0.95 }, 0, SETUP);
    // energy balance: +5 % on the hot meter and −5 % on the cold meter both give g = +5 % of the duty
    expect(hot.balanceW / duty).toBeCloseTo(0.05, 9);
    expect(cold.balanceW / duty).toBeCloseTo(0.05, 9);
    // rate equation with U independent of flow: h = ±½·(duty change), positive for the hot meter, negative for the cold
    expect(hot.residualW / duty).toBeCloseTo(0.025, 9);
    expect(cold.residualW / duty).toBeCloseTo(-0.025, 9);
  });
});
