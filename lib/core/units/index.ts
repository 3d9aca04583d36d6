/**
 * Unit conversion at the edges: user units in, SI inside, user units out.
 * Factors derive from exact definitions and agree with NIST SP 811 (2008) Appendix B.8/B.9.
 */
export type {
  AreaUnit,
  FoulingResistanceUnit,
  HeatTransferCoefficientUnit,
  MassFlowUnit,
  PowerUnit,
  Quantity,
  SpecificHeatUnit,
  TemperatureDifferenceUnit,
  TemperatureUnit,
  UnitIdByQuantity,
  UnitOf,
} from "./quantities";
export { QUANTITY_NAME, SI_UNIT } from "./quantities";
export {
  FAHRENHEIT_DEGREES_PER_KELVIN,
  JOULES_PER_BTU_IT,
  KELVIN_AT_ZERO_CELSIUS,
  KILOGRAMS_PER_POUND,
  KILOGRAMS_PER_TONNE,
  METRES_PER_FOOT,
  RANKINE_AT_ZERO_FAHRENHEIT,
  SECONDS_PER_HOUR,
} from "./conversion-factors";
export { UNIT_TABLE, unitsOf, type UnitDefinition } from "./unit-table";
export { UnitError } from "./unit-error";
export { toSI } from "./to-si";
export { fromSI } from "./from-si";
export { convertUnit } from "./convert-unit";
export { parseUnit, normalizeUnitText } from "./parse-unit";
