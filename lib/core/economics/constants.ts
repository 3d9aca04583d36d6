/** Seconds in a day (SI second; civil-day length ignoring leap seconds). */
export const SECONDS_PER_DAY = 86_400;

/** Joules in a gigajoule. */
export const JOULES_PER_GIGAJOULE = 1e9;

/** Kilograms in a (metric) tonne. */
export const KILOGRAMS_PER_TONNE = 1000;
