import {
  FAHRENHEIT_DEGREES_PER_KELVIN,
  JOULES_PER_BTU_IT,
  KELVIN_AT_ZERO_CELSIUS,
  KILOGRAMS_PER_POUND,
  KILOGRAMS_PER_TONNE,
  METRES_PER_FOOT,
  METRES_PER_INCH,
  RANKINE_AT_ZERO_FAHRENHEIT,
  SECONDS_PER_HOUR,
  STANDARD_GRAVITY_M_PER_S2,
} from "./conversion-factors";
import type { Quantity, UnitOf } from "./quantities";

/**
 * One unit of a quantity. A value v in this unit is (v + offset)·scale in SI; offset is non-zero only for the
 * absolute temperature scales °C and °F (whose zero is not absolute zero).
 */
export interface UnitDefinition<Id extends string = string> {
  /** Stable ASCII id stored in settings and files, e.g. "degC", "W/(m2.K)". */
  readonly id: Id;
  /** Short display label, e.g. "°C", "W/(m²·K)". */
  readonly label: string;
  /** Spelled-out name, e.g. "degree Celsius". */
  readonly name: string;
  /** SI value of one unit (after adding offset). */
  readonly scale: number;
  /** Added to the value before scaling (absolute temperatures only). */
  readonly offset: number;
  /** Further accepted spellings for parseUnit, besides id and label (matched case-insensitively unless caseSensitive). */
  readonly spellings: readonly string[];
  /** When true, id and label must match in letter case (keeps "MW" megawatt apart from "mW" milliwatt); spellings never do. */
  readonly caseSensitive?: boolean;
}

const KELVIN_PER_FAHRENHEIT_DEGREE = 1 / FAHRENHEIT_DEGREES_PER_KELVIN;
const SQUARE_METRES_PER_SQUARE_FOOT = METRES_PER_FOOT * METRES_PER_FOOT;
/** Btu_IT/h → W: 1055.05585262/3600 = 0.293 071 070 172 2… (NIST SP 811 B.8: 2.930 711 E−01). */
const WATTS_PER_BTU_PER_HOUR = JOULES_PER_BTU_IT / SECONDS_PER_HOUR;
/** Btu_IT/(h·ft²·°F) → W/(m²·K) (NIST SP 811 B.8: 5.678 263 E+00). */
const HEAT_TRANSFER_COEFFICIENT_IMPERIAL =
  (WATTS_PER_BTU_PER_HOUR * FAHRENHEIT_DEGREES_PER_KELVIN) / SQUARE_METRES_PER_SQUARE_FOOT;
/** Btu_IT/(lb·°F) → J/(kg·K) = 4186.8 exactly (NIST SP 811 B.8: 4.1868 E+03). */
const SPECIFIC_HEAT_IMPERIAL = (JOULES_PER_BTU_IT * FAHRENHEIT_DEGREES_PER_KELVIN) / KILOGRAMS_PER_POUND;

/** Pound-force per square inch → Pa = 0.45359237·9.80665/0.0254² = 6894.757 293 168… (NIST SP 811 B.8: 6.894 757 E+03). */
const PASCALS_PER_PSI = (KILOGRAMS_PER_POUND * STANDARD_GRAVITY_M_PER_S2) / (METRES_PER_INCH * METRES_PER_INCH);

