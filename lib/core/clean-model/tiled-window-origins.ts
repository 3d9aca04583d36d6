const MS_PER_DAY = 86_400_000;

/**
 * tiledWindowOrigins: window origins that tile the whole record, windowDays apart, restarting at every cleaning.
 *
 * Rule: for each origin o_k (the data start and each cleaning), origins o_k + j·windowDays for j = 0, 1, … while
 * before o_(k+1) (or before endMs for the last one).
 * Source: local detrending by piecewise-linear segments (each window gets its own offset and drift in fitCleanModel);
 * common practice for separating a slow drift from fast regressors.
 *
 * @param originsMs data start and cleanings, any order (not modified)
 * @param endMs last data time
 * @param windowDays window length, > 0
 * @returns ascending origins
 */
export function tiledWindowOrigins(originsMs: readonly number[], endMs: number, windowDays: number): number[] {
  if (!(windowDays > 0)) throw new RangeError(`tiledWindowOrigins: windowDays must be positive, got ${windowDays}`);
  const sorted = [...new Set(originsMs)].sort((a, b) => a - b);
  const result: number[] = [];
  sorted.forEach((origin, index) => {
    const stop = sorted[index + 1] ?? endMs + 1;
    for (let time = origin; time < stop; time += windowDays * MS_PER_DAY) result.push(time);
  });
  return result;
}
