/** Physical quantities that have user-facing units. Temperature is absolute; temperatureDifference is an interval. */
export type Quantity =
  | "temperature"
  | "temperatureDifference"
  | "massFlow"
  | "power"
  | "heatTransferCoefficient"
  | "foulingResistance"
  | "area"
  | "specificHeat"
  | "pressure";

export type TemperatureUnit = "degC" | "degF" | "K" | "degR";
export type TemperatureDifferenceUnit = "K" | "degC" | "degF" | "degR";
export type MassFlowUnit = "kg/s" | "kg/h" | "t/h" | "lb/h" | "lb/s";
export type PowerUnit = "W" | "kW" | "MW" | "Btu/h";
export type HeatTransferCoefficientUnit = "W/(m2.K)" | "Btu/(h.ft2.degF)";
export type FoulingResistanceUnit = "m2.K/W" | "h.ft2.degF/Btu";
export type AreaUnit = "m2" | "ft2";
export type SpecificHeatUnit = "J/(kg.K)" | "kJ/(kg.K)" | "Btu/(lb.degF)";
export type PressureUnit = "Pa" | "kPa" | "MPa" | "bar" | "psi";

/** The unit ids of each quantity. */
export interface UnitIdByQuantity {
  temperature: TemperatureUnit;
  temperatureDifference: TemperatureDifferenceUnit;
  massFlow: MassFlowUnit;
  power: PowerUnit;
  heatTransferCoefficient: HeatTransferCoefficientUnit;
  foulingResistance: FoulingResistanceUnit;
  area: AreaUnit;
  specificHeat: SpecificHeatUnit;
  pressure: PressureUnit;
}

/** A unit id of quantity Q. */
export type UnitOf<Q extends Quantity> = UnitIdByQuantity[Q];

/** The SI unit every value is stored and computed in. */
export const SI_UNIT: { readonly [Q in Quantity]: UnitOf<Q> } = {
  temperature: "K",
  temperatureDifference: "K",
  massFlow: "kg/s",
  power: "W",
  heatTransferCoefficient: "W/(m2.K)",
  foulingResistance: "m2.K/W",
  area: "m2",
  specificHeat: "J/(kg.K)",
  pressure: "Pa",
};

/** Quantity names for labels and error messages. */
export const QUANTITY_NAME: { readonly [Q in Quantity]: string } = {
  temperature: "temperature",
  temperatureDifference: "temperature difference",
  massFlow: "mass flow",
  power: "power",
  heatTransferCoefficient: "heat-transfer coefficient",
  foulingResistance: "fouling resistance",
  area: "area",
  specificHeat: "specific heat",
  pressure: "pressure",
};
