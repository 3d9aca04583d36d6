/**
 * Design fouling resistances offered as defaults for the asset register, from TEMA Standards, Recommended Good
 * Practice table RGP-T-2.4 "Design fouling resistances" (values in h·ft²·°F/Btu, converted with
 * 1 h·ft²·°F/Btu = 0.1761102 m²·K/W, NIST SP 811 B.8). Each entry says how its value was checked:
 * "seen" entries were read in a reproduction of the table; "from memory" entries were not checked against the
 * primary document and must be confirmed by the engineer (the register shows the note).
 */
export interface TemaFoulingEntry {
  id: string;
  label: string;
  /** h·ft²·°F/Btu as printed in the table */
  imperial: number;
  /** m²·K/W */
  m2KPerW: number;
  provenance: "seen" | "from memory";
}

const SI_PER_IMPERIAL = 0.1761102; // m²·K/W per h·ft²·°F/Btu (NIST SP 811 (2008) Appendix B.8)

function entry(id: string, label: string, imperial: number, provenance: TemaFoulingEntry["provenance"]): TemaFoulingEntry {
  return { id, label, imperial, m2KPerW: imperial * SI_PER_IMPERIAL, provenance };
}

export const TEMA_TABLE_NAME = "TEMA Standards, Table RGP-T-2.4 (Design fouling resistances)";

/** Columns for cooling water: (a) hot fluid ≤ 240 °F, water ≤ 125 °F; (c) hot fluid 240–400 °F, water > 125 °F; velocity ≤ 3 ft/s. */
export const TEMA_DESIGN_FOULING: readonly TemaFoulingEntry[] = [
  entry("cooling-tower-treated-low", "Cooling tower water, treated make-up, hot side ≤ 240 °F, water ≤ 125 °F", 0.001, "seen"),
  entry("cooling-tower-treated-high", "Cooling tower water, treated make-up, hot side 240–400 °F, water > 125 °F", 0.002, "seen"),
  entry("cooling-tower-untreated-low", "Cooling tower water, untreated, hot side ≤ 240 °F, water ≤ 125 °F", 0.003, "seen"),
  entry("cooling-tower-untreated-high", "Cooling tower water, untreated, hot side 240–400 °F, water > 125 °F, ≤ 3 ft/s", 0.005, "seen"),
  entry("river-water-average-low", "River water, average, hot side ≤ 240 °F, ≤ 3 ft/s", 0.003, "seen"),
  entry("sea-water-low", "Sea water, hot side ≤ 240 °F, water ≤ 125 °F", 0.0005, "seen"),
  entry("sea-water-high", "Sea water, hot side 240–400 °F, water > 125 °F", 0.001, "seen"),
  entry("condensate", "Distilled water or condensate", 0.0005, "seen"),
  entry("boiler-feedwater-treated", "Treated boiler feedwater, hot side ≤ 240 °F, ≤ 3 ft/s", 0.001, "seen"),
  entry("steam-non-oil-bearing", "Steam, non-oil-bearing", 0.0005, "seen"),
  entry("caustic", "Caustic solutions", 0.002, "seen"),
  entry("amine", "MEA and DEA solutions", 0.002, "seen"),
  entry("glycol", "DEG and TEG solutions", 0.002, "seen"),
  entry("vegetable-oil", "Vegetable oils", 0.003, "seen"),
  entry("gasoline", "Gasoline", 0.002, "from memory"),
  entry("naphtha", "Naphtha and light distillates", 0.002, "from memory"),
  entry("kerosene", "Kerosene", 0.002, "from memory"),
  entry("light-gas-oil", "Light gas oil", 0.002, "from memory"),
  entry("heavy-gas-oil", "Heavy gas oil", 0.003, "from memory"),
  entry("heavy-fuel-oil", "Heavy fuel oils", 0.005, "from memory"),
  entry("residuum", "Asphalt and residuum", 0.01, "from memory"),
  entry("crude-dry-under-200f", "Crude oil, dry, 0–199 °F, 2–4 ft/s", 0.002, "from memory"),
  entry("crude-dry-200-299f", "Crude oil, dry, 200–299 °F, 2–4 ft/s", 0.002, "from memory"),
  entry("crude-dry-300-499f", "Crude oil, dry, 300–499 °F, 2–4 ft/s", 0.003, "from memory"),
  entry("crude-dry-500f-up", "Crude oil, dry, ≥ 500 °F, 2–4 ft/s", 0.004, "from memory"),
  entry("crude-wet-200-299f", "Crude oil, salt (wet), 200–299 °F, 2–4 ft/s", 0.004, "from memory"),
  entry("crude-wet-300-499f", "Crude oil, salt (wet), 300–499 °F, 2–4 ft/s", 0.005, "from memory"),
  entry("crude-wet-500f-up", "Crude oil, salt (wet), ≥ 500 °F, 2–4 ft/s", 0.006, "from memory"),
  entry("natural-gas", "Natural gas", 0.001, "from memory"),
];

/** The entry with this id, or undefined. */
export function temaDesignFouling(id: string): TemaFoulingEntry | undefined {
  return TEMA_DESIGN_FOULING.find((candidate) => candidate.id === id);
}
