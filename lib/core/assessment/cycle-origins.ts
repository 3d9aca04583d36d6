import type { AssessmentCleaning } from "./types";

/**
 * cycleOrigins: the start of each fouling cycle covered by the data.
 *
 * Rule: the first cycle starts at the latest cleaning at or before the first data point (its fouling clock runs
 * from there), or at the first data point when no such record exists; every later cleaning up to asOf starts a new
 * cycle. Cleanings are taken at their return to service (AssessmentCleaning.timeMs).
 * Source: cycle definition of the simulator and of common practice (a cycle runs from one cleaning to the next).
 *
 * @param firstDataMs time of the first usable data point
 * @param cleanings cleaning records in any order (not modified)
 * @param asOfMs the assessment instant
 * @returns cycle origins, ascending, epoch ms; and whether the first one is a recorded cleaning
 */
export function cycleOrigins(
  firstDataMs: number,
  cleanings: readonly AssessmentCleaning[],
  asOfMs: number,
): { originsMs: number[]; firstIsRecorded: boolean } {
  const times = [...new Set(cleanings.map((cleaning) => cleaning.timeMs))].filter((time) => time <= asOfMs).sort((a, b) => a - b);
  const earlier = times.filter((time) => time <= firstDataMs);
  const later = times.filter((time) => time > firstDataMs);
  const first = earlier.length > 0 ? (earlier[earlier.length - 1] as number) : firstDataMs;
  return { originsMs: [first, ...later], firstIsRecorded: earlier.length > 0 };
}
