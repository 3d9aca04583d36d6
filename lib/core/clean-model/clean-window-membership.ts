const MS_PER_DAY = 86_400_000;

/** Result of cleanWindowMembership. */
export interface CleanWindowMembership {
  /** Window index of each point, −1 outside every window. */
  window: Int32Array;
  /** Days since the window origin (0 outside). */
  elapsedDays: Float64Array;
  /** Origin of each window, epoch ms. */
  originsMs: number[];
}

/**
 * cleanWindowMembership: which points lie in the first windowDays after a window origin (the data start and each
 * cleaning's return to service), where fouling is small and nearly linear in time.
 *
 * Rule: a point at t belongs to the window of the latest origin o ≤ t when t − o < windowDays; origins with no point
 * in their window are dropped.
 * Source: common practice in fouling monitoring (clean-state reference after cleaning); window length is a setting.
 *
 * @param timesMs point times, ascending (not modified)
 * @param originsMs window origins, any order (not modified)
 * @param windowDays > 0
 * @returns membership per point and the kept origins
 */
export function cleanWindowMembership(timesMs: readonly number[], originsMs: readonly number[], windowDays: number): CleanWindowMembership {
  const origins = [...new Set(originsMs)].sort((a, b) => a - b);
  const count = timesMs.length;
  const raw = new Int32Array(count).fill(-1);
  const elapsedDays = new Float64Array(count);
  let originIndex = -1;
  for (let i = 0; i < count; i += 1) {
    const time = timesMs[i] as number;
    while (originIndex + 1 < origins.length && (origins[originIndex + 1] as number) <= time) originIndex += 1;
    if (originIndex < 0) continue;
    const elapsed = (time - (origins[originIndex] as number)) / MS_PER_DAY;
    if (elapsed < windowDays) {
      raw[i] = originIndex;
      elapsedDays[i] = elapsed;
    }
  }
  const used = [...new Set(Array.from(raw).filter((value) => value >= 0))].sort((a, b) => a - b);
  const renumber = new Map(used.map((value, index) => [value, index]));
  const window = raw.map((value) => (value >= 0 ? (renumber.get(value) as number) : -1));
  return { window, elapsedDays, originsMs: used.map((value) => origins[value] as number) };
}
