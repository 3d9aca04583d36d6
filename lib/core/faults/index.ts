/**
 * Instrument-fault detection over time: stuck readings, spike bursts, and heat-balance faults (drift, bias, span
 * error) found by a CUSUM and named by a GLR test on the energy-balance and heat-transfer rate residuals.
 */
export type { AlertKind, InstrumentAlert, OverallCoefficientModel, RateEquationSetup } from "./types";
export { detectInstrumentFaults, type InstrumentFaultOptions } from "./detect-instrument-faults";
export { detectStuckSignals, type StuckSignalOptions } from "./detect-stuck-signals";
export { detectSpikeBursts, type SpikeBurstOptions } from "./detect-spike-bursts";
export { detectBalanceFaults, BALANCE_FAULT_DEFAULTS, type BalanceFaultOptions } from "./detect-balance-faults";
export { faultExclusionFlags, type FaultExclusion, type FaultExclusionOptions } from "./fault-exclusion-flags";
export { firstCusumAlarm, type CusumAlarm } from "./first-cusum-alarm";
export { cusumAverageRunLength } from "./cusum-average-run-length";
export { cusumBlocks, type CusumBlocks } from "./cusum-blocks";
export { normalisedBalanceResiduals, type NormalisedBalanceResiduals } from "./normalised-balance-residuals";
export { movingBalanceOffset, type MovingOffsetOptions } from "./moving-balance-offset";
export { FAULT_CANDIDATES, type FaultCandidate } from "./fault-candidates";
export { sampleEvidence, type EvidenceSettings, type SampleEvidence } from "./sample-evidence";
export { glrQuadraticForms } from "./glr-quadratic-forms";
export { glrStatistic } from "./glr-statistic";
export { isolateFault, type Isolation, type IsolationInput, type RankedCandidate } from "./isolate-fault";
export { classifyOffsetGrowth, type OffsetGrowth } from "./classify-offset-growth";
export { rampStart } from "./ramp-start";
export { trackFaultEnd, type TrackingInput } from "./track-fault-end";
export { rateResidual, type RateResidual } from "./rate-residual";
export { rateEvidenceSettings, type RateEvidence, type RateEvidenceInput } from "./rate-evidence-settings";
export { fitOverallCoefficientModel, FILM_FLOW_EXPONENT, type CoefficientPoints } from "./fit-overall-coefficient-model";
export { predictOverallCoefficient } from "./predict-overall-coefficient";
export { formatInstant } from "./format-instant";
export { instrumentTag } from "./instrument-tag";
