import { levenbergMarquardt, linearLeastSquares } from "../fit";
import { cleanWindowMembership } from "./clean-window-membership";
import { tiledWindowOrigins } from "./tiled-window-origins";
import { fitPercent } from "./fit-percent";
import { resolveCleanModelOptions, type ResolvedCleanModelOptions } from "./resolve-clean-model-options";
import type { CleanModelFit, CleanModelOptions, CleanModelParameters, CleanModelPoint, CleanWindowFit, FilmTermMode } from "./types";

/** Input of fitCleanModel. */
export interface FitCleanModelInput {
  /** Usable points in ascending time (all of them; the clean windows are chosen here). Not modified. */
  points: readonly CleanModelPoint[];
  /** Window origins: the data start and each cleaning's return to service, epoch ms. */
  windowOriginsMs: readonly number[];
  /** Reference flows of the asset, kg/s (the film terms are referred to them). */
  reference: { hotFlowKgPerS: number; coldFlowKgPerS: number };
  /** Data-sheet service U (W/(m²·K)) and fouling allowance (m²·K/W). */
  design: { uWPerM2K: number; foulingM2KPerW: number };
  options?: CleanModelOptions;
}

/** A group of points sharing one nuisance offset (and drift, with three or more points spread over a day or more). */
interface Group {
  indices: number[];
  hasDrift: boolean;
}

/** Points of one fit: flows, response z = 1/U_obs − R0, elapsed days, group of each point. */
interface FitData {
  hotRatio: Float64Array;
  coldRatio: Float64Array;
  response: Float64Array;
  elapsedDays: Float64Array;
  group: Int32Array;
  groups: Group[];
}

/** Which flow parameters are free in a fit. */
interface FlowLayout {
  mode: FilmTermMode;
  fitExponents: boolean;
}

/** Decoded flow parameters of a fit. */
interface FlowValues {
  hotFilm: number;
  coldFilm: number;
  exponentHot: number;
  exponentCold: number;
}

const MINIMUM_DRIFT_SPAN_DAYS = 1;
/** Why no film-temperature property correction is applied (see CleanModelFit.propertyCorrection). */
const PROPERTY_CORRECTION = {
  applied: false as const,
  reason:
    "No film-temperature (viscosity) correction: the asset record has no viscosity data, and temperature changes are confounded with fouling growth over a cycle.",
};

function buildGroups(group: Int32Array, elapsedDays: Float64Array): Group[] {
  const groups: Group[] = [];
  group.forEach((label, index) => {
    while (groups.length <= label) groups.push({ indices: [], hasDrift: false });
    (groups[label] as Group).indices.push(index);
  });
  for (const entry of groups) {
    const times = entry.indices.map((index) => elapsedDays[index] as number);
    entry.hasDrift = entry.indices.length >= 3 && Math.max(...times) - Math.min(...times) >= MINIMUM_DRIFT_SPAN_DAYS;
  }
  return groups.filter((entry) => entry.indices.length > 0);
}

/** Flow-term basis u = (m/m_ref)^(−n) − 1, zero at the reference flow. */
function basis(ratio: number, exponent: number): number {
  return Math.pow(ratio, -exponent) - 1;
}

/** Parameter layout: flow parameters first, then per group an offset and (if any) a drift. */
function flowParameterNames(layout: FlowLayout): string[] {
  const names: string[] = [];
  switch (layout.mode) {
    case "both-estimated":
      names.push("hotFilm", "coldFilm");
      break;
    case "hot-fixed":
      names.push("coldFilm");
      break;
    case "cold-fixed":
      names.push("hotFilm");
      break;
    case "ratio-fixed":
      names.push("filmTotal");
      break;
    case "both-fixed":
      break;
  }
  if (layout.fitExponents) {
    if (names.includes("hotFilm")) names.push("exponentHot");
    if (names.includes("coldFilm")) names.push("exponentCold");
  }
  return names;
}

function decodeFlow(names: readonly string[], parameters: ArrayLike<number>, settings: ResolvedCleanModelOptions, cleanResistance: number): FlowValues {
  const value = (name: string): number | undefined => {
    const index = names.indexOf(name);
    return index >= 0 ? (parameters[index] as number) : undefined;
  };
  const { hotFilm: hotShare, coldFilm: coldShare } = settings.designSplit;
  const total = value("filmTotal");
  return {
    hotFilm: total !== undefined ? hotShare * total : (value("hotFilm") ?? hotShare * cleanResistance),
    coldFilm: total !== undefined ? coldShare * total : (value("coldFilm") ?? coldShare * cleanResistance),
    exponentHot: value("exponentHot") ?? settings.exponent,
    exponentCold: value("exponentCold") ?? settings.exponent,
  };
}

