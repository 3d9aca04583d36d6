/**
 * The one error type of the economics core: `quantity` names the rejected input in words, and the message says
 * what was expected and what was given, e.g. "heater efficiency must be in (0, 1], got 1.2".
 */
export class EconomicsInputError extends Error {
  readonly quantity: string;

  constructor(quantity: string, message: string) {
    super(message);
    this.name = "EconomicsInputError";
    this.quantity = quantity;
  }
}
