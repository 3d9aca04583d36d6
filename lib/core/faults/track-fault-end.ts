/** Input of {@link trackFaultEnd}. */
export interface TrackingInput {
  timeMs: Float64Array;
  /** 1 for samples to use; not modified. */
  available: Uint8Array;
  /** Tracking starts after this sample (the fault is known present up to it). */
  fromIndex: number;
  /** [information, score] of the named instrument for one sample (energy balance alone). */
  formsAt: (index: number) => [number, number];
  /** +1 or −1: the sign of the fault. */
  direction: number;
  blockMs: number;
  /** A block shows the fault when direction·S/√I ≥ presenceZ. */
  presenceZ: number;
  /** The fault ends after this many blocks in a row without it. */
  clearBlocks: number;
  /** Blocks with fewer samples are passed over [4]. */
  minimumBlockSamples?: number;
}

/**
 * trackFaultEnd: follows a named fault forward in fixed blocks and returns the first sample of the first of
 * `clearBlocks` consecutive blocks in which it no longer shows (null: present to the end of the data).
 *
 * Rule: per block, z = S/√I (the signed square root of the GLR statistic of the named instrument); the fault shows
 * when direction·z ≥ presenceZ. Blocks with too few samples count neither way.
 * Source: block-wise GLR magnitude test (Narasimhan & Mah 1987); the run rule is a choice (2 clear days in a row).
 */
export function trackFaultEnd(input: TrackingInput): number | null {
  const { timeMs, available, blockMs } = input;
  const minimumBlockSamples = input.minimumBlockSamples ?? 4;
  let blockStartMs = timeMs[input.fromIndex] as number;
  let information = 0;
  let score = 0;
  let members = 0;
  let blockFirst = -1;
  let clearRun = 0;
  let clearStart = -1;
  const closeBlock = (): void => {
    if (members >= minimumBlockSamples) {
      const z = information > 0 ? score / Math.sqrt(information) : 0;
      if (z * input.direction >= input.presenceZ) {
        clearRun = 0;
        clearStart = -1;
      } else {
        if (clearRun === 0) clearStart = blockFirst;
        clearRun += 1;
      }
    }
    information = 0;
    score = 0;
    members = 0;
    blockFirst = -1;
  };
  for (let index = input.fromIndex + 1; index < available.length; index += 1) {
    if (available[index] !== 1) continue;
    const t = timeMs[index] as number;
    while (t >= blockStartMs + blockMs) {
      closeBlock();
      blockStartMs += blockMs;
      if (clearRun >= input.clearBlocks) return clearStart;
    }
    const [a, q] = input.formsAt(index);
    information += a;
    score += q;
    members += 1;
    if (blockFirst < 0) blockFirst = index;
  }
  closeBlock();
  return clearRun >= input.clearBlocks ? clearStart : null;
}
