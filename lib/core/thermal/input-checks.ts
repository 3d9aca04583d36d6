import { ThermalInputError } from "./errors";

/** Formats a value and its unit for an error message: "-2 kg/s", "NaN K", "0.5" (no unit). */
export function withUnit(value: number, unit: string): string {
  return unit === "" ? String(value) : `${value} ${unit}`;
}

/** Throws "not-finite" unless the value is a finite number. */
export function requireFinite(value: number, quantity: string, unit: string): number {
  if (!Number.isFinite(value)) {
    throw new ThermalInputError(
      quantity,
      value,
      "not-finite",
      `${quantity} must be a finite number, got ${withUnit(value, unit)}`,
    );
  }
  return value;
}

/** Throws "not-finite" or "non-positive" unless the value is finite and above zero. */
export function requirePositive(value: number, quantity: string, unit: string): number {
  requireFinite(value, quantity, unit);
  if (value <= 0) {
    throw new ThermalInputError(
      quantity,
      value,
      "non-positive",
      `${quantity} must be positive, got ${withUnit(value, unit)}`,
    );
  }
  return value;
}

/** Throws "not-finite" or "negative" unless the value is finite and at least zero. */
export function requireNonNegative(value: number, quantity: string, unit: string): number {
  requireFinite(value, quantity, unit);
  if (value < 0) {
    throw new ThermalInputError(
      quantity,
      value,
      "negative",
      `${quantity} must not be negative, got ${withUnit(value, unit)}`,
    );
  }
  return value;
}

/** Throws "not-finite", "negative" or "out-of-range" unless 0 ≤ capacity ratio ≤ 1. */
export function requireCapacityRatio(capacityRatio: number): number {
  requireNonNegative(capacityRatio, "capacity ratio", "");
  if (capacityRatio > 1) {
    throw new ThermalInputError(
      "capacity ratio",
      capacityRatio,
      "out-of-range",
      `capacity ratio Cmin/Cmax must be between 0 and 1, got ${capacityRatio}`,
    );
  }
  return capacityRatio;
}

/** Throws "not-finite" or "out-of-range" unless the number of shells is a whole number of at least 1. */
export function requireShellCount(shells: number): number {
  requireFinite(shells, "number of shells", "");
  if (!Number.isInteger(shells) || shells < 1) {
    throw new ThermalInputError(
      "number of shells",
      shells,
      "out-of-range",
      `number of shells must be a whole number of at least 1, got ${shells}`,
    );
  }
  return shells;
}

/**
 * Runs a check for one side of the exchanger and, if it throws a ThermalInputError, rethrows it with the
 * side named in quantity and message ("hot mass flow must be positive, got -2 kg/s").
 */
export function onSide<T>(side: "hot" | "cold", check: () => T): T {
  try {
    return check();
  } catch (error) {
    if (error instanceof ThermalInputError) {
      throw new ThermalInputError(`${side} ${error.quantity}`, error.value, error.reason, `${side} ${error.message}`);
    }
    throw error;
  }
}
