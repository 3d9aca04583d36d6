import { EconomicsInputError } from "./errors";

/**
 * requireNonNegative: throws EconomicsInputError unless the value is finite and >= 0; the message names the quantity
 * and its value with unit, e.g. "fuel price must be a finite number >= 0, got -1 per GJ".
 */
export function requireNonNegative(value: number, quantity: string, unit: string): void {
  if (!Number.isFinite(value) || value < 0) {
    throw new EconomicsInputError(quantity, `${quantity} must be a finite number >= 0, got ${value}${unit}`);
  }
}
