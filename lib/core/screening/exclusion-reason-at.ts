import type { ExclusionReason, SampleFlags } from "./types";

/**
 * exclusionReasonAt: the reason a sample is not used, by the precedence of EXCLUSION_REASONS (missing, transient,
 * outlier, fault, impossible); null when the sample is used.
 */
export function exclusionReasonAt(flags: SampleFlags, index: number): ExclusionReason | null {
  if (flags.missing[index] === 1) return "missing";
  if (flags.transient[index] === 1) return "transient";
  if (flags.outlier[index] === 1) return "outlier";
  if ((flags.fault[index] as number) > 0) return "fault";
  if (flags.impossible[index] === 1) return "impossible";
  return null;
}

