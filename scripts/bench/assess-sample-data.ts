// Sample data for the assessment benchmark (scripts/bench/assess.ts): one demo exchanger simulated hourly for five
// years with a cleaning every year. Invented data from the project's simulator; nothing measured.
import { simulateExchanger, type ExchangerSpec, type FoulingModel, type SimulationResult } from "../../lib/core/simulate";
import { demoFleet } from "../../lib/demo";

const DAY_MS = 86_400_000;
/** Five years of hourly samples from 2021-01-01 (1826 days × 24 h = 43,824 samples). */
export const FIVE_YEAR_START_MS = Date.UTC(2021, 0, 1);
export const FIVE_YEAR_END_MS = FIVE_YEAR_START_MS + 1826 * DAY_MS - 3_600_000;

export interface FiveYearSimulation {
  spec: ExchangerSpec;
  result: SimulationResult;
  /** Cleaning records for the assessment: the service start and each return to service. */
  cleanings: { timeMs: number }[];
  endMs: number;
}

/**
 * fiveYearSimulation: demo asset E-1101 (crude / kerosene, asymptotic fouling) re-planned for 2021–2025: service start
 * 60 days before the data, a bundle cleaning (90 % effective, 4 days) every 365 days, asymptotic cycles with
 * θ = 300 days and R∞ = 1.2e-3 m²·K/W, the demo operating pattern and noise, no instrument faults.
 */
export function fiveYearSimulation(seed = 20_210_101): FiveYearSimulation {
  const demo = demoFleet().assets.find((asset) => asset.spec.tag === "E-1101");
  if (demo === undefined) throw new Error("demo asset E-1101 missing");
  const cleanings = [1, 2, 3, 4].map((year) => {
    const startMs = FIVE_YEAR_START_MS + year * 365 * DAY_MS;
    return { startMs, endMs: startMs + 4 * DAY_MS, effectiveness: 0.9, method: "bundle pull and hydroblast" };
  });
  const cycle: FoulingModel = { kind: "asymptotic", asymptoteM2KPerW: 1.2e-3, timeConstantS: 300 * 86_400 };
  const plan = {
    ...demo.plan,
    fouling: { serviceStartMs: FIVE_YEAR_START_MS - 60 * DAY_MS, initialResistanceM2KPerW: 2e-5, cycles: [cycle, cycle, cycle, cycle, cycle] },
    cleanings,
    operation: { ...demo.plan.operation, shutdowns: [] },
    faults: [],
  };
  const result = simulateExchanger(demo.spec, plan, { start: FIVE_YEAR_START_MS, end: FIVE_YEAR_END_MS, seed });
  return {
    spec: demo.spec,
    result,
    cleanings: [{ timeMs: plan.fouling.serviceStartMs }, ...cleanings.map((cleaning) => ({ timeMs: cleaning.endMs }))],
    endMs: FIVE_YEAR_END_MS,
  };
}