/** Every supported unit, per quantity, SI unit first. UIs list these; parseUnit accepts their spellings. */
export const UNIT_TABLE: { readonly [Q in Quantity]: readonly UnitDefinition<UnitOf<Q>>[] } = {
  temperature: [
    { id: "K", label: "K", name: "kelvin", scale: 1, offset: 0, spellings: ["kelvin", "degK", "°K"] },
    {
      id: "degC",
      label: "°C",
      name: "degree Celsius",
      scale: 1,
      offset: KELVIN_AT_ZERO_CELSIUS,
      spellings: ["C", "deg C", "celsius", "degree Celsius", "degrees Celsius", "centigrade"],
    },
    {
      id: "degF",
      label: "°F",
      name: "degree Fahrenheit",
      scale: KELVIN_PER_FAHRENHEIT_DEGREE,
      offset: RANKINE_AT_ZERO_FAHRENHEIT,
      spellings: ["F", "deg F", "fahrenheit", "degree Fahrenheit", "degrees Fahrenheit"],
    },
    {
      id: "degR",
      label: "°R",
      name: "degree Rankine",
      scale: KELVIN_PER_FAHRENHEIT_DEGREE,
      offset: 0,
      spellings: ["R", "deg R", "rankine", "degree Rankine", "degrees Rankine"],
    },
  ],
  temperatureDifference: [
    { id: "K", label: "K", name: "kelvin (difference)", scale: 1, offset: 0, spellings: ["kelvin", "delta K", "ΔK"] },
    {
      id: "degC",
      label: "°C",
      name: "degree Celsius (difference)",
      scale: 1,
      offset: 0,
      spellings: ["C", "deg C", "celsius", "delta C", "delta °C", "Δ°C", "ΔC"],
    },
    {
      id: "degF",
      label: "°F",
      name: "degree Fahrenheit (difference)",
      scale: KELVIN_PER_FAHRENHEIT_DEGREE,
      offset: 0,
      spellings: ["F", "deg F", "fahrenheit", "delta F", "delta °F", "Δ°F", "ΔF"],
    },
    {
      id: "degR",
      label: "°R",
      name: "degree Rankine (difference)",
      scale: KELVIN_PER_FAHRENHEIT_DEGREE,
      offset: 0,
      spellings: ["R", "deg R", "rankine", "delta R", "Δ°R"],
    },
  ],
  massFlow: [
    { id: "kg/s", label: "kg/s", name: "kilogram per second", scale: 1, offset: 0, spellings: ["kg/sec", "kgps"] },
    {
      id: "kg/h",
      label: "kg/h",
      name: "kilogram per hour",
      scale: 1 / SECONDS_PER_HOUR,
      offset: 0,
      spellings: ["kg/hour", "kgph"],
    },
    {
      id: "t/h",
      label: "t/h",
      name: "tonne per hour",
      scale: KILOGRAMS_PER_TONNE / SECONDS_PER_HOUR,
      offset: 0,
      spellings: ["tonne/h", "tonnes/h", "tonne/hour", "tph", "te/h"],
    },
    {
      id: "lb/h",
      label: "lb/h",
      name: "pound per hour",
      scale: KILOGRAMS_PER_POUND / SECONDS_PER_HOUR,
      offset: 0,
      spellings: ["lb/hour", "lbm/h", "pph"],
    },
    {
      id: "lb/s",
      label: "lb/s",
      name: "pound per second",
      scale: KILOGRAMS_PER_POUND,
      offset: 0,
      spellings: ["lb/sec", "lbm/s"],
    },
  ],
  power: [
    { id: "W", label: "W", name: "watt", scale: 1, offset: 0, spellings: ["watt", "watts", "J/s"] },
    { id: "kW", label: "kW", name: "kilowatt", scale: 1e3, offset: 0, spellings: ["kilowatt", "kilowatts", "kJ/s"] },
    {
      id: "MW",
      label: "MW",
      name: "megawatt",
      scale: 1e6,
      offset: 0,
      spellings: ["megawatt", "megawatts"],
      caseSensitive: true,
    },
    {
      id: "Btu/h",
      label: "Btu/h",
      name: "International Table Btu per hour",
      scale: WATTS_PER_BTU_PER_HOUR,
      offset: 0,
      spellings: ["Btu_IT/h", "BTU/hour", "Btuh", "BTUH"],
    },
  ],
  heatTransferCoefficient: [
    {
      id: "W/(m2.K)",
      label: "W/(m²·K)",
      name: "watt per square metre kelvin",
      scale: 1,
      offset: 0,
      spellings: ["W/m2K", "W/m2/K", "W/m2C", "W/(m2.C)", "W/m2/C"],
    },
    {
      id: "Btu/(h.ft2.degF)",
      label: "Btu/(h·ft²·°F)",
      name: "International Table Btu per hour square foot degree Fahrenheit",
      scale: HEAT_TRANSFER_COEFFICIENT_IMPERIAL,
      offset: 0,
      spellings: ["Btu/h-ft2-F", "Btu/hft2F", "Btu/h/ft2/F", "Btu/(hr.ft2.F)"],
    },
  ],
  foulingResistance: [
    {
      id: "m2.K/W",
      label: "m²·K/W",
      name: "square metre kelvin per watt",
      scale: 1,
      offset: 0,
      spellings: ["m2K/W", "m2.C/W", "m2C/W"],
    },
    {
      id: "h.ft2.degF/Btu",
      label: "h·ft²·°F/Btu",
      name: "hour square foot degree Fahrenheit per International Table Btu",
      scale: 1 / HEAT_TRANSFER_COEFFICIENT_IMPERIAL,
      offset: 0,
      spellings: ["h-ft2-F/Btu", "hft2F/Btu", "hr.ft2.F/Btu"],
    },
  ],
  area: [
    { id: "m2", label: "m²", name: "square metre", scale: 1, offset: 0, spellings: ["m^2", "sq m", "sqm"] },
    {
      id: "ft2",
      label: "ft²",
      name: "square foot",
      scale: SQUARE_METRES_PER_SQUARE_FOOT,
      offset: 0,
      spellings: ["ft^2", "sq ft", "sqft"],
    },
  ],
  specificHeat: [
    {
      id: "J/(kg.K)",
      label: "J/(kg·K)",
      name: "joule per kilogram kelvin",
      scale: 1,
      offset: 0,
      spellings: ["J/kgK", "J/kg/K", "J/kgC", "J/(kg.C)"],
    },
    {
      id: "kJ/(kg.K)",
      label: "kJ/(kg·K)",
      name: "kilojoule per kilogram kelvin",
      scale: 1e3,
      offset: 0,
      spellings: ["kJ/kgK", "kJ/kg/K", "kJ/kgC", "kJ/(kg.C)"],
    },
    {
      id: "Btu/(lb.degF)",
      label: "Btu/(lb·°F)",
      name: "International Table Btu per pound degree Fahrenheit",
      scale: SPECIFIC_HEAT_IMPERIAL,
      offset: 0,
      spellings: ["Btu/lb-F", "Btu/lbF", "Btu/lb/F", "Btu/(lb.F)"],
    },
  ],
  pressure: [
    { id: "Pa", label: "Pa", name: "pascal", scale: 1, offset: 0, spellings: ["pascal", "N/m2"], caseSensitive: true },
    { id: "kPa", label: "kPa", name: "kilopascal", scale: 1e3, offset: 0, spellings: ["kilopascal"], caseSensitive: true },
    { id: "MPa", label: "MPa", name: "megapascal", scale: 1e6, offset: 0, spellings: ["megapascal"], caseSensitive: true },
    // 1 bar = 1e5 Pa exactly (NIST SP 811 (2008) B.8)
    { id: "bar", label: "bar", name: "bar", scale: 1e5, offset: 0, spellings: ["bars"] },
    { id: "psi", label: "psi", name: "pound-force per square inch", scale: PASCALS_PER_PSI, offset: 0, spellings: ["lbf/in2", "lbf/in^2", "psia", "psid"] },
  ],
};

/** The units of one quantity, in display order (SI first). */
export function unitsOf<Q extends Quantity>(quantity: Q): readonly UnitDefinition<UnitOf<Q>>[] {
  return UNIT_TABLE[quantity];
}
