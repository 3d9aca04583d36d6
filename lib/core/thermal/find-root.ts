/**
 * Brent's method for a root of a continuous function on a bracket [lower, upper] where the function changes
 * sign (inverse quadratic interpolation, secant and bisection steps, never leaving the bracket).
 *
 * Source: Brent (1973), Algorithms for Minimization without Derivatives, Prentice-Hall, Ch. 4 (procedure zero);
 * same algorithm as Press et al. (2007), Numerical Recipes, 3rd ed., Sect. 9.3 (variable names there: b = best,
 * a = previous, c = counterpoint, d = step, e = previous step).
 * Convergence: stops when half the bracket is at most 2·ε_machine·|x| + absoluteTolerance/2, i.e. to
 * machine precision relative to the root by default.
 *
 * @param fn continuous function with fn(lower) and fn(upper) of opposite sign (or one of them zero)
 * @returns the root
 * @throws Error when the bracket does not change sign (a programming error in the caller, not user input)
 */
export function findRoot(
  fn: (x: number) => number,
  lower: number,
  upper: number,
  absoluteTolerance = 0,
  maximumIterations = 200,
): number {
  let previous = lower;
  let best = upper;
  let previousValue = fn(previous);
  let bestValue = fn(best);
  if (previousValue === 0) return previous;
  if (bestValue === 0) return best;
  if (previousValue > 0 === bestValue > 0) {
    throw new Error(`findRoot: [${lower}, ${upper}] does not bracket a root (f = ${previousValue}, ${bestValue})`);
  }
  let counterpoint = previous;
  let counterValue = previousValue;
  let step = best - previous;
  let previousStep = step;
  for (let iteration = 0; iteration < maximumIterations; iteration += 1) {
    if (bestValue > 0 === counterValue > 0) {
      counterpoint = previous;
      counterValue = previousValue;
      step = best - previous;
      previousStep = step;
    }
    if (Math.abs(counterValue) < Math.abs(bestValue)) {
      previous = best;
      best = counterpoint;
      counterpoint = previous;
      previousValue = bestValue;
      bestValue = counterValue;
      counterValue = previousValue;
    }
    const tolerance = 2 * Number.EPSILON * Math.abs(best) + absoluteTolerance / 2;
    const halfBracket = (counterpoint - best) / 2;
    if (Math.abs(halfBracket) <= tolerance || bestValue === 0) {
      return best;
    }
    if (Math.abs(previousStep) >= tolerance && Math.abs(previousValue) > Math.abs(bestValue)) {
      let numerator: number;
      let denominator: number;
      const bestOverPrevious = bestValue / previousValue;
      if (previous === counterpoint) {
        // secant step
        numerator = 2 * halfBracket * bestOverPrevious;
        denominator = 1 - bestOverPrevious;
      } else {
        // inverse quadratic interpolation
        const bestOverCounter = bestValue / counterValue;
        const previousOverCounter = previousValue / counterValue;
        numerator =
          bestOverPrevious *
          (2 * halfBracket * previousOverCounter * (previousOverCounter - bestOverCounter) -
            (best - previous) * (bestOverCounter - 1));
        denominator = (previousOverCounter - 1) * (bestOverCounter - 1) * (bestOverPrevious - 1);
      }
      if (numerator > 0) {
        denominator = -denominator;
      } else {
        numerator = -numerator;
      }
      const interpolationAcceptable =
        2 * numerator <
        Math.min(3 * halfBracket * denominator - Math.abs(tolerance * denominator), Math.abs(previousStep * denominator));
      if (interpolationAcceptable) {
        previousStep = step;
        step = numerator / denominator;
      } else {
        step = halfBracket;
        previousStep = step;
      }
    } else {
      step = halfBracket;
      previousStep = step;
    }
    previous = best;
    previousValue = bestValue;
    best += Math.abs(step) > tolerance ? step : halfBracket > 0 ? tolerance : -tolerance;
    bestValue = fn(best);
  }
  return best;
}