/** Result of fitting one layout. */
interface LayoutFit {
  names: string[];
  flow: FlowValues;
  /** Covariance of the flow parameters (order of names), with the nuisance parameters counted in the dof. */
  covariance: (number | null)[][] | null;
  standardErrors: (number | null)[];
  /** Per group: fouling at the window origin (m²·K/W), its standard error, and drift (m²·K/W per day). */
  nuisance: { offset: number; offsetStandardError: number | null; drift: number }[];
  /** observed − predicted response, m²·K/W. */
  residuals: Float64Array;
  residualStandardDeviation: number | null;
  converged: boolean;
  reason: string;
}

/** Per-group means of the elapsed time and its centred sum of squares (for the within-window projection). */
function groupMoments(data: FitData): { meanTime: number; timeSpread: number }[] {
  return data.groups.map((group) => {
    let meanTime = 0;
    for (const index of group.indices) meanTime += data.elapsedDays[index] as number;
    meanTime /= group.indices.length;
    let timeSpread = 0;
    for (const index of group.indices) timeSpread += ((data.elapsedDays[index] as number) - meanTime) ** 2;
    return { meanTime, timeSpread };
  });
}

/**
 * Within-window projection: the residual of each window's values after regressing them on [1, τ] (or on [1] for a
 * window without drift). Returns the residuals, and per group the intercept (value at τ = 0) and slope.
 */
function projectOut(values: ArrayLike<number>, data: FitData, moments: { meanTime: number; timeSpread: number }[], out: Float64Array): { intercept: number; slope: number }[] {
  return data.groups.map((group, g) => {
    const { meanTime, timeSpread } = moments[g] as { meanTime: number; timeSpread: number };
    let mean = 0;
    for (const index of group.indices) mean += values[index] as number;
    mean /= group.indices.length;
    let slope = 0;
    if (group.hasDrift && timeSpread > 0) {
      let cross = 0;
      for (const index of group.indices) cross += ((data.elapsedDays[index] as number) - meanTime) * ((values[index] as number) - mean);
      slope = cross / timeSpread;
    }
    for (const index of group.indices) out[index] = (values[index] as number) - mean - slope * ((data.elapsedDays[index] as number) - meanTime);
    return { intercept: mean - slope * meanTime, slope };
  });
}

/**
 * Fits one layout. The per-window offsets and drifts enter linearly, so they are projected out exactly (Frisch–Waugh–
 * Lovell; variable projection, Golub & Pereyra 1973): bounded Levenberg–Marquardt runs on the flow parameters only,
 * with residuals M·(f(θ) − y), M the within-window residual maker; the nuisance parameters follow by per-window
 * regression of y − f(θ̂). Degrees of freedom count every nuisance parameter.
 */
