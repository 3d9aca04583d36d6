// Assessment benchmark: assessAsset on (1) one exchanger with five years of hourly data (about 43,800 periods),
// (2) the 24-asset demo fleet, (3) 500 assessments (the demo inputs in turn), each beside the time of a plain linear
// least-squares fit of the same data (OLS of Rf on time) as a ratio.
// Run: node --import tsx scripts/bench/assess.ts [--count 500] [--json (figures as one JSON line on stdout)]
// Pure computation, no database. Times are medians of repeated runs after a warm-up: wall clock, and the process CPU
// time (user + system, which includes V8's helper threads), since on a shared machine the wall clock also counts the
// time other processes hold the cores.
import { assessAsset, type AssessmentAsset, type AssessmentCleaning, type AssessmentInput, type AssessmentPeriod } from "../../lib/core/assessment";
import { linearLeastSquares } from "../../lib/core/fit";
import { streamDuty, type HeatCapacity } from "../../lib/core/thermal";
import type { ExchangerSpec, SimulationResult } from "../../lib/core/simulate";
import { DEMO_END_MS, demoFleet, simulateDemoFleet } from "../../lib/demo";
import { fiveYearSimulation } from "./assess-sample-data";

const DAY_MS = 86_400_000;
const json = process.argv.includes("--json");
const countArgument = process.argv.indexOf("--count");
const COUNT = countArgument > 0 ? Number(process.argv[countArgument + 1]) : 500;
const log = (message: string) => (json ? console.error(message) : console.log(message));

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)] as number;
}

interface Timing {
  wallMs: number;
  cpuMs: number;
}

/** Median wall and CPU time of `runs` calls after `warmUp` calls, ms. */
function time(work: () => void, runs: number, warmUp = 3): Timing {
  for (let index = 0; index < warmUp; index += 1) work();
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let index = 0; index < runs; index += 1) {
    const startCpu = process.cpuUsage();
    const start = performance.now();
    work();
    wall.push(performance.now() - start);
    const used = process.cpuUsage(startCpu);
    cpu.push((used.user + used.system) / 1000);
  }
  return { wallMs: median(wall), cpuMs: median(cpu) };
}

function describe(timing: Timing, digits = 1): string {
  return `${timing.wallMs.toFixed(digits)} ms wall (${timing.cpuMs.toFixed(digits)} ms CPU)`;
}

/** Hourly periods from simulated readings: complete rows, both flows at least half of reference, duties within 10 %. */
function duty(massFlowKgPerS: number, heatCapacity: HeatCapacity, inletK: number, outletK: number): number {
  return streamDuty({ massFlowKgPerS, heatCapacity, inletK, outletK });
}

function hourlyPeriods(spec: ExchangerSpec, result: SimulationResult): AssessmentPeriod[] {
  const periods: AssessmentPeriod[] = [];
  for (const reading of result.readings) {
    const { hotInK, hotOutK, coldInK, coldOutK, hotFlowKgPerS, coldFlowKgPerS } = reading;
    if (hotInK === null || hotOutK === null || coldInK === null || coldOutK === null || hotFlowKgPerS === null || coldFlowKgPerS === null) continue;
    let usable = hotFlowKgPerS >= 0.5 * spec.reference.hotFlowKgPerS && coldFlowKgPerS >= 0.5 * spec.reference.coldFlowKgPerS;
    usable = usable && hotInK > hotOutK && coldOutK > coldInK && hotInK > coldInK;
    let dutyW = 0;
    if (usable) {
      const hot = duty(hotFlowKgPerS, spec.hotStream.heatCapacity, hotInK, hotOutK);
      const cold = duty(coldFlowKgPerS, spec.coldStream.heatCapacity, coldInK, coldOutK);
      dutyW = 0.5 * (hot + cold);
      usable = Math.abs(hot - cold) <= 0.1 * dutyW;
    }
    periods.push({ startMs: reading.timeMs, hotInK, hotOutK, coldInK, coldOutK, hotFlowKgPerS, coldFlowKgPerS, dutyW, usable });
  }
  return periods;
}

