import type { ScreeningResult } from "../screening/screen-samples";
import type { ExchangerModel, InstrumentRole, ReadingColumns } from "../screening/types";
import { detectBalanceFaults, type BalanceFaultOptions } from "./detect-balance-faults";
import { detectSpikeBursts, type SpikeBurstOptions } from "./detect-spike-bursts";
import { detectStuckSignals, type StuckSignalOptions } from "./detect-stuck-signals";
import { faultExclusionFlags } from "./fault-exclusion-flags";
import type { InstrumentAlert } from "./types";

const ROLES: readonly InstrumentRole[] = ["hotIn", "hotOut", "coldIn", "coldOut", "hotFlow", "coldFlow"];

/** Options of {@link detectInstrumentFaults}. */
export interface InstrumentFaultOptions {
  stuck?: StuckSignalOptions;
  spikes?: SpikeBurstOptions & {
    /**
     * Only outliers this many robust scale units from the window median count towards a burst [5]. Screening drops
     * samples beyond 3 units, but on hourly data 0.3–0.8 % of healthy readings per instrument go beyond 3 (process
     * wander inside the 13-hour window; measured on the demo fleet), enough for chance "bursts"; beyond 5 almost none
     * do, while real spikes (tens of σ) all still count.
     */
    strongThreshold?: number;
  };
  balance?: BalanceFaultOptions;
}

/**
 * detectInstrumentFaults: all instrument alerts of one exchanger: stuck readings, bursts of spikes, and faults that
 * upset the heat balance (drift, bias, span error), each with start, end, size and evidence.
 *
 * Order: stuck readings first (detectStuckSignals, on in-service samples); their spans are left out of the heat-balance analysis, which a
 * frozen flow or temperature would otherwise disturb. Spike bursts from the Hampel deviations of screened (not
 * missing, not transient) samples (detectSpikeBursts). Then detectBalanceFaults on samples that are not missing,
 * transient, outliers, impossible or stuck.
 * Source: see the three detectors.
 *
 * @param columns readings sorted by time; not modified.
 * @param model exchanger model.
 * @param screening result of screenSamples on the same columns.
 * @param options detector settings.
 * @returns alerts sorted by start.
 */
export function detectInstrumentFaults(
  columns: ReadingColumns,
  model: ExchangerModel,
  screening: ScreeningResult,
  options: InstrumentFaultOptions = {},
): InstrumentAlert[] {
  const count = columns.timeMs.length;
  const { flags } = screening;
  const stuck = detectStuckSignals(columns, model, screening.uncertainties, { consider: screening.inService, ...options.stuck });

  const strongThreshold = options.spikes?.strongThreshold ?? 5;
  const strong = {} as Record<InstrumentRole, Uint8Array>;
  for (const role of ROLES) {
    const scores = screening.outlierScores[role];
    const marks = new Uint8Array(count);
    for (let index = 0; index < count; index += 1) {
      if ((scores[index] as number) > strongThreshold && flags.transient[index] !== 1) marks[index] = 1;
    }
    strong[role] = marks;
  }
  const spikes = detectSpikeBursts(columns.timeMs, strong, model, options.spikes);

  const stuckSpans = faultExclusionFlags(columns.timeMs, stuck, { kinds: ["stuck"] }).fault;
  const usable = new Uint8Array(count);
  for (let index = 0; index < count; index += 1) {
    const excluded =
      flags.missing[index] === 1 || flags.transient[index] === 1 || flags.outlier[index] === 1 || flags.impossible[index] === 1 || stuckSpans[index] !== 0;
    usable[index] = excluded ? 0 : 1;
  }
  const balance = detectBalanceFaults(columns, model, screening.uncertainties, usable, { inService: screening.inService, ...options.balance });
  return [...stuck, ...spikes, ...balance].sort((a, b) => a.startMs - b.startMs || a.role.localeCompare(b.role));
}
