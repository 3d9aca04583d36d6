/** Seed of the demo fleet simulation (an arbitrary fixed number). */
export const DEMO_SEED = 20_240_901;

/** First hourly sample of the demo data: 2024-09-01T00:00Z. */
export const DEMO_START_MS = Date.UTC(2024, 8, 1, 0, 0, 0);

/** Last hourly sample of the demo data: 2026-11-30T23:00Z (inclusive). */
export const DEMO_END_MS = Date.UTC(2026, 10, 30, 23, 0, 0);

/** The invented demo site. */
export const DEMO_SITE = { name: "Brakwater Haven Refinery", code: "BWH", timeZone: "Europe/Amsterdam" } as const;

/** Its three process units. */
export const DEMO_UNITS = [
  { code: "CDU-1", name: "Crude Distillation Unit 1" },
  { code: "HTU-2", name: "Gas Oil Hydrotreater 2" },
  { code: "RDC-3", name: "Product Rundown and Cooling" },
] as const;
