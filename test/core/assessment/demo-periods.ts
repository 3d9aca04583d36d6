import { dailyPeriods as dailyMeans } from "../../../lib/core/assessment/daily-periods";
import type { AssessmentAsset, AssessmentCleaning, AssessmentPeriod } from "../../../lib/core/assessment";
import type { DemoAssetSimulation } from "../../../lib/demo";
import { streamDuty } from "../../../lib/core/thermal";

/**
 * Test helper: daily periods from the simulator's MEASURED readings with a simple screening of our own (the data
 * screening module is another engineer's work, so the assessment tests do not depend on it).
 *
 * An hour is kept when: all six readings are present; both flows are at least half their reference (not a shutdown,
 * cleaning or trip); no reading is more than 5 K (temperatures) or 5 % (flows) from the median of the 7 hours centred
 * on it (a Hampel-style spike test, common practice); the hot and cold duties agree within 10 %; and it lies outside
 * every injected instrument fault window (the fault list of the simulation truth; fault detection is another
 * module). A UTC day is usable with at least 12 kept hours; its values are the means of the kept hours and its duty
 * the mean of the hourly hot/cold mean duties (a simple reconciliation). Days without enough kept hours are left out.
 */
const DAY_MS = 86_400_000;
const HALF_WINDOW = 3;
const TEMPERATURE_SPIKE_K = 5;
const FLOW_SPIKE_FRACTION = 0.05;
const MAXIMUM_CLOSURE = 0.1;
const MINIMUM_HOURS = 12;

type Column = "hotInK" | "hotOutK" | "coldInK" | "coldOutK" | "hotFlowKgPerS" | "coldFlowKgPerS";
const COLUMNS: Column[] = ["hotInK", "hotOutK", "coldInK", "coldOutK", "hotFlowKgPerS", "coldFlowKgPerS"];

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = sorted.length >> 1;
  return sorted.length % 2 === 1 ? (sorted[middle] as number) : 0.5 * ((sorted[middle - 1] as number) + (sorted[middle] as number));
}

/** The assessment's view of a demo asset (its spec, without the hidden truth). */
export function assessmentAsset(simulation: DemoAssetSimulation): AssessmentAsset {
  const spec = simulation.asset.spec;
  return {
    arrangement: spec.arrangement,
    areaM2: spec.areaM2,
    hotHeatCapacity: spec.hotStream.heatCapacity,
    coldHeatCapacity: spec.coldStream.heatCapacity,
    designUWPerM2K: spec.designUWPerM2K,
    designFoulingM2KPerW: spec.designFoulingM2KPerW,
    reference: spec.reference,
    dutyThresholdW: spec.dutyThresholdW,
  };
}

/**
 * Cleaning records as a plant would keep them: the return to service of each cleaning, plus the last cleaning (or
 * commissioning) before the data, i.e. the service start of the fouling plan.
 */
export function cleaningRecords(simulation: DemoAssetSimulation): AssessmentCleaning[] {
  const plan = simulation.asset.plan;
  return [
    { timeMs: plan.fouling.serviceStartMs, method: "service start" },
    ...plan.cleanings.map((cleaning) => ({ timeMs: cleaning.endMs, method: cleaning.method })),
  ];
}

/**
 * Hourly periods from the measured readings: every hour with all six readings, usable when kept by the screening
 * above and its UTC day holds at least 12 kept hours (so that their daily means equal dailyPeriods).
 */
export function hourlyPeriods(simulation: DemoAssetSimulation): AssessmentPeriod[] {
  const spec = simulation.asset.spec;
  const readings = simulation.result.readings;
  const faults = simulation.result.faults;
  const count = readings.length;
  const hours: AssessmentPeriod[] = [];
  for (let index = 0; index < count; index += 1) {
    const reading = readings[index];
    if (reading === undefined) continue;
    if (COLUMNS.some((column) => reading[column] === null)) continue;
    const hotFlow = reading.hotFlowKgPerS as number;
    const coldFlow = reading.coldFlowKgPerS as number;
    const hotIn = reading.hotInK as number;
    const hotOut = reading.hotOutK as number;
    const coldIn = reading.coldInK as number;
    const coldOut = reading.coldOutK as number;
    const period: AssessmentPeriod = { startMs: reading.timeMs, hotInK: hotIn, hotOutK: hotOut, coldInK: coldIn, coldOutK: coldOut, hotFlowKgPerS: hotFlow, coldFlowKgPerS: coldFlow, dutyW: 0, usable: false };
    hours.push(period);
    if (hotFlow < 0.5 * spec.reference.hotFlowKgPerS || coldFlow < 0.5 * spec.reference.coldFlowKgPerS) continue;
    if (faults.some((fault) => reading.timeMs >= fault.startMs && (fault.endMs === null || reading.timeMs < fault.endMs))) continue;
    let spike = false;
    for (const column of COLUMNS) {
      const neighbours: number[] = [];
      for (let offset = -HALF_WINDOW; offset <= HALF_WINDOW; offset += 1) {
        const value = readings[index + offset]?.[column];
        if (value !== null && value !== undefined) neighbours.push(value);
      }
      const centre = median(neighbours);
      const limit = column.endsWith("KgPerS") ? FLOW_SPIKE_FRACTION * centre : TEMPERATURE_SPIKE_K;
      if (Math.abs((reading[column] as number) - centre) > limit) spike = true;
    }
    if (spike || !(hotIn > hotOut && coldOut > coldIn && hotIn > coldIn)) continue;
    const hotDuty = streamDuty({ massFlowKgPerS: hotFlow, heatCapacity: spec.hotStream.heatCapacity, inletK: hotIn, outletK: hotOut });
    const coldDuty = streamDuty({ massFlowKgPerS: coldFlow, heatCapacity: spec.coldStream.heatCapacity, inletK: coldIn, outletK: coldOut });
    const mean = 0.5 * (hotDuty + coldDuty);
    if (!(mean > 0) || Math.abs(hotDuty - coldDuty) > MAXIMUM_CLOSURE * mean) continue;
    period.dutyW = mean;
    period.usable = true;
  }
  const keptPerDay = new Map<number, number>();
  for (const hour of hours) {
    if (!hour.usable) continue;
    const day = Math.floor(hour.startMs / DAY_MS);
    keptPerDay.set(day, (keptPerDay.get(day) ?? 0) + 1);
  }
  for (const hour of hours) {
    if (hour.usable && (keptPerDay.get(Math.floor(hour.startMs / DAY_MS)) ?? 0) < MINIMUM_HOURS) hour.usable = false;
  }
  return hours;
}

/** Daily periods: the means of each UTC day's usable hours (see hourlyPeriods and the file comment). */
export function dailyPeriods(simulation: DemoAssetSimulation): AssessmentPeriod[] {
  return dailyMeans(hourlyPeriods(simulation));
}
