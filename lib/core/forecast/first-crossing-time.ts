/** Bisection on time stops at this bracket width, days (about 9 s). */
const TIME_TOLERANCE_DAYS = 1e-4;

/**
 * firstCrossingTime: the first time in [fromDays, toDays] at which a curve reaches a level.
 *
 * Method: the curve is sampled on a grid of stepDays; in the first interval whose right end is at or above the level
 * the crossing is found by bisection to 1e-4 day. A crossing that starts and ends within one grid step can be missed
 * (the curves here are smooth and monotone or nearly so, so the grid only has to be finer than their bends).
 * Valid: continuous curves.
 * Source: bisection (Press et al. 2007, Numerical Recipes, 3rd ed., Sect. 9.1, from memory).
 *
 * @param curve value at a time in days (vectorised: called with a whole grid, then with single times)
 * @param level the level to reach
 * @param fromDays start of the search (returned when the curve is already at or above the level there)
 * @param toDays end of the search
 * @param stepDays grid spacing, > 0
 * @returns the crossing time in days, or null when the level is not reached in [fromDays, toDays]
 */
export function firstCrossingTime(
  curve: (timesDays: readonly number[]) => number[],
  level: number,
  fromDays: number,
  toDays: number,
  stepDays: number,
): number | null {
  if (!(stepDays > 0)) throw new RangeError(`firstCrossingTime: stepDays must be positive, got ${stepDays}`);
  if (toDays < fromDays) return null;
  const steps = Math.max(1, Math.ceil((toDays - fromDays) / stepDays));
  const grid = Array.from({ length: steps + 1 }, (_, index) => Math.min(toDays, fromDays + index * stepDays));
  const values = curve(grid);
  if ((values[0] as number) >= level) return fromDays;
  for (let index = 1; index < grid.length; index += 1) {
    if ((values[index] as number) < level) continue;
    let low = grid[index - 1] as number;
    let high = grid[index] as number;
    while (high - low > TIME_TOLERANCE_DAYS) {
      const middle = 0.5 * (low + high);
      if ((curve([middle])[0] as number) >= level) high = middle;
      else low = middle;
    }
    return high;
  }
  return null;
}
