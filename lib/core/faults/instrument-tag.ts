import type { ExchangerModel, InstrumentRole } from "../screening/types";

/** instrumentTag: the tag of the model's instrument in a role ("" when the model has none). */
export function instrumentTag(model: ExchangerModel, role: InstrumentRole): string {
  return model.instruments.find((instrument) => instrument.role === role)?.tag ?? "";
}
