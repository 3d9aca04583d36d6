/**
 * MAD-to-σ factor for normal data, 1/Φ⁻¹(3/4) = 1.482602…, rounded as customary.
 * Source: Hampel (1974), J. Am. Stat. Assoc. 69:383–393; Rousseeuw & Croux (1993), J. Am. Stat. Assoc. 88:1273, Eq. 1
 * (from memory); the value follows from the normal quantile Φ⁻¹(0.75) = 0.6744898.
 */
export const MAD_SCALE_FACTOR = 1.4826;
