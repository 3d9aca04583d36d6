/**
 * Grey-box clean-U model: 1/U_clean = a_h·(m_h/m_h,ref)^(−n_h) + a_c·(m_c/m_c,ref)^(−n_c) + R_w, fitted on the clean
 * windows after cleanings with per-window fouling offsets and drifts, anchored on the data-sheet clean resistance.
 */
export type { CleanModelFit, CleanModelOptions, CleanModelParameters, CleanModelPoint, CleanWindowFit, FilmTermMode } from "./types";
export { cleanResistance } from "./clean-resistance";
export { cleanWindowMembership, type CleanWindowMembership } from "./clean-window-membership";
export { tiledWindowOrigins } from "./tiled-window-origins";
export { fitPercent } from "./fit-percent";
export { resolveCleanModelOptions, type ResolvedCleanModelOptions } from "./resolve-clean-model-options";
export { fitCleanModel, type FitCleanModelInput } from "./fit-clean-model";