function assetOf(spec: ExchangerSpec): AssessmentAsset {
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

/** The plain comparison: OLS of the assessment's daily Rf series on time. */
function plainFit(input: AssessmentInput, series: { timeMs: number; foulingM2KPerW: number }[]): () => void {
  const design = series.flatMap((point) => [1, (point.timeMs - input.asOfMs) / DAY_MS]);
  const response = series.map((point) => point.foulingM2KPerW);
  return () => {
    linearLeastSquares({ design, response, columns: 2 });
  };
}

// 1. One exchanger, five years of hourly data.
const five = fiveYearSimulation();
const fiveInput: AssessmentInput = {
  asset: assetOf(five.spec),
  periods: hourlyPeriods(five.spec, five.result),
  cleanings: five.cleanings satisfies AssessmentCleaning[],
  asOfMs: five.endMs,
};
const fiveAssessment = assessAsset(fiveInput);
const fiveMs = time(() => assessAsset(fiveInput), 15);
const fiveOlsMs = time(plainFit(fiveInput, fiveAssessment.foulingResistance.series), 50);
log(`one asset, five years hourly (${fiveInput.periods.length} periods, ${fiveAssessment.foulingResistance.series.length} usable days, ${fiveAssessment.cycles.length} cycles):`);
log(`  assessAsset ${describe(fiveMs)}; OLS of Rf on time ${describe(fiveOlsMs, 3)}; ratio ${(fiveMs.wallMs / fiveOlsMs.wallMs).toFixed(0)} (wall)`);
log(`  (duty P50 ${fiveAssessment.forecasts.duty.p50 ?? "beyond horizon"}, model ${fiveAssessment.trend?.model ?? "none"})`);

// 2. The demo fleet (24 assets, about 2.25 years of hourly data each, given hourly).
const fleet = simulateDemoFleet();
const fleetInputs: AssessmentInput[] = fleet.map((simulation) => {
  const spec = simulation.asset.spec;
  return {
    asset: assetOf(spec),
    periods: hourlyPeriods(spec, simulation.result),
    cleanings: [
      { timeMs: simulation.asset.plan.fouling.serviceStartMs },
      ...simulation.asset.plan.cleanings.map((cleaning) => ({ timeMs: cleaning.endMs })),
    ],
    asOfMs: DEMO_END_MS,
  };
});
const fleetAssessments = fleetInputs.map((input) => assessAsset(input));
const fleetMs = time(() => fleetInputs.forEach((input) => assessAsset(input)), 5, 1);
const fleetPlain = fleetInputs.map((input, index) => plainFit(input, fleetAssessments[index]?.foulingResistance.series ?? []));
const fleetOlsMs = time(() => fleetPlain.forEach((fit) => fit()), 20);
log(`demo fleet, ${fleetInputs.length} assets (${demoFleet().assets.length} in the fleet), hourly input:`);
log(`  assessAsset ${describe(fleetMs, 0)} in all, ${(fleetMs.wallMs / fleetInputs.length).toFixed(1)} ms wall per asset; OLS ${describe(fleetOlsMs, 2)}; ratio ${(fleetMs.wallMs / fleetOlsMs.wallMs).toFixed(0)} (wall)`);

// 3. COUNT (500) assessments: the demo inputs in turn (actual run), and the five-year figure extrapolated.
const fiveHundred = Array.from({ length: COUNT }, (_, index) => fleetInputs[index % fleetInputs.length] as AssessmentInput);
const fiveHundredMs = time(() => fiveHundred.forEach((input) => assessAsset(input)), 1, 0);
log(`${COUNT} assessments (demo inputs in turn, actual run): ${(fiveHundredMs.wallMs / 1000).toFixed(2)} s wall (${(fiveHundredMs.cpuMs / 1000).toFixed(2)} s CPU)`);
log(`500 assets with five years of hourly data (extrapolated from 1.): ${((500 * fiveMs.wallMs) / 1000).toFixed(1)} s wall (${((500 * fiveMs.cpuMs) / 1000).toFixed(1)} s CPU)`);
if (json) {
  console.log(
    JSON.stringify({
      fiveYears: { periods: fiveInput.periods.length, assess: fiveMs, ols: fiveOlsMs, ratioWall: fiveMs.wallMs / fiveOlsMs.wallMs, ratioCpu: fiveMs.cpuMs / fiveOlsMs.cpuMs },
      demoFleet: { assets: fleetInputs.length, assess: fleetMs, ols: fleetOlsMs, ratioWall: fleetMs.wallMs / fleetOlsMs.wallMs, ratioCpu: fleetMs.cpuMs / fleetOlsMs.cpuMs },
      many: { count: COUNT, wallMs: fiveHundredMs.wallMs, cpuMs: fiveHundredMs.cpuMs },
    }),
  );
}
