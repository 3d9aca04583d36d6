import { referenceRating } from "./reference-rating";
import type { CriticalFouling, CrossingCriterion, ReferenceConditions } from "./types";

/** Rf beyond which a limit counts as never broken, m²·K/W (about 100 times a heavy TEMA allowance; FIELD-NOTES §3). */
export const MAXIMUM_SEARCH_FOULING = 1;
/** Bisection stops when the bracket is narrower than this relative width. */
const RELATIVE_TOLERANCE = 1e-10;

/** True when the criterion is broken at this Rf. */
function broken(conditions: ReferenceConditions, criterion: CrossingCriterion, fouling: number): boolean {
  if (criterion.kind === "fouling-allowance") return fouling >= criterion.allowanceM2KPerW;
  const rating = referenceRating(conditions, fouling);
  switch (criterion.kind) {
    case "duty":
      return rating.dutyW < criterion.minimumDutyW;
    case "cold-outlet":
      return rating.coldOutletK < criterion.minimumK;
    case "hot-outlet":
      return rating.hotOutletK > criterion.maximumK;
  }
}

/**
 * criticalFoulingResistance: the Rf at which a limit is reached at reference conditions, by bisection on Rf (once per
 * assessment, not per forecast day).
 *
 * Method: at reference conditions the duty and the cold outlet fall and the hot outlet rises monotonically as Rf grows
 * (U_ref = 1/(R0 + Rf) falls, ε rises with NTU), so each limit is broken on a half-line [Rf*, ∞); Rf* is bracketed by
 * doubling from 1e-4 m²·K/W up to 1 m²·K/W and bisected to 1e-10 relative. The fouling allowance needs no rating.
 * Valid: the monotonicity above (true for the ε–NTU relations of the thermal core).
 * Source: bisection, e.g. Press et al. (2007), Numerical Recipes, 3rd ed., Sect. 9.1 (from memory).
 *
 * @param conditions reference conditions and clean resistance
 * @param criterion the limit
 * @returns Rf* and whether it exists
 */
export function criticalFoulingResistance(conditions: ReferenceConditions, criterion: CrossingCriterion): CriticalFouling {
  if (criterion.kind === "fouling-allowance") {
    return { foulingM2KPerW: Math.max(0, criterion.allowanceM2KPerW), status: criterion.allowanceM2KPerW > 0 ? "found" : "broken-when-clean" };
  }
  if (broken(conditions, criterion, 0)) return { foulingM2KPerW: 0, status: "broken-when-clean" };
  let low = 0;
  let high = 1e-4;
  while (!broken(conditions, criterion, high)) {
    low = high;
    high *= 2;
    if (high > MAXIMUM_SEARCH_FOULING) return { foulingM2KPerW: null, status: "never-broken" };
  }
  while (high - low > RELATIVE_TOLERANCE * high) {
    const middle = 0.5 * (low + high);
    if (broken(conditions, criterion, middle)) high = middle;
    else low = middle;
  }
  return { foulingM2KPerW: 0.5 * (low + high), status: "found" };
}
