/** Why a thermal input was rejected. */
export type ThermalErrorReason =
  | "not-finite"
  | "negative"
  | "non-positive"
  | "temperature-cross"
  | "wrong-direction"
  | "out-of-range"
  | "exceeds-limit";

/**
 * The one error type of the thermal core. `quantity` names the offending input in words
 * ("hot mass flow"), `value` is its value in SI, `reason` classifies the failure, and the message
 * names quantity, value and unit, e.g. "hot mass flow must be positive, got -2 kg/s".
 */
export class ThermalInputError extends Error {
  readonly quantity: string;
  readonly value: number;
  readonly reason: ThermalErrorReason;

  constructor(quantity: string, value: number, reason: ThermalErrorReason, message: string) {
    super(message);
    this.name = "ThermalInputError";
    this.quantity = quantity;
    this.value = value;
    this.reason = reason;
  }
}