function fitLayout(data: FitData, layout: FlowLayout, settings: ResolvedCleanModelOptions, cleanResistance: number): LayoutFit {
  const names = flowParameterNames(layout);
  const count = names.length;
  const rows = data.response.length;
  const moments = groupMoments(data);
  const projectedResponse = new Float64Array(rows);
  projectOut(data.response, data, moments, projectedResponse);
  const nuisanceCount = data.groups.reduce((sum, group) => sum + (group.hasDrift ? 2 : 1), 0);
  const { hotFilm: hotShare, coldFilm: coldShare } = settings.designSplit;
  const [lowExponent, highExponent] = settings.exponentBounds;

  const lower: number[] = [];
  const upper: number[] = [];
  for (const name of names) {
    if (name === "exponentHot" || name === "exponentCold") {
      lower.push(lowExponent);
      upper.push(highExponent);
    } else {
      lower.push(0);
      upper.push(name === "filmTotal" ? cleanResistance / (hotShare + coldShare) : cleanResistance);
    }
  }

  /** Flow part f(θ) and, when asked, its derivative columns (column-major, count × rows). */
  const flowPart = (parameters: ArrayLike<number>, columns: Float64Array | null): Float64Array => {
    const flow = decodeFlow(names, parameters, settings, cleanResistance);
    const values = new Float64Array(rows);
    for (let i = 0; i < rows; i += 1) {
      const hotRatio = data.hotRatio[i] as number;
      const coldRatio = data.coldRatio[i] as number;
      const hotBasis = basis(hotRatio, flow.exponentHot);
      const coldBasis = basis(coldRatio, flow.exponentCold);
      values[i] = flow.hotFilm * hotBasis + flow.coldFilm * coldBasis;
      if (columns === null) continue;
      for (let j = 0; j < count; j += 1) {
        const name = names[j];
        let derivative = 0;
        if (name === "hotFilm") derivative = hotBasis;
        else if (name === "coldFilm") derivative = coldBasis;
        else if (name === "filmTotal") derivative = hotShare * hotBasis + coldShare * coldBasis;
        else if (name === "exponentHot") derivative = -flow.hotFilm * (hotBasis + 1) * Math.log(hotRatio);
        else if (name === "exponentCold") derivative = -flow.coldFilm * (coldBasis + 1) * Math.log(coldRatio);
        columns[j * rows + i] = derivative;
      }
    }
    return values;
  };
  const projectedJacobian = (parameters: ArrayLike<number>): Float64Array => {
    const columns = new Float64Array(count * rows);
    flowPart(parameters, columns);
    const projected = new Float64Array(rows);
    const jacobian = new Float64Array(rows * count);
    for (let j = 0; j < count; j += 1) {
      projectOut(columns.subarray(j * rows, (j + 1) * rows), data, moments, projected);
      for (let i = 0; i < rows; i += 1) jacobian[i * count + j] = projected[i] as number;
    }
    return jacobian;
  };

  let parameters: number[] = [];
  let covariance: (number | null)[][] | null = null;
  let standardErrors: (number | null)[] = [];
  let converged = true;
  let reason = "linear";
  if (count > 0) {
    const initial = names.map((name) => (name === "exponentHot" || name === "exponentCold" ? settings.exponent : 0));
    const startColumns = projectedJacobian(initial);
    const linear = linearLeastSquares({ design: startColumns, response: projectedResponse, columns: count });
    names.forEach((name, j) => {
      if (name !== "exponentHot" && name !== "exponentCold") {
        initial[j] = Math.min(upper[j] as number, Math.max(lower[j] as number, (linear.coefficients[j] as number) || 0));
      }
    });
    const projected = new Float64Array(rows);
    const fit = levenbergMarquardt({
      initial,
      lower,
      upper,
      residuals: (point) => {
        projectOut(flowPart(point, null), data, moments, projected);
        return Float64Array.from(projected, (value, i) => value - (projectedResponse[i] as number));
      },
      jacobian: projectedJacobian,
    });
    parameters = fit.parameters;
    converged = fit.converged;
    reason = fit.reason;
    const freeCount = fit.atBound.filter((held) => !held).length;
    const degreesOfFreedom = rows - freeCount - nuisanceCount;
    const correction = degreesOfFreedom > 0 && fit.degreesOfFreedom > 0 ? fit.degreesOfFreedom / degreesOfFreedom : null;
    covariance = fit.covariance === null || correction === null ? null : fit.covariance.map((row) => row.map((entry) => (entry === null ? null : entry * correction)));
    standardErrors = names.map((_, j) => {
      const entry = covariance?.[j]?.[j];
      return entry === null || entry === undefined ? null : Math.sqrt(entry);
    });
  }

  const flow = decodeFlow(names, parameters, settings, cleanResistance);
  const fitted = flowPart(parameters, null);
  const remainder = Float64Array.from(data.response, (value, i) => value - (fitted[i] as number));
  const residuals = new Float64Array(rows);
  const lines = projectOut(remainder, data, moments, residuals);
  let residualSum = 0;
  for (const value of residuals) residualSum += value * value;
  const freeFlow = standardErrors.filter((value) => value !== null).length;
  const degreesOfFreedom = rows - freeFlow - nuisanceCount;
  const variance = degreesOfFreedom > 0 ? residualSum / degreesOfFreedom : null;

  // Offset SE: the window's own regression plus the flow-parameter uncertainty through its intercept.
  const derivativeIntercepts: { intercept: number; slope: number }[][] = [];
  if (covariance !== null && count > 0) {
    const columns = new Float64Array(count * rows);
    flowPart(parameters, columns);
    const scratch = new Float64Array(rows);
    for (let j = 0; j < count; j += 1) derivativeIntercepts.push(projectOut(columns.subarray(j * rows, (j + 1) * rows), data, moments, scratch));
  }
  const nuisance = data.groups.map((group, g) => {
    const { meanTime, timeSpread } = moments[g] as { meanTime: number; timeSpread: number };
    const line = lines[g] as { intercept: number; slope: number };
    let offsetVariance: number | null = null;
    if (variance !== null) {
      offsetVariance = variance * (1 / group.indices.length + (group.hasDrift && timeSpread > 0 ? (meanTime * meanTime) / timeSpread : 0));
      if (covariance !== null) {
        for (let a = 0; a < count; a += 1) {
          for (let b = 0; b < count; b += 1) {
            const entry = covariance[a]?.[b];
            if (entry === null || entry === undefined) continue;
            offsetVariance += (derivativeIntercepts[a]?.[g]?.intercept ?? 0) * entry * (derivativeIntercepts[b]?.[g]?.intercept ?? 0);
          }
        }
      }
    }
    return { offset: line.intercept, offsetStandardError: offsetVariance === null ? null : Math.sqrt(offsetVariance), drift: line.slope };
  });
  return {
    names,
    flow,
    covariance,
    standardErrors,
    nuisance,
    residuals,
    residualStandardDeviation: variance === null ? null : Math.sqrt(variance),
    converged,
    reason,
  };
}

