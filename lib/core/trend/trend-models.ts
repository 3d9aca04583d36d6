import { ASYMPTOTIC_TREND } from "./asymptotic-trend";
import { FALLING_RATE_TREND } from "./falling-rate-trend";
import { LINEAR_TREND } from "./linear-trend";
import type { TrendModel } from "./trend-model";
import type { TrendModelKind } from "./types";

/** The candidate models by kind, in order of increasing complexity (linear first). */
export const TREND_MODELS: Readonly<Record<TrendModelKind, TrendModel>> = {
  linear: LINEAR_TREND,
  asymptotic: ASYMPTOTIC_TREND,
  "falling-rate": FALLING_RATE_TREND,
};
