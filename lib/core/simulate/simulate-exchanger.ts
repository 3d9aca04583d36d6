import { rate } from "../thermal";
import { cleanOverallCoefficient } from "./clean-overall-coefficient";
import { cycleResistance, foulingHistory, type FoulingCycle } from "./fouling-history";
import { measureReadings, type TrueColumns } from "./measure-readings";
import { OPERATING_MODES, operatingConditions } from "./operating-conditions";
import { referenceDutyCurve } from "./reference-duty-curve";
import type { Cleaning, ExchangerSpec, OperatingMode, SimulationOptions, SimulationPlan, SimulationResult, TruthPoint } from "./types";

/** Default sampling interval: hourly, as plant historians commonly export (common practice). */
export const DEFAULT_STEP_MS = 3_600_000;

/**
 * simulateExchanger: operating data of one exchanger with its recorded ground truth.
 *
 * At each time step: true inlets and flows come from operatingConditions; the fouling resistance Rf from
 * the plan's fouling cycles and cleanings (foulingHistory); U_clean from cleanOverallCoefficient at the
 * true flows; U = 1/(1/U_clean + Rf); the outlets and duty from the thermal core's `rate` (quasi-steady:
 * the true hot and cold duties are equal at every step). The duty at reference conditions with the current
 * Rf is recorded too (rated with `rate` on a Chebyshev grid of the simulated Rf range and interpolated to within
 * 1e-10 relative; see referenceDutyCurve). Readings add noise, faults, spikes and gaps (measureReadings).
 *
 * @param spec exchanger spec.
 * @param plan true parameters and disturbances.
 * @param options start and end (epoch ms, end inclusive when on the grid), stepMs (default hourly), seed.
 * @throws if end < start, stepMs is not positive, or the plan is inconsistent (see foulingHistory).
 * @returns readings, truth, faults, cleanings in the window and injected spikes; plain objects.
 */
export function simulateExchanger(spec: ExchangerSpec, plan: SimulationPlan, options: SimulationOptions): SimulationResult {
  const stepMs = options.stepMs ?? DEFAULT_STEP_MS;
  if (!(stepMs > 0)) throw new Error(`simulateExchanger: stepMs must be positive, got ${stepMs}`);
  if (!(options.end >= options.start)) throw new Error("simulateExchanger: end must not be before start");
  const count = Math.floor((options.end - options.start) / stepMs) + 1;
  const grid = { startMs: options.start, stepMs, count };

  const conditions = operatingConditions(spec, plan, grid, options.seed);
  const cycles = foulingHistory(plan.fouling, plan.cleanings);

  const fouling = new Float64Array(count);
  let cycleIndex = 0;
  let lowFouling = Number.POSITIVE_INFINITY;
  let highFouling = Number.NEGATIVE_INFINITY;
  for (let index = 0; index < count; index += 1) {
    const timeMs = conditions.timeMs[index] as number;
    while (cycleIndex + 1 < cycles.length && (cycles[cycleIndex + 1] as FoulingCycle).startMs <= timeMs) cycleIndex += 1;
    const value = cycleResistance(cycles[cycleIndex] as FoulingCycle, timeMs);
    fouling[index] = value;
    if (value < lowFouling) lowFouling = value;
    if (value > highFouling) highFouling = value;
  }
  const dutyAtReference = referenceDutyCurve(spec, plan.cleanCoefficient, lowFouling, highFouling);

  const hotOut = new Float64Array(count);
  const coldOut = new Float64Array(count);
  const truth: TruthPoint[] = new Array<TruthPoint>(count);
  for (let index = 0; index < count; index += 1) {
    const timeMs = conditions.timeMs[index] as number;
    const foulingNow = fouling[index] as number;
    const hotFlow = conditions.hotFlowKgPerS[index] as number;
    const coldFlow = conditions.coldFlowKgPerS[index] as number;
    const hotIn = conditions.hotInK[index] as number;
    const coldIn = conditions.coldInK[index] as number;
    const cleanU = cleanOverallCoefficient(plan.cleanCoefficient, hotFlow, coldFlow);
    const u = 1 / (1 / cleanU + foulingNow);
    const rated = rate({
      uWPerM2K: u,
      areaM2: spec.areaM2,
      arrangement: spec.arrangement,
      hot: { massFlowKgPerS: hotFlow, heatCapacity: spec.hotStream.heatCapacity, inletK: hotIn },
      cold: { massFlowKgPerS: coldFlow, heatCapacity: spec.coldStream.heatCapacity, inletK: coldIn },
    });
    hotOut[index] = rated.hotOutletK;
    coldOut[index] = rated.coldOutletK;
    const mode = OPERATING_MODES[conditions.mode[index] as number] as OperatingMode;
    truth[index] = {
      timeMs,
      hotInK: hotIn,
      hotOutK: rated.hotOutletK,
      coldInK: coldIn,
      coldOutK: rated.coldOutletK,
      hotFlowKgPerS: hotFlow,
      coldFlowKgPerS: coldFlow,
      foulingM2KPerW: foulingNow,
      cleanUWPerM2K: cleanU,
      uWPerM2K: u,
      dutyW: rated.dutyW,
      steady: mode === "normal",
      mode,
      referenceDutyW: dutyAtReference(foulingNow),
    };
  }

  const trueColumns: TrueColumns = {
    hotIn: conditions.hotInK,
    hotOut,
    coldIn: conditions.coldInK,
    coldOut,
    hotFlow: conditions.hotFlowKgPerS,
    coldFlow: conditions.coldFlowKgPerS,
  };
  const measured = measureReadings(spec, conditions.timeMs, trueColumns, plan.noise, plan.faults, options.seed);

  const lastMs = options.start + (count - 1) * stepMs;
  const cleanings: Cleaning[] = [];
  for (const cycle of cycles) {
    if (cycle.cleaning === null || cycle.foulingBeforeCleaningM2KPerW === null) continue;
    if (cycle.cleaning.startMs < options.start || cycle.cleaning.startMs > lastMs) continue;
    cleanings.push({
      startMs: cycle.cleaning.startMs,
      endMs: cycle.cleaning.endMs,
      effectiveness: cycle.cleaning.effectiveness,
      method: cycle.cleaning.method,
      foulingBeforeM2KPerW: cycle.foulingBeforeCleaningM2KPerW,
      foulingAfterM2KPerW: cycle.residualM2KPerW,
    });
  }

  return { readings: measured.readings, truth, faults: measured.faults, cleanings, grossErrors: measured.grossErrors };
}
