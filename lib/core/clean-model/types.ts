/**
 * Types of the grey-box clean-U model. SI: kg/s, m²·K/W, W/(m²·K); instants epoch ms; elapsed time in days.
 */

/**
 * Parameters of 1/U_clean = a_h·(m_h/m_h,ref)^(−n_h) + a_c·(m_c/m_c,ref)^(−n_c) + R_w (the same shape as the
 * simulator's CleanCoefficientParameters, so the truth and the estimate can be compared field by field).
 */
export interface CleanModelParameters {
  hotFilmResistanceRefM2KPerW: number;
  coldFilmResistanceRefM2KPerW: number;
  wallResistanceM2KPerW: number;
  exponentHot: number;
  exponentCold: number;
  hotFlowRefKgPerS: number;
  coldFlowRefKgPerS: number;
}

/** One observation for the clean-model fit: flows and the observed overall resistance 1/U_obs. */
export interface CleanModelPoint {
  timeMs: number;
  hotFlowKgPerS: number;
  coldFlowKgPerS: number;
  /** 1/U_observed, m²·K/W. */
  resistanceM2KPerW: number;
}

/** How the two film terms were estimated. */
export type FilmTermMode =
  /** Both coefficients estimated from the data. */
  | "both-estimated"
  /** The hot flow hardly varies (or its term is lost in the noise): a_h held at the design split. */
  | "hot-fixed"
  /** The cold flow hardly varies: a_c held at the design split. */
  | "cold-fixed"
  /** The flows move together: a_h/a_c held at the design ratio, their sum estimated. */
  | "ratio-fixed"
  /** Neither term identifiable: both held at the design split. */
  | "both-fixed";

/** Options of fitCleanModel; defaults in resolveCleanModelOptions. */
export interface CleanModelOptions {
  /** Window length, days [30]. */
  windowDays?: number;
  /**
   * Which data the flow terms are estimated from ["tiled"]:
   * "after-cleanings": only the first windowDays after the data start and after each cleaning (the classic clean
   * windows); "tiled": the whole record cut into windowDays windows restarting at each cleaning, each with its own
   * fouling offset and drift (far more points for the flow terms; see fitCleanModel).
   */
  windows?: "tiled" | "after-cleanings";
  /** Film exponent used when not fitted [0.8, Dittus–Boelter]. */
  exponent?: number;
  /** Fit the exponents of the estimated terms within exponentBounds [false]. */
  fitExponents?: boolean;
  /** [0.5, 1.0]. */
  exponentBounds?: [number, number];
  /** Hot and cold film shares of the clean resistance at reference used for fixed terms [0.45, 0.45]. */
  designSplit?: { hotFilm: number; coldFilm: number };
  /** Clean resistance at reference, m²·K/W [1/U_design − Rf_design]. */
  cleanResistanceAtReferenceM2KPerW?: number;
  /** Chronological share of the clean points kept for validation [0.3]. */
  validationFraction?: number;
  /** |correlation| of the two coefficient estimates above which they count as not separable [0.95]. */
  correlationLimit?: number;
  /** Standard error relative to the clean resistance above which a coefficient counts as not identifiable [0.25]. */
  relativeErrorLimit?: number;
}

/** A window of the fit: windowDays from its origin, with its own fouling offset and drift. */
export interface CleanWindowFit {
  startMs: number;
  points: number;
  /** Fouling at the window start, Rf0 (m²·K/W), relative to the clean model. */
  offsetM2KPerW: number;
  offsetStandardError: number | null;
  /** Fouling growth within the window, m²·K/W per day. */
  driftM2KPerWPerDay: number;
}

/** Result of fitCleanModel, plain and serialisable. */
export interface CleanModelFit {
  parameters: CleanModelParameters;
  standardErrors: {
    hotFilm: number | null;
    coldFilm: number | null;
    wall: number | null;
    exponentHot: number | null;
    exponentCold: number | null;
  };
  /** 1/U_clean at the reference flows, m²·K/W, and its inverse. */
  cleanResistanceAtReferenceM2KPerW: number;
  cleanUAtReferenceWPerM2K: number;
  /** Where the clean resistance at reference comes from. */
  anchor: "design" | "given" | "lowered-to-data";
  filmTerms: {
    mode: FilmTermMode;
    /** Correlation of the a_h and a_c estimates in the diagnostic fit (null if not computable). */
    correlation: number | null;
    /** Condition number (1 + |ρ|)/(1 − |ρ|) of the scaled 2×2 flow block. */
    conditionNumber: number | null;
    /** SE(a)/clean resistance in the diagnostic fit. */
    relativeStandardErrors: { hot: number | null; cold: number | null };
  };
  /** Ljung's NRMSE fit percentage against the per-window mean, on the estimation and validation parts. */
  fitPercent: { estimation: number | null; validation: number | null };
  windows: CleanWindowFit[];
  pointCount: number;
  /**
   * Film-temperature (viscosity) property correction: not applied. The asset record carries no viscosity data for a
   * Sieder–Tate (μ/μ_w)^0.14 or viscosity-ratio term, and the stream temperatures drift with the seasons and with
   * fouling itself over a cycle, so a temperature coefficient would be confounded with the fouling offsets and drifts.
   */
  propertyCorrection: { applied: false; reason: string };
  residualStandardDeviationM2KPerW: number | null;
  converged: boolean;
  notes: string[];
}
