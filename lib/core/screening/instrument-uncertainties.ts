import { medianValue } from "./median-value";
import { roleColumn } from "./role-column";
import type { ExchangerModel, InstrumentRole, ReadingColumns } from "./types";

/** Standard uncertainties by role: K for the four temperatures, a fraction of reading for the two flows. */
export interface InstrumentUncertainties {
  hotIn: number;
  hotOut: number;
  coldIn: number;
  coldOut: number;
  /** σ/F_ref, dimensionless: the flow meter's relative standard uncertainty at any flow. */
  hotFlow: number;
  coldFlow: number;
  /** F_ref used for each meter, kg/s (model.referenceFlows, or the median positive reading; NaN if none). */
  referenceFlows: { hotKgPerS: number; coldKgPerS: number };
}

const ROLES: readonly InstrumentRole[] = ["hotIn", "hotOut", "coldIn", "coldOut", "hotFlow", "coldFlow"];

/**
 * instrumentUncertainties: the standard uncertainty of every instrument as used by screening and reconciliation.
 *
 * Temperatures keep their stated uncertainty (K). Flow meters are "percent of reading" instruments: the stated
 * uncertainty σ (kg/s at the reference flow F_ref) becomes the relative uncertainty σ/F_ref, applied at every flow,
 * the same convention as the demo simulator. F_ref is model.referenceFlows when given, else the median of the
 * meter's positive readings (documented stand-in: a meter's uncertainty is usually stated near its normal flow).
 * Source: GUM (JCGM 100:2008), Sect. 4.3 (Type B evaluation from a stated uncertainty; from memory).
 *
 * @throws Error when the model lacks one of the six instruments or an uncertainty is not positive and finite.
 * @returns uncertainties by role; a flow's relative uncertainty is NaN if the meter has no positive reading at all.
 */
export function instrumentUncertainties(model: ExchangerModel, columns: ReadingColumns): InstrumentUncertainties {
  const stated = {} as Record<InstrumentRole, number>;
  for (const role of ROLES) {
    const instrument = model.instruments.find((candidate) => candidate.role === role);
    if (instrument === undefined) throw new Error(`exchanger model has no ${role} instrument`);
    if (!(instrument.standardUncertainty > 0 && Number.isFinite(instrument.standardUncertainty))) {
      throw new Error(`${role} standard uncertainty must be positive, got ${instrument.standardUncertainty}`);
    }
    stated[role] = instrument.standardUncertainty;
  }
  const reference = (role: "hotFlow" | "coldFlow"): number => {
    const given = role === "hotFlow" ? model.referenceFlows?.hotKgPerS : model.referenceFlows?.coldKgPerS;
    if (given !== undefined) {
      if (!(given > 0 && Number.isFinite(given))) throw new Error(`${role} reference flow must be positive, got ${given} kg/s`);
      return given;
    }
    const column = roleColumn(columns, role);
    const positive = column.filter((value) => value > 0);
    return medianValue(positive);
  };
  const hotKgPerS = reference("hotFlow");
  const coldKgPerS = reference("coldFlow");
  return {
    hotIn: stated.hotIn,
    hotOut: stated.hotOut,
    coldIn: stated.coldIn,
    coldOut: stated.coldOut,
    hotFlow: stated.hotFlow / hotKgPerS,
    coldFlow: stated.coldFlow / coldKgPerS,
    referenceFlows: { hotKgPerS, coldKgPerS },
  };
}
