// The model card of an assessment: the clean-U model with its uncertainties, the fouling trend and why it was chosen,
// and which data went in.
import type { Assessment } from "@/lib/core/assessment";
import type { PeriodRow } from "@/lib/data/list-periods";
import { formatQuantity, toDisplay, displayUnit, type UnitSystem } from "@/lib/present/display-units";
import { formatSignificant } from "@/lib/present/format";

const TREND_LABELS: Record<string, string> = { linear: "linear", asymptotic: "asymptotic (Kern–Seaton)", "falling-rate": "falling rate" };

export function ModelCard({ assessment, periods, system }: { assessment: Assessment; periods: PeriodRow[]; system: UnitSystem }) {
  const model = assessment.cleanModel;
  const rfUnit = displayUnit(system, "foulingResistance").label;
  const rf = (value: number | null) => (value === null ? "—" : formatSignificant(toDisplay(system, "foulingResistance", value) ?? Number.NaN, 3));
  const usable = periods.filter((period) => period.usable).length;
  const byReason = periods.reduce<Record<string, number>>((counts, period) => {
    // Reasons carry per-day detail in brackets ("too few usable samples (6 of 24, need 12): ..."): count by the kind.
    const kind = (period.reason ?? "not usable").split(" (")[0]?.split(":").slice(0, 2).join(":").trim() || "not usable";
    if (!period.usable) counts[kind] = (counts[kind] ?? 0) + 1;
    return counts;
  }, {});
  const trend = assessment.trend;
  return (
    <section className="panel" aria-labelledby="model-heading">
      <h3 id="model-heading">Model card</h3>
      <h4>Clean U: 1/U = a<sub>h</sub>(m<sub>h</sub>/m<sub>h,ref</sub>)<sup>−n<sub>h</sub></sup> + a<sub>c</sub>(m<sub>c</sub>/m<sub>c,ref</sub>)<sup>−n<sub>c</sub></sup> + R<sub>w</sub></h4>
      {model ? (
        <table className="grid compact">
          <thead><tr><th scope="col">Parameter</th><th scope="col" className="num">Estimate</th><th scope="col" className="num">Std. error</th></tr></thead>
          <tbody>
            {([
              [`Hot film a_h at ref. flow (${rfUnit})`, rf(model.parameters.hotFilmResistanceRefM2KPerW), model.standardErrors.hotFilm === null ? "held" : rf(model.standardErrors.hotFilm)],
              [`Cold film a_c at ref. flow (${rfUnit})`, rf(model.parameters.coldFilmResistanceRefM2KPerW), model.standardErrors.coldFilm === null ? "held" : rf(model.standardErrors.coldFilm)],
              [`Wall R_w (${rfUnit})`, rf(model.parameters.wallResistanceM2KPerW), model.standardErrors.wall === null ? "held" : rf(model.standardErrors.wall)],
              ["Hot flow exponent n_h", formatSignificant(model.parameters.exponentHot, 3), model.standardErrors.exponentHot === null ? "held" : formatSignificant(model.standardErrors.exponentHot, 2)],
              ["Cold flow exponent n_c", formatSignificant(model.parameters.exponentCold, 3), model.standardErrors.exponentCold === null ? "held" : formatSignificant(model.standardErrors.exponentCold, 2)],
            ] as const).map(([label, value, error]) => (
              <tr key={label}><td>{label}</td><td className="num">{value}</td><td className="num">{error}</td></tr>
            ))}
          </tbody>
        </table>
      ) : <p className="subtle">No clean-U model could be fitted; the data sheet is used.</p>}
      <dl className="facts">
        <dt>Clean U at reference</dt><dd>{model ? formatQuantity(system, "u", model.cleanUAtReferenceWPerM2K, 3) : "—"}{model ? ` (anchor: ${model.anchor}; film terms: ${model.filmTerms.mode.replaceAll("-", " ")})` : ""}</dd>
        <dt>Fit % (estimation / validation)</dt><dd>{model ? `${model.fitPercent.estimation === null ? "—" : formatSignificant(model.fitPercent.estimation, 3)} % / ${model.fitPercent.validation === null ? "—" : formatSignificant(model.fitPercent.validation, 3)} %` : "—"} <span className="subtle">(100 % is a perfect fit; the validation part is the last 30 % of clean points, not used in the fit)</span></dd>
        <dt>Data used</dt><dd>{usable} usable days of {periods.length}{model ? `; ${model.pointCount} days in the clean-model fit` : ""}</dd>
        <dt>Days excluded</dt><dd>{Object.keys(byReason).length ? Object.entries(byReason).sort((a, b) => b[1] - a[1]).map(([reason, count]) => `${reason}: ${count}`).join("; ") : "none"}</dd>
      </dl>
      <h4>Fouling trend of the current cycle</h4>
      {trend ? (
        <>
          <p><strong>{TREND_LABELS[trend.model] ?? trend.model}</strong>: {trend.reason}{trend.priorUsed ? ` Shape prior from cycles ${trend.priorUsed.sourceCycles.map((cycle) => cycle + 1).join(", ")}.` : ""}</p>
          <table className="grid compact" aria-label="Trend models compared by AICc">
            <thead><tr><th scope="col">Model</th><th scope="col" className="num">Parameters</th><th scope="col" className="num">AICc</th><th scope="col" className="num">ΔAICc</th><th scope="col" className="num">Akaike weight</th></tr></thead>
            <tbody>
              {trend.aiccTable.map((row) => (
                <tr key={row.kind} className={row.kind === trend.model ? "chosen" : undefined}>
                  <td>{TREND_LABELS[row.kind] ?? row.kind}{row.kind === trend.model ? " (chosen)" : ""}{row.converged ? "" : " — did not converge"}</td>
                  <td className="num">{row.parameterCount}</td>
                  <td className="num">{row.aicc === null ? "—" : formatSignificant(row.aicc, 5)}</td>
                  <td className="num">{row.deltaAicc === null ? "—" : formatSignificant(row.deltaAicc, 2)}</td>
                  <td className="num">{row.akaikeWeight < 0.01 ? "< 0.01" : formatSignificant(row.akaikeWeight, 2)}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <p className="subtle">
            AICc (Hurvich &amp; Tsai 1989) trades fit against the number of parameters; the lowest wins. Bands widened for day-to-day correlation
            (lag-one autocorrelation {trend.lagOneAutocorrelation === null ? "—" : formatSignificant(trend.lagOneAutocorrelation, 2)}, variance × {formatSignificant(trend.varianceInflation, 3)}).
          </p>
        </>
      ) : <p className="subtle">No trend: too few usable days in the current cycle.</p>}
      {assessment.notes.length ? <ul className="subtle">{assessment.notes.map((note) => <li key={note}>{note}</li>)}</ul> : null}
    </section>
  );
}
