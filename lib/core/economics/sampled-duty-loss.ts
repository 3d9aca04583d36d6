import { EconomicsInputError } from "./errors";
import type { DutyLossForecast } from "./types";

/** A duty-loss forecast sampled at increasing ages, e.g. the P50 line of the fouling forecast. */
export interface DutyLossSeries {
  /** Days since return to service, strictly increasing, first >= 0. */
  elapsedDays: readonly number[];
  /** Duty loss at those ages, W, finite and >= 0. */
  dutyLossW: readonly number[];
}

/**
 * sampledDutyLoss: a duty-loss forecast that interpolates a sampled series linearly, with its exact integral.
 *
 * Formula: ΔQ(t) = ΔQ_i + (ΔQ_(i+1) − ΔQ_i)·(t − t_i)/(t_(i+1) − t_i) on [t_i, t_(i+1)]; held at the first value
 * before t_0 and at the last value after t_n (sample the forecast past the planning horizon); the integral of each
 * piece is the trapezoid (t_(i+1) − t_i)·(ΔQ_i + ΔQ_(i+1))/2, exact for the interpolant.
 * Validity: any finite, non-negative samples; the optimisers assume the series does not decrease.
 * Source: linear interpolation and trapezoid rule (exact for piecewise-linear functions).
 *
 * @param series ages and losses (copied)
 * @returns a DutyLossForecast with dutyLossIntegralWDays
 * @throws EconomicsInputError on empty, unequal, non-increasing or non-finite series
 */
export function sampledDutyLoss(series: DutyLossSeries): DutyLossForecast {
  const days = Float64Array.from(series.elapsedDays);
  const losses = Float64Array.from(series.dutyLossW);
  const count = days.length;
  if (count === 0 || losses.length !== count) {
    throw new EconomicsInputError(
      "duty-loss series",
      `duty-loss series needs equal, non-zero numbers of ages and losses, got ${count} and ${losses.length}`,
    );
  }
  for (let index = 0; index < count; index += 1) {
    const day = days[index] as number;
    const loss = losses[index] as number;
    if (!Number.isFinite(day) || !Number.isFinite(loss) || loss < 0 || (index === 0 ? day < 0 : day <= (days[index - 1] as number))) {
      throw new EconomicsInputError(
        "duty-loss series",
        `duty-loss series needs finite strictly increasing ages from >= 0 and finite losses >= 0; sample ${index} is (${day} days, ${loss} W)`,
      );
    }
  }
  // Cumulative trapezoid integral at each sample, W·days.
  const cumulative = new Float64Array(count);
  for (let index = 1; index < count; index += 1) {
    cumulative[index] =
      (cumulative[index - 1] as number) +
      0.5 * ((days[index] as number) - (days[index - 1] as number)) * ((losses[index] as number) + (losses[index - 1] as number));
  }
  const firstDay = days[0] as number;
  const lastDay = days[count - 1] as number;
  const firstLoss = losses[0] as number;
  const lastLoss = losses[count - 1] as number;

  /** Index i with days[i] <= t < days[i + 1], for firstDay <= t < lastDay (binary search). */
  const segment = (t: number): number => {
    let low = 0;
    let high = count - 1;
    while (high - low > 1) {
      const middle = (low + high) >>> 1;
      if ((days[middle] as number) <= t) low = middle;
      else high = middle;
    }
    return low;
  };
  const lossAt = (t: number): number => {
    if (t <= firstDay) return firstLoss;
    if (t >= lastDay) return lastLoss;
    const index = segment(t);
    const left = days[index] as number;
    const right = days[index + 1] as number;
    const leftLoss = losses[index] as number;
    return leftLoss + ((losses[index + 1] as number) - leftLoss) * ((t - left) / (right - left));
  };
  /** ∫ from firstDay (or from t when t < firstDay, negatively) to t, W·days. */
  const integralTo = (t: number): number => {
    if (t <= firstDay) return (t - firstDay) * firstLoss;
    if (t >= lastDay) return (cumulative[count - 1] as number) + (t - lastDay) * lastLoss;
    const index = segment(t);
    const left = days[index] as number;
    return (cumulative[index] as number) + 0.5 * (t - left) * ((losses[index] as number) + lossAt(t));
  };
  return {
    dutyLossW: lossAt,
    dutyLossIntegralWDays: (fromDays, toDays) => integralTo(toDays) - integralTo(fromDays),
  };
}
