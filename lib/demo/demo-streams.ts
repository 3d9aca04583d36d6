import type { HeatCapacity } from "../core/thermal";

/**
 * Specific heats of the demo streams, cp(T) = intercept + slope·T[K], J/(kg·K).
 * Hydrocarbon liquids: 1.8–2.7 kJ/(kg·K) over their working ranges, rising 3–5 J/(kg·K) per K
 * (FIELD-NOTES §7: crude and hydrocarbon liquids about 1.8–2.6 kJ/(kg·K), rising with temperature; slopes from memory).
 */
function linear(interceptJPerKgK: number, slopeJPerKgK2: number): HeatCapacity {
  return { kind: "linear", interceptJPerKgK, slopeJPerKgK2 };
}

export const DEMO_HEAT_CAPACITY = {
  /** Desalted crude: 1.89 kJ/(kg·K) at 30 °C, 2.66 at 250 °C. */
  crude: linear(830, 3.5),
  /** Naphtha / top pumparound: 2.22 at 40 °C. */
  naphtha: linear(900, 4.2),
  /** Kerosene: 2.32 at 127 °C. */
  kerosene: linear(800, 3.8),
  /** Light gas oil (diesel): 1.84 at 35 °C, 2.37 at 177 °C. */
  lightGasOil: linear(700, 3.7),
  /** Heavy gas oil: 1.82 at 40 °C, 2.38 at 227 °C, 2.65 at 317 °C. */
  heavyGasOil: linear(880, 3.0),
  /** Vacuum gas oil / fuel oil: 1.82 at 37 °C, 2.13 at 127 °C. */
  vacuumGasOil: linear(730, 3.5),
  /** Atmospheric residue: 1.81 at 96 °C, 2.42 at 287 °C, 2.69 at 372 °C. */
  atmosphericResidue: linear(630, 3.2),
  /** Vacuum residue: 2.59 at 317 °C. */
  vacuumResidue: linear(640, 3.3),
  /** Hydrotreater reactor effluent (liquid basis): 2.68 at 360 °C. */
  reactorEffluent: linear(650, 3.2),
  /** Hydrotreater feed: 2.15 at 147 °C. */
  hydrotreaterFeed: linear(720, 3.4),
  /** Fuel gas (methane-rich): 2.16 at 10 °C, 2.33 at 80 °C (from memory). */
  fuelGas: linear(1450, 2.5),
  /** LPG liquid: 2.64 at 40 °C (from memory). */
  liquefiedPetroleumGas: linear(1100, 4.9),
  /** Cooling water: 4181 J/(kg·K), IAPWS-95 at 25 °C via CoolProp (FIELD-NOTES §7: 4.18131 kJ/(kg·K)). */
  coolingWater: { kind: "constant", jPerKgK: 4181 } as HeatCapacity,
  /** Tempered / stripped water near 80 °C: 4197 J/(kg·K) (FIELD-NOTES §7: 4.19675 kJ/(kg·K) at 80 °C). */
  hotWater: { kind: "constant", jPerKgK: 4197 } as HeatCapacity,
  /** Air near ambient: 1006 J/(kg·K) (from memory). */
  air: { kind: "constant", jPerKgK: 1006 } as HeatCapacity,
} satisfies Record<string, HeatCapacity>;
