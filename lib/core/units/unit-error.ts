import type { Quantity } from "./quantities";

/** Thrown for a unit text or id that is not one of the quantity's units; the message lists the allowed ones. */
export class UnitError extends Error {
  readonly quantity: Quantity;
  readonly text: string;
  readonly allowed: readonly string[];

  constructor(quantity: Quantity, text: string, allowed: readonly string[], message: string) {
    super(message);
    this.name = "UnitError";
    this.quantity = quantity;
    this.text = text;
    this.allowed = allowed;
  }
}
