import { exchangerBalance } from "../reconcile/exchanger-balance";
import type { InstrumentUncertainties } from "../screening/instrument-uncertainties";
import { MAD_SCALE_FACTOR } from "../screening/mad-scale-factor";
import { medianValue } from "../screening/median-value";
import { operatingPointAt } from "../screening/operating-point-at";
import type { ExchangerModel, ReadingColumns } from "../screening/types";
import { ThermalInputError } from "../thermal";

/** Result of {@link normalisedBalanceResiduals}. */
export interface NormalisedBalanceResiduals {
  /** g/σ_g per sample, NaN where the sample is not available or the balance cannot be computed. */
  values: Float64Array;
  /**
   * κ = max(1, robust σ of the values from successive differences): divide by it so that stated uncertainties that
   * are too optimistic do not flood the detector with alarms (never below the stated uncertainties).
   */
  inflation: number;
}

/**
 * normalisedBalanceResiduals: the energy-balance residual of each available sample divided by its standard deviation.
 *
 * Formula: z_t = g(y_t)/σ_g,t, σ_g,t² = Σ_i (∂g/∂x_i · σ_i)² (first-order propagation, V diagonal);
 * κ = max(1, 1.4826·median|z_t − z_(t−1)|/√2) over successive available samples (the median absolute successive
 * difference estimates σ without being moved by level shifts, i.e. by the faults being looked for).
 * Valid: independent reading errors; σ of flows relative to the reading. Source: GUM (JCGM 100:2008), Eq. 10
 * (law of propagation of uncertainty); successive-difference scale, von Neumann et al. (1941), Ann. Math. Statist.
 * 12:153–162 (from memory), made robust with the MAD.
 *
 * @param available 1 for samples to use; not modified.
 */
export function normalisedBalanceResiduals(
  columns: ReadingColumns,
  model: ExchangerModel,
  uncertainties: InstrumentUncertainties,
  available: Uint8Array,
): NormalisedBalanceResiduals {
  const count = columns.timeMs.length;
  const values = new Float64Array(count).fill(Number.NaN);
  const temperatureVariance = [uncertainties.hotIn ** 2, uncertainties.hotOut ** 2, uncertainties.coldIn ** 2, uncertainties.coldOut ** 2];
  for (let index = 0; index < count; index += 1) {
    if (available[index] !== 1) continue;
    const point = operatingPointAt(columns, index);
    try {
      const gradient = exchangerBalance(point, model.hotHeatCapacity, model.coldHeatCapacity);
      const [a, b, c, d, e, f] = gradient.gradient;
      const variance =
        a * a * (temperatureVariance[0] as number) +
        b * b * (temperatureVariance[1] as number) +
        c * c * (temperatureVariance[2] as number) +
        d * d * (temperatureVariance[3] as number) +
        (e * uncertainties.hotFlow * point.hotFlowKgPerS) ** 2 +
        (f * uncertainties.coldFlow * point.coldFlowKgPerS) ** 2;
      if (variance > 0) values[index] = gradient.residualW / Math.sqrt(variance);
    } catch (error) {
      if (!(error instanceof ThermalInputError)) throw error;
    }
  }
  const differences: number[] = [];
  let previous = Number.NaN;
  for (let index = 0; index < count; index += 1) {
    const value = values[index] as number;
    if (!Number.isFinite(value)) continue;
    if (Number.isFinite(previous)) differences.push(Math.abs(value - previous));
    previous = value;
  }
  const spread = differences.length >= 10 ? (MAD_SCALE_FACTOR * medianValue(differences)) / Math.SQRT2 : 1;
  return { values, inflation: Math.max(1, Number.isFinite(spread) ? spread : 1) };
}
