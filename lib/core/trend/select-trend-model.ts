import type { TrendFit, TrendModelKind } from "./types";

/** One row of the model-selection table. */
export interface ModelSelectionRow {
  kind: TrendModelKind;
  aicc: number | null;
  /** AICc − the smallest AICc; null when AICc is undefined or the fit did not converge. */
  deltaAicc: number | null;
  /** exp(−Δ/2)/Σexp(−Δ/2); 0 for models without AICc or not converged. */
  akaikeWeight: number;
  parameterCount: number;
  converged: boolean;
}

/** Result of selectTrendModel. */
export interface ModelSelection {
  chosen: TrendFit | null;
  table: ModelSelectionRow[];
  /** A plain sentence on why the chosen model won. */
  reason: string;
}

function describe(value: number): string {
  return value.toFixed(1);
}

/**
 * selectTrendModel: picks the fit with the smallest AICc among converged candidates and explains the choice.
 *
 * Formula: Δ_i = AICc_i − min AICc; Akaike weight w_i = exp(−Δ_i/2)/Σ_j exp(−Δ_j/2). Differences below 2 are reported
 * as "hardly distinguishable" (Burnham & Anderson's rule of thumb), but the minimum still wins. When no candidate
 * has an AICc (too few points), the converged linear fit is used if there is one.
 * Source: Akaike (1973); Hurvich & Tsai (1989), Biometrika 76:297–307; Burnham & Anderson (2002), Model Selection and
 * Multimodel Inference, 2nd ed., Sect. 2.6 (Δ_i) and 2.9 (Akaike weights) (from memory).
 *
 * @param fits candidate fits of one cycle's data (null entries are skipped; not modified)
 * @returns the chosen fit, the AICc table, and the reason
 */
export function selectTrendModel(fits: readonly (TrendFit | null)[]): ModelSelection {
  const candidates = fits.filter((fit): fit is TrendFit => fit !== null);
  const eligible = candidates.filter((fit) => fit.converged && fit.aicc !== null);
  const best = eligible.reduce<TrendFit | null>((winner, fit) => (winner === null || (fit.aicc as number) < (winner.aicc as number) ? fit : winner), null);
  const minimum = best?.aicc ?? null;
  let weightSum = 0;
  for (const fit of eligible) weightSum += Math.exp(-((fit.aicc as number) - (minimum as number)) / 2);
  const table: ModelSelectionRow[] = candidates.map((fit) => {
    const usable = fit.converged && fit.aicc !== null && minimum !== null;
    const delta = usable ? (fit.aicc as number) - (minimum as number) : null;
    return {
      kind: fit.kind,
      aicc: fit.aicc,
      deltaAicc: delta,
      akaikeWeight: delta === null ? 0 : Math.exp(-delta / 2) / weightSum,
      parameterCount: fit.internalParameters.length,
      converged: fit.converged,
    };
  });

  if (best === null) {
    const fallback = candidates.find((fit) => fit.kind === "linear" && fit.converged) ?? null;
    return {
      chosen: fallback,
      table,
      reason:
        fallback === null
          ? "No model could be fitted: too few usable points in this cycle."
          : `linear: too few points (${fallback.observationCount}) to compare models by AICc, so the straight line is used.`,
    };
  }
  const others = table.filter((row) => row.kind !== best.kind && row.deltaAicc !== null).sort((a, b) => (a.deltaAicc as number) - (b.deltaAicc as number));
  const weight = table.find((row) => row.kind === best.kind)?.akaikeWeight ?? 1;
  const runnerUp = others[0];
  const failed = table.filter((row) => row.deltaAicc === null).map((row) => row.kind);
  let reason: string;
  if (runnerUp === undefined) {
    reason = `${best.kind}: the only model with a usable fit (AICc ${describe(best.aicc as number)}).`;
  } else if ((runnerUp.deltaAicc as number) < 2) {
    reason =
      `${best.kind}: lowest AICc (${describe(best.aicc as number)}), but ${runnerUp.kind} is only ${describe(runnerUp.deltaAicc as number)} higher ` +
      `(Akaike weights ${weight.toFixed(2)} and ${runnerUp.akaikeWeight.toFixed(2)}), so the data hardly distinguish them.`;
  } else {
    reason =
      `${best.kind}: lowest AICc (${describe(best.aicc as number)}); the next best, ${runnerUp.kind}, is ${describe(runnerUp.deltaAicc as number)} higher ` +
      `(Akaike weight of ${best.kind} ${weight.toFixed(2)}).`;
  }
  if (failed.length > 0) reason += ` Not compared: ${failed.join(", ")} (did not converge or too few points).`;
  return { chosen: best, table, reason };
}
