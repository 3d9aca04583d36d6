// Ranges outside which a measured value is taken as an error rather than a reading (SI units).
import type { RoleQuantity } from "./measurement-roles";

export interface PlausibleRange {
  readonly min: number;
  readonly max: number;
}

/**
 * Generous bounds, wider than any shell-and-tube service (common practice):
 * - temperature 150–1200 K (−123 °C to 927 °C): covers refrigerated services up to furnace-effluent coolers;
 * - mass flow 0–1e5 kg/s (360 000 t/h): above the largest cooling-water circuits; negative flows are impossible;
 * - pressure drop 0–1e7 Pa (100 bar): far above any exchanger's allowable pressure drop (usually below 1 bar).
 */
export const PLAUSIBLE_RANGES: { readonly [Q in RoleQuantity]: PlausibleRange } = {
  temperature: { min: 150, max: 1200 },
  massFlow: { min: 0, max: 1e5 },
  pressureDrop: { min: 0, max: 1e7 },
};

/**
 * Bounds for the median of a column's first rows, used to catch a wrong unit before any row is read. Narrower
 * than PLAUSIBLE_RANGES for temperatures only: a median below 150 K is a °C or °F column mapped as K, and a median
 * above 973.15 K (700 °C) is rare enough in heat-exchanger service that a K or °F column mapped as °C is the
 * likelier explanation (common practice). Can be overridden by trusting the units.
 */
export const PLAUSIBLE_MEDIANS: { readonly [Q in RoleQuantity]: PlausibleRange } = {
  temperature: { min: 150, max: 973.15 },
  massFlow: PLAUSIBLE_RANGES.massFlow,
  pressureDrop: PLAUSIBLE_RANGES.pressureDrop,
};
