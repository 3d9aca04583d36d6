import type { Highs, ModelData } from "highs";

/** HiGHS model status codes (C API kHighsModelStatus*) and the names the legacy solve() API uses for them. */
const MODEL_STATUS_NAMES: Record<number, string> = {
  0: "Not Set",
  1: "Load error",
  2: "Model error",
  3: "Presolve error",
  4: "Solve error",
  5: "Postsolve error",
  6: "Empty",
  7: "Optimal",
  8: "Infeasible",
  9: "Primal infeasible or unbounded",
  10: "Unbounded",
  11: "Bound on objective reached",
  12: "Target for objective reached",
  13: "Time limit reached",
  14: "Iteration limit reached",
  15: "Unknown",
  16: "Solution limit reached",
  17: "Interrupted",
};

/** Outcome of one HiGHS run. */
export interface HighsRun {
  status: string;
  optimal: boolean;
  infeasible: boolean;
  /** A feasible primal solution is available. */
  hasSolution: boolean;
  columnValues: Float64Array;
  /** Model objective (without any offset the caller keeps). */
  objective: number;
  /** Proven bound on the model objective. */
  dualBound: number;
  /** HiGHS relative gap. */
  gap: number;
  seconds: number;
}

/** Options passed to HiGHS for one run. */
export interface HighsRunOptions {
  timeLimitSeconds: number;
  relativeGap: number;
  /** Absolute gap; default HiGHS's (1e-6). */
  absoluteGap?: number;
  /** A feasible solution to start from (MIP start), column values. */
  start?: Float64Array | null;
  /** HiGHS presolve; default "off" (see solvePlanningInstance). */
  presolve?: "off" | "choose" | "on";
}

/**
 * runHighsModel: solves a mixed-integer model in a fresh HiGHS instance (in memory, silent, single thread) and
 * returns status, solution, bound, gap and run time; the native instance is always disposed.
 *
 * Source: HiGHS branch-and-cut MIP solver (Huangfu & Hall 2018, Math. Prog. Comp. 10:119 for the simplex core;
 * highs.dev), through the highs-js WebAssembly build.
 */
export function runHighsModel(highs: Highs, model: ModelData, options: HighsRunOptions): HighsRun {
  // Rows without coefficients are decided here: HiGHS reports an empty model as "Empty" even when such a row
  // cannot hold (0 outside its bounds).
  const { starts } = model.matrix;
  for (let row = 0; row < model.numRows; row += 1) {
    if (starts[row] === starts[row + 1] && ((model.rowLower[row] as number) > 0 || (model.rowUpper[row] as number) < 0)) {
      return { status: "Infeasible", optimal: false, infeasible: true, hasSolution: false, columnValues: new Float64Array(model.numCols), objective: NaN, dualBound: NaN, gap: Infinity, seconds: 0 };
    }
  }
  if (model.numCols === 0) {
    return { status: "Optimal", optimal: true, infeasible: false, hasSolution: true, columnValues: new Float64Array(0), objective: 0, dualBound: 0, gap: 0, seconds: 0 };
  }
  return highs.withModel(model, (instance) => {
    instance.options.set({
      output_flag: false,
      presolve: options.presolve ?? "off",
      time_limit: Math.max(options.timeLimitSeconds, 1e-3),
      mip_rel_gap: options.relativeGap,
      ...(options.absoluteGap === undefined ? {} : { mip_abs_gap: options.absoluteGap }),
    });
    if (options.start) instance.setSolution({ colValue: options.start });
    const code = instance.run().modelStatus;
    const hasSolution = code !== 8 && Number(instance.info.get("primal_solution_status")) === 2;
    const objective = hasSolution ? instance.getObjectiveValue() : NaN;
    const dualBound = Number(instance.info.get("mip_dual_bound"));
    const gap = Number(instance.info.get("mip_gap"));
    return {
      status: MODEL_STATUS_NAMES[code] ?? `status ${code}`,
      optimal: code === 7,
      infeasible: code === 8 || code === 9,
      hasSolution,
      columnValues: hasSolution ? Float64Array.from(instance.getSolution().colValue) : new Float64Array(model.numCols),
      objective,
      dualBound: Number.isFinite(dualBound) ? dualBound : objective,
      gap: hasSolution && Number.isFinite(gap) ? gap : hasSolution ? 0 : Infinity,
      seconds: instance.getRunTime(),
    };
  });
}