function subsetData(points: readonly CleanModelPoint[], indices: readonly number[], groupLabels: readonly number[], elapsed: readonly number[], reference: FitCleanModelInput["reference"], cleanResistance: number): FitData {
  const labels = [...new Set(groupLabels)].sort((a, b) => a - b);
  const renumber = new Map(labels.map((label, index) => [label, index]));
  const group = Int32Array.from(groupLabels, (label) => renumber.get(label) as number);
  const elapsedDays = Float64Array.from(elapsed);
  return {
    hotRatio: Float64Array.from(indices, (index) => (points[index] as CleanModelPoint).hotFlowKgPerS / reference.hotFlowKgPerS),
    coldRatio: Float64Array.from(indices, (index) => (points[index] as CleanModelPoint).coldFlowKgPerS / reference.coldFlowKgPerS),
    response: Float64Array.from(indices, (index) => (points[index] as CleanModelPoint).resistanceM2KPerW - cleanResistance),
    elapsedDays,
    group,
    groups: buildGroups(group, elapsedDays),
  };
}

/** Chooses how to treat the two film terms from a diagnostic fit with both estimated (exponents at default). */
function chooseMode(data: FitData, settings: ResolvedCleanModelOptions, cleanResistance: number) {
  const diagnostic = fitLayout(data, { mode: "both-estimated", fitExponents: false }, settings, cleanResistance);
  let ratioFit: LayoutFit | null = null;
  const covariance = diagnostic.covariance;
  const varianceHot = covariance?.[0]?.[0] ?? null;
  const varianceCold = covariance?.[1]?.[1] ?? null;
  const covarianceHotCold = covariance?.[0]?.[1] ?? null;
  const relativeHot = varianceHot === null ? null : Math.sqrt(varianceHot) / cleanResistance;
  const relativeCold = varianceCold === null ? null : Math.sqrt(varianceCold) / cleanResistance;
  const correlation =
    varianceHot !== null && varianceCold !== null && covarianceHotCold !== null && varianceHot > 0 && varianceCold > 0
      ? covarianceHotCold / Math.sqrt(varianceHot * varianceCold)
      : null;
  const conditionNumber = correlation === null || Math.abs(correlation) >= 1 ? null : (1 + Math.abs(correlation)) / (1 - Math.abs(correlation));
  const limit = settings.relativeErrorLimit;
  const relativeError = (fit: LayoutFit, share = 1): number | null => {
    const variance = fit.covariance?.[0]?.[0];
    return variance === null || variance === undefined ? null : (Math.sqrt(variance) * share) / cleanResistance;
  };
  const shareSum = settings.designSplit.hotFilm + settings.designSplit.coldFilm;
  const ratioIdentifiable = (): boolean => {
    ratioFit = fitLayout(data, { mode: "ratio-fixed", fitExponents: false }, settings, cleanResistance);
    const relative = relativeError(ratioFit, shareSum);
    return relative !== null && relative <= limit;
  };
  let mode: FilmTermMode;
  if (covariance !== null && correlation !== null) {
    const hotOk = relativeHot !== null && relativeHot <= limit;
    const coldOk = relativeCold !== null && relativeCold <= limit;
    if (Math.abs(correlation) > settings.correlationLimit) mode = ratioIdentifiable() ? "ratio-fixed" : "both-fixed";
    else if (hotOk && coldOk) mode = "both-estimated";
    else if (hotOk) mode = "cold-fixed";
    else if (coldOk) mode = "hot-fixed";
    else mode = ratioIdentifiable() ? "ratio-fixed" : "both-fixed";
  } else {
    // The joint fit is singular: judge each term on its own (the other held at the design split).
    const coldAlone = relativeError(fitLayout(data, { mode: "hot-fixed", fitExponents: false }, settings, cleanResistance));
    const hotAlone = relativeError(fitLayout(data, { mode: "cold-fixed", fitExponents: false }, settings, cleanResistance));
    const hotOk = hotAlone !== null && hotAlone <= limit;
    const coldOk = coldAlone !== null && coldAlone <= limit;
    if (hotOk && coldOk) mode = ratioIdentifiable() ? "ratio-fixed" : "both-fixed";
    else if (hotOk) mode = "cold-fixed";
    else if (coldOk) mode = "hot-fixed";
    else mode = "both-fixed";
  }
  return {
    summary: { mode, correlation, conditionNumber, relativeStandardErrors: { hot: relativeHot, cold: relativeCold } },
    /** The fits already made, reusable when the final layout is the same. */
    bothFit: diagnostic,
    ratioFit,
  };
}

