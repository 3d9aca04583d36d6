/** Block means for the CUSUM and the samples each block spans. */
export interface CusumBlocks {
  /** Σz/√n of the block's samples: standard normal in control. */
  values: Float64Array;
  /** First and last sample index of each block. */
  first: Int32Array;
  last: Int32Array;
}

/**
 * cusumBlocks: groups standardised values into fixed time blocks (aligned to multiples of the block length since
 * 1970-01-01 UTC) and returns each block's scaled sum Σz/√n, which is N(0, 1) when the z are independent N(0, 1).
 * With hourly data and hourly blocks each block is one sample; with minute data a block is an hour, which keeps the
 * CUSUM's run length in hours whatever the sampling rate.
 * Source: common practice (rational subgroups for a CUSUM of means, Montgomery 2009, Sect. 9.1.6; from memory).
 *
 * @param timeMs sample times, sorted.
 * @param values standardised values, NaN to skip; not modified.
 * @param blockMs block length, ms (> 0).
 */
export function cusumBlocks(timeMs: Float64Array, values: Float64Array, blockMs: number): CusumBlocks {
  if (!(blockMs > 0)) throw new RangeError(`block length must be positive, got ${blockMs}`);
  const sums: number[] = [];
  const first: number[] = [];
  const last: number[] = [];
  let currentBlock = Number.NaN;
  let sum = 0;
  let members = 0;
  let firstIndex = -1;
  let lastIndex = -1;
  const flush = (): void => {
    if (members > 0) {
      sums.push(sum / Math.sqrt(members));
      first.push(firstIndex);
      last.push(lastIndex);
    }
    sum = 0;
    members = 0;
  };
  for (let index = 0; index < values.length; index += 1) {
    const value = values[index] as number;
    if (!Number.isFinite(value)) continue;
    const block = Math.floor((timeMs[index] as number) / blockMs);
    if (block !== currentBlock) {
      flush();
      currentBlock = block;
      firstIndex = index;
    }
    sum += value;
    members += 1;
    lastIndex = index;
  }
  flush();
  return { values: Float64Array.from(sums), first: Int32Array.from(first), last: Int32Array.from(last) };
}
