/**
 * Exact defining constants behind every conversion factor. Derived factors are products and quotients of these,
 * so they agree with NIST SP 811 (2008), Thompson & Taylor, Guide for the Use of the International System of
 * Units, Appendix B.8 and B.9, to the digits printed there (checked in the tests).
 */

/** 1 lb (avoirdupois pound) = 0.453 592 37 kg exactly (International Yard and Pound Agreement 1959; NIST SP 811 B.8). */
export const KILOGRAMS_PER_POUND = 0.45359237;

/** 1 ft = 0.3048 m exactly (1959 agreement; NIST SP 811 B.8). */
export const METRES_PER_FOOT = 0.3048;

/**
 * 1 Btu_IT = 1055.055 852 62 J exactly (International Table Btu, defined through 1 cal_IT = 4.1868 J and
 * 1 Btu_IT/(lb·°F) = 1 cal_IT/(g·°C); NIST SP 811 B.8 prints 1.055 056 E+03).
 */
export const JOULES_PER_BTU_IT = 1055.05585262;

/** 1 h = 3600 s exactly. */
export const SECONDS_PER_HOUR = 3600;

/** 1 t (tonne) = 1000 kg exactly. */
export const KILOGRAMS_PER_TONNE = 1000;

/** Size of one kelvin in degrees Fahrenheit or Rankine: 1 K = 1.8 °F = 1.8 °R exactly (NIST SP 811 B.9). */
export const FAHRENHEIT_DEGREES_PER_KELVIN = 1.8;

/** 0 °C = 273.15 K exactly (NIST SP 811 B.9: T/K = t/°C + 273.15). */
export const KELVIN_AT_ZERO_CELSIUS = 273.15;

/** 0 °F = 459.67 °R exactly (NIST SP 811 B.9: T/K = (t/°F + 459.67)/1.8). */
export const RANKINE_AT_ZERO_FAHRENHEIT = 459.67;

/** Standard acceleration of gravity, m/s², exact (3rd CGPM 1901; NIST SP 811 (2008) B.8 note). */
export const STANDARD_GRAVITY_M_PER_S2 = 9.80665;

/** International inch, m, exact (NIST SP 811 (2008) B.8). */
export const METRES_PER_INCH = 0.0254;