function describeMode(mode: FilmTermMode, settings: ResolvedCleanModelOptions): string | null {
  const split = `design split (hot ${settings.designSplit.hotFilm}, cold ${settings.designSplit.coldFilm} of the clean resistance)`;
  switch (mode) {
    case "both-estimated":
      return null;
    case "hot-fixed":
      return `Hot film term not identifiable from these data (hot flow varies too little): held at the ${split}.`;
    case "cold-fixed":
      return `Cold film term not identifiable from these data (cold flow varies too little): held at the ${split}.`;
    case "ratio-fixed":
      return `Hot and cold flows move together, so their film terms cannot be separated: their ratio is held at the ${split} and only their sum is estimated.`;
    case "both-fixed":
      return `Neither film term is identifiable from these data: both held at the ${split}.`;
  }
}

/**
 * fitCleanModel: the grey-box clean-U model from an exchanger's data, window by window.
 *
 * Model for a point i of window w (τ days after the window origin):
 * 1/U_obs,i = a_h·(m_h/m_h,ref)^(−n_h) + a_c·(m_c/m_c,ref)^(−n_c) + R_w + Rf0_w + g_w·τ_i, with R_w = R0 − a_h − a_c.
 * Windows: "tiled" (default) cuts the record into windowDays windows restarting at the data start and each cleaning;
 * "after-cleanings" keeps only the first windowDays after those origins (the classic clean windows).
 * Anchor: 1/U_clean at the reference flows equals R0, the data sheet's clean resistance R0 = 1/U_design − Rf_design (the
 * service U includes the fouling allowance) unless given. A constant fouling offset and R0 are not separable from
 * thermal data (both are constants), so R0 is anchored on the design value and lowered to the data only when a window
 * starts significantly (2 SE) below zero fouling. The duty forecast does not depend on the anchor: it rates the
 * exchanger with R0 + Rf, in which the anchor cancels.
 * Nuisance: Rf0_w and g_w (fouling at the window start and its growth) belong to each window. Fouling after a cleaning
 * is not zero (partial cleanings, data starting mid-cycle) and a month of growth is not negligible next to the flow
 * effect, so both are modelled rather than assumed away; the flow terms are then identified only by the flow-driven
 * scatter within windows, which is what lets fouled windows be used too (tiled mode). That assumes the deposit does not
 * change the film coefficients' flow dependence.
 * Identifiability: a diagnostic fit with both coefficients free gives their standard errors and correlation. If
 * |ρ| > correlationLimit (the flows move together) their ratio is held at the design split and only the sum estimated;
 * otherwise a term with SE > relativeErrorLimit·R0 (its flow barely varies) is held at the design split. When the joint
 * fit is singular (a constant flow, or exactly proportional flows) each term is judged alone with the other held. The
 * choice, ρ and the condition number (1 + |ρ|)/(1 − |ρ|) are reported in filmTerms.
 * Exponents: 0.8 (Dittus–Boelter), or fitted within [0.5, 1.0] for the estimated terms.
 * Fit: the window offsets and drifts are linear and projected out exactly (variable projection), then bounded
 * Levenberg–Marquardt (a ≥ 0) on the flow parameters only; degrees of freedom count every nuisance parameter.
 * Fit percentage: Ljung's NRMSE fit against the per-window mean on a chronological split (estimation = the first
 * (1 − validationFraction) of the windowed points; validation = the rest, with the flow parameters from the estimation
 * part and only the windows' offsets and drifts re-estimated); the reported parameters are refitted on all points.
 * No film-temperature (viscosity) correction: see CleanModelFit.propertyCorrection.
 * Valid: turbulent flow on both sides, flows within a few tens of percent of reference.
 * Source: Wilson (1915), Trans. ASME 37:47–82 (Wilson plot: film resistance linear in velocity^−n, from memory);
 * Dittus & Boelter (1930) exponent 0.8 (FIELD-NOTES §4); Kern (1950), Process Heat Transfer, Ch. 6 (clean and design U);
 * Golub & Pereyra (1973), SIAM J. Numer. Anal. 10:413–432, and Frisch & Waugh (1933), Econometrica 1:387–401
 * (projecting out linear nuisance parameters); Belsley, Kuh & Welsch (1980), Regression Diagnostics, Ch. 3
 * (collinearity, condition numbers; from memory); Ljung (1999), System Identification, 2nd ed., Sect. 16.6 (fit %).
 *
 * @param input points, window origins, reference flows, design data, options (not modified)
 * @returns the fitted model; with too few windowed points the design split is returned with a note
 * @throws RangeError when the design data give a non-positive clean resistance, or for bad options
 */
