import { FAULT_CANDIDATES, type FaultCandidate } from "./fault-candidates";
import { glrQuadraticForms } from "./glr-quadratic-forms";
import { glrStatistic } from "./glr-statistic";
import type { SampleEvidence } from "./sample-evidence";

const DAY_MS = 86_400_000;

/** Input of {@link isolateFault}. */
export interface IsolationInput {
  timeMs: Float64Array;
  /** 1 for samples to use; not modified. */
  available: Uint8Array;
  /** First sample of the window (the CUSUM onset). */
  onsetIndex: number;
  /** Sample at which the CUSUM alarmed. */
  alarmIndex: number;
  /** The evidence of one sample. */
  evidenceAt: (index: number) => SampleEvidence;
  /** Name once the best statistic beats the runner-up by this much. */
  isolationMargin: number;
  /** Longest window after the onset, ms. */
  maximumIsolationMs: number;
  /** χ²₁ critical value of the confirmation on the samples after the alarm. */
  confirmationCritical: number;
  /** Fewest samples after the alarm before naming. */
  minimumConfirmationSamples: number;
}

/** A ranked candidate. */
export interface RankedCandidate {
  candidate: FaultCandidate;
  /** max(T_constant, T_ramp) (flows: T_constant). */
  statistic: number;
  /** Constant-offset estimate b̂ (K or first-order fraction). */
  estimate: number;
}

/** Result of {@link isolateFault}. */
export interface Isolation {
  candidate: FaultCandidate;
  /** Sample at which the fault was named. */
  namingIndex: number;
  /** Samples in the window. */
  windowSamples: number;
  /** All six candidates, best first. */
  ranking: RankedCandidate[];
  /** The margin was not reached before the window closed. */
  ambiguous: boolean;
  /** Energy-balance GLR statistic of the named candidate on the samples after the alarm. */
  confirmationStatistic: number;
}

/**
 * isolateFault: names the instrument behind a heat-balance alarm by the GLR test over a window that grows from the
 * onset, and confirms it on data after the alarm.
 *
 * Rule: for each candidate accumulate I = Σ sᵀΣ⁻¹s, S = Σ sᵀΣ⁻¹ρ from the onset, and for thermometers also the ramp
 * form (s·Δt): statistic = max(S²/I, S_r²/I_r). From the alarm on, once at least minimumConfirmationSamples samples
 * follow it: name the best candidate when (a) its energy-balance-only statistic on the samples after the alarm
 * reaches the confirmation critical value with the same sign as its estimate on the whole window (the balance is
 * what alarmed; the rate residual alone can also move with fouling), and (b) it beats the runner-up by
 * isolationMargin, or the window has reached maximumIsolationMs. If (a) never holds within the window the alarm is
 * not confirmed (null): the CUSUM window is selected to look faulty, so only later data can confirm it.
 * Source: GLR for a bias of unknown magnitude, Narasimhan & Mah (1987), AIChE J. 33(9):1514–1521; sequential
 * stopping on a likelihood-ratio gap in the spirit of Wald (1945), Ann. Math. Statist. 16:117–186.
 */
export function isolateFault(input: IsolationInput): Isolation | null {
  const { timeMs, available, onsetIndex, alarmIndex } = input;
  const onsetMs = timeMs[onsetIndex] as number;
  const information = new Float64Array(6);
  const score = new Float64Array(6);
  const rampInformation = new Float64Array(6);
  const rampScore = new Float64Array(6);
  const postInformation = new Float64Array(6);
  const postScore = new Float64Array(6);
  let windowSamples = 0;
  let postSamples = 0;
  let nextAvailable = -1;
  const findNext = (from: number): number => {
    for (let index = from; index < available.length; index += 1) if (available[index] === 1) return index;
    return -1;
  };
  for (let index = findNext(onsetIndex); index >= 0; index = nextAvailable) {
    nextAvailable = findNext(index + 1);
    const elapsedMs = (timeMs[index] as number) - onsetMs;
    if (elapsedMs > input.maximumIsolationMs && index > alarmIndex) break;
    const evidence = input.evidenceAt(index);
    const ramp = elapsedMs / DAY_MS;
    for (let c = 0; c < 6; c += 1) {
      const [a, q] = glrQuadraticForms(evidence, c);
      information[c] = (information[c] as number) + a;
      score[c] = (score[c] as number) + q;
      rampInformation[c] = (rampInformation[c] as number) + ramp * ramp * a;
      rampScore[c] = (rampScore[c] as number) + ramp * q;
      if (index > alarmIndex) {
        const [balanceInformation, balanceScore] = glrQuadraticForms(evidence, c, true);
        postInformation[c] = (postInformation[c] as number) + balanceInformation;
        postScore[c] = (postScore[c] as number) + balanceScore;
      }
    }
    windowSamples += 1;
    if (index > alarmIndex) postSamples += 1;
    if (index < alarmIndex || postSamples < input.minimumConfirmationSamples) continue;
    const ranking: RankedCandidate[] = FAULT_CANDIDATES.map((candidate, c) => ({
      candidate,
      statistic: Math.max(
        glrStatistic(score[c] as number, information[c] as number),
        candidate.kind === "bias" ? glrStatistic(rampScore[c] as number, rampInformation[c] as number) : 0,
      ),
      estimate: (information[c] as number) > 0 ? (score[c] as number) / (information[c] as number) : 0,
    })).sort((a, b) => b.statistic - a.statistic);
    const best = ranking[0] as RankedCandidate;
    const second = ranking[1] as RankedCandidate;
    const c = best.candidate.index;
    const confirmationStatistic = glrStatistic(postScore[c] as number, postInformation[c] as number);
    const confirmed = confirmationStatistic >= input.confirmationCritical && Math.sign(postScore[c] as number) === Math.sign(score[c] as number);
    const windowClosing = nextAvailable < 0 || (timeMs[nextAvailable] as number) - onsetMs > input.maximumIsolationMs;
    const separated = best.statistic - second.statistic >= input.isolationMargin;
    if (confirmed && (separated || windowClosing)) {
      return { candidate: best.candidate, namingIndex: index, windowSamples, ranking, ambiguous: !separated, confirmationStatistic };
    }
  }
  return null;
}