export function fitCleanModel(input: FitCleanModelInput): CleanModelFit {
  const settings = resolveCleanModelOptions(input.options);
  const designResistance = 1 / input.design.uWPerM2K - input.design.foulingM2KPerW;
  let cleanResistance = settings.cleanResistanceAtReferenceM2KPerW ?? designResistance;
  if (!(cleanResistance > 0)) {
    throw new RangeError(
      `fitCleanModel: 1/U_design − Rf_design must be positive, got ${designResistance} m²·K/W (design U ${input.design.uWPerM2K} W/(m²·K), fouling ${input.design.foulingM2KPerW} m²·K/W)`,
    );
  }
  const notes: string[] = [];
  let anchor: CleanModelFit["anchor"] = settings.cleanResistanceAtReferenceM2KPerW === null ? "design" : "given";
  const { reference } = input;
  const points = input.points;
  const pointTimes = points.map((point) => point.timeMs);
  const origins =
    settings.windows === "tiled" && pointTimes.length > 0
      ? tiledWindowOrigins(input.windowOriginsMs, pointTimes[pointTimes.length - 1] as number, settings.windowDays)
      : input.windowOriginsMs;
  const membership = cleanWindowMembership(pointTimes, origins, settings.windowDays);
  const cleanIndices: number[] = [];
  membership.window.forEach((window, index) => {
    if (window >= 0) cleanIndices.push(index);
  });
  const labels = cleanIndices.map((index) => membership.window[index] as number);
  const elapsed = cleanIndices.map((index) => membership.elapsedDays[index] as number);
  const shares = settings.designSplit;

  const fallback = (reason: string): CleanModelFit => ({
    parameters: {
      hotFilmResistanceRefM2KPerW: shares.hotFilm * cleanResistance,
      coldFilmResistanceRefM2KPerW: shares.coldFilm * cleanResistance,
      wallResistanceM2KPerW: (1 - shares.hotFilm - shares.coldFilm) * cleanResistance,
      exponentHot: settings.exponent,
      exponentCold: settings.exponent,
      hotFlowRefKgPerS: reference.hotFlowKgPerS,
      coldFlowRefKgPerS: reference.coldFlowKgPerS,
    },
    standardErrors: { hotFilm: null, coldFilm: null, wall: null, exponentHot: null, exponentCold: null },
    cleanResistanceAtReferenceM2KPerW: cleanResistance,
    cleanUAtReferenceWPerM2K: 1 / cleanResistance,
    anchor,
    filmTerms: { mode: "both-fixed", correlation: null, conditionNumber: null, relativeStandardErrors: { hot: null, cold: null } },
    fitPercent: { estimation: null, validation: null },
    windows: [],
    pointCount: cleanIndices.length,
    propertyCorrection: PROPERTY_CORRECTION,
    residualStandardDeviationM2KPerW: null,
    converged: false,
    notes: [...notes, reason],
  });
  const windowCount = new Set(labels).size;
  if (cleanIndices.length < 2 * windowCount + 4) {
    return fallback(`Too few clean points (${cleanIndices.length}) to fit the clean model: design split used.`);
  }

  const data = subsetData(points, cleanIndices, labels, elapsed, reference, cleanResistance);
  const choice = chooseMode(data, settings, cleanResistance);
  const diagnosis = choice.summary;
  const layout: FlowLayout = { mode: diagnosis.mode, fitExponents: settings.fitExponents && diagnosis.mode !== "ratio-fixed" && diagnosis.mode !== "both-fixed" };
  const modeNote = describeMode(diagnosis.mode, settings);
  if (modeNote !== null) notes.push(modeNote);
  const reusable = layout.fitExponents ? null : layout.mode === "both-estimated" ? choice.bothFit : layout.mode === "ratio-fixed" ? choice.ratioFit : null;
  const final = reusable ?? fitLayout(data, layout, settings, cleanResistance);
  let flow = final.flow;

  const covariance = final.covariance;
  const entry = (a: number, b: number): number | null => (a < 0 || b < 0 ? null : (covariance?.[a]?.[b] ?? null));
  const index = (name: string) => final.names.indexOf(name);
  const rootOrNull = (value: number | null) => (value === null || !(value >= 0) ? null : Math.sqrt(value));
  let hotError: number | null;
  let coldError: number | null;
  let filmSumVariance: number | null;
  if (diagnosis.mode === "ratio-fixed") {
    const variance = entry(index("filmTotal"), index("filmTotal"));
    hotError = rootOrNull(variance === null ? null : shares.hotFilm * shares.hotFilm * variance);
    coldError = rootOrNull(variance === null ? null : shares.coldFilm * shares.coldFilm * variance);
    filmSumVariance = variance === null ? null : (shares.hotFilm + shares.coldFilm) ** 2 * variance;
  } else {
    const hot = index("hotFilm");
    const cold = index("coldFilm");
    hotError = rootOrNull(entry(hot, hot));
    coldError = rootOrNull(entry(cold, cold));
    const parts = [entry(hot, hot), entry(cold, cold), entry(hot, cold)];
    filmSumVariance = hot < 0 && cold < 0 ? null : (parts[0] ?? 0) + (parts[1] ?? 0) + 2 * (parts[2] ?? 0);
  }

  if (flow.hotFilm + flow.coldFilm > cleanResistance) {
    const scale = cleanResistance / (flow.hotFilm + flow.coldFilm);
    flow = { ...flow, hotFilm: flow.hotFilm * scale, coldFilm: flow.coldFilm * scale };
    notes.push("The fitted film terms exceeded the clean resistance (negative wall resistance); both scaled down to leave R_w = 0.");
  }

  const windows: CleanWindowFit[] = data.groups.map((group, g) => {
    const nuisance = final.nuisance[g] as LayoutFit["nuisance"][number];
    const firstPoint = group.indices[0] as number;
    return {
      startMs: membership.originsMs[labels[firstPoint] as number] as number,
      points: group.indices.length,
      offsetM2KPerW: nuisance.offset,
      offsetStandardError: nuisance.offsetStandardError,
      driftM2KPerWPerDay: nuisance.drift,
    };
  });

  // Lower the anchor when a window starts significantly below zero fouling (clean U better than the data sheet).
  if (anchor === "design") {
    let shift = 0;
    for (const window of windows) {
      const error = window.offsetStandardError ?? 0;
      if (window.offsetM2KPerW + 2 * error < 0) shift = Math.min(shift, window.offsetM2KPerW);
    }
    if (shift < 0) {
      const previous = cleanResistance;
      cleanResistance += shift;
      for (const window of windows) window.offsetM2KPerW -= shift;
      anchor = "lowered-to-data";
      notes.push(
        `The data show less resistance after cleaning than the data-sheet clean U allows: clean U at reference raised from ${(1 / previous).toFixed(1)} to ${(1 / cleanResistance).toFixed(1)} W/(m²·K) so that the cleanest window starts at zero fouling.`,
      );
      if (flow.hotFilm + flow.coldFilm > cleanResistance) {
        const scale = cleanResistance / (flow.hotFilm + flow.coldFilm);
        flow = { ...flow, hotFilm: flow.hotFilm * scale, coldFilm: flow.coldFilm * scale };
      }
    }
  }

  // Fit percentage on a chronological estimation/validation split.
  const fitPercentages = { estimation: null as number | null, validation: null as number | null };
  const total = cleanIndices.length;
  const estimationCount = Math.floor((1 - settings.validationFraction) * total);
  if (settings.validationFraction > 0 && estimationCount >= 2 * windowCount + 4 && total - estimationCount >= 3) {
    const estimationPositions = Array.from({ length: estimationCount }, (_, k) => k);
    const estimation = subsetData(
      points,
      estimationPositions.map((k) => cleanIndices[k] as number),
      estimationPositions.map((k) => labels[k] as number),
      estimationPositions.map((k) => elapsed[k] as number),
      reference,
      cleanResistance,
    );
    const estimated = fitLayout(estimation, layout, settings, cleanResistance);
    fitPercentages.estimation = fitPercent(
      Array.from(estimation.response),
      Array.from(estimation.response, (value, k) => value - (estimated.residuals[k] as number)),
      Array.from(estimation.group),
    );
    // Validation: flow part from the estimation fit; offset and drift of each validation window re-estimated.
    const validationPositions = Array.from({ length: total - estimationCount }, (_, k) => estimationCount + k);
    const validation = subsetData(
      points,
      validationPositions.map((k) => cleanIndices[k] as number),
      validationPositions.map((k) => labels[k] as number),
      validationPositions.map((k) => elapsed[k] as number),
      reference,
      cleanResistance,
    );
    const flowPart = Array.from(validation.response, (_, k) => {
      const parameters = estimated.flow;
      return parameters.hotFilm * basis(validation.hotRatio[k] as number, parameters.exponentHot) + parameters.coldFilm * basis(validation.coldRatio[k] as number, parameters.exponentCold);
    });
    const predicted = new Array<number>(validation.response.length).fill(0);
    for (const group of validation.groups) {
      const columns = group.hasDrift ? 2 : 1;
      const design = group.indices.flatMap((k) => (group.hasDrift ? [1, validation.elapsedDays[k] as number] : [1]));
      const target = group.indices.map((k) => (validation.response[k] as number) - (flowPart[k] as number));
      const nuisance = linearLeastSquares({ design, response: target, columns });
      group.indices.forEach((k, position) => {
        predicted[k] = (flowPart[k] as number) + (target[position] as number) - (nuisance.residuals[position] as number);
      });
    }
    fitPercentages.validation = fitPercent(Array.from(validation.response), predicted, Array.from(validation.group));
  }

  const exponentHotIndex = index("exponentHot");
  const exponentColdIndex = index("exponentCold");
  if (!final.converged) notes.push(`Clean-model fit stopped without converging (${final.reason}).`);
  const parameters: CleanModelParameters = {
    hotFilmResistanceRefM2KPerW: flow.hotFilm,
    coldFilmResistanceRefM2KPerW: flow.coldFilm,
    wallResistanceM2KPerW: Math.max(0, cleanResistance - flow.hotFilm - flow.coldFilm),
    exponentHot: flow.exponentHot,
    exponentCold: flow.exponentCold,
    hotFlowRefKgPerS: reference.hotFlowKgPerS,
    coldFlowRefKgPerS: reference.coldFlowKgPerS,
  };
  return {
    parameters,
    standardErrors: {
      hotFilm: diagnosis.mode === "hot-fixed" || diagnosis.mode === "both-fixed" ? null : hotError,
      coldFilm: diagnosis.mode === "cold-fixed" || diagnosis.mode === "both-fixed" ? null : coldError,
      wall: rootOrNull(filmSumVariance),
      exponentHot: exponentHotIndex >= 0 ? (final.standardErrors[exponentHotIndex] ?? null) : null,
      exponentCold: exponentColdIndex >= 0 ? (final.standardErrors[exponentColdIndex] ?? null) : null,
    },
    cleanResistanceAtReferenceM2KPerW: cleanResistance,
    cleanUAtReferenceWPerM2K: 1 / cleanResistance,
    anchor,
    filmTerms: diagnosis,
    fitPercent: fitPercentages,
    windows,
    pointCount: total,
    propertyCorrection: PROPERTY_CORRECTION,
    residualStandardDeviationM2KPerW: final.residualStandardDeviation,
    converged: final.converged,
    notes,
  };
}
