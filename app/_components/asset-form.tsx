"use client";

// The asset register form. It edits the same structure as a JSON asset file
// (docs/asset-file.md) and submits it to a server action that validates it with
// the same schema, so the web form and the CLI accept and refuse the same things.
import { useRouter } from "next/navigation";
import { useState, useTransition, type ReactNode } from "react";
import { saveAssetAction, type SaveAssetState } from "@/app/assets/actions";
import { TEMA_DESIGN_FOULING, TEMA_TABLE_NAME } from "@/lib/core/fouling-allowance";
import { UNIT_TABLE, type Quantity } from "@/lib/core/units";

type Measure = { value: number | string; unit: string };
type HeatCapacityDraft = { kind: "constant"; value: Measure } | { kind: "linear"; interceptJPerKgK: number | string; slopeJPerKgK2: number | string } | { kind: "water"; pressure: Measure };
type InstrumentDraft = { role: string; tag: string; uncertainty: number | string };

export interface AssetDraft {
  tag: string;
  name: string;
  site: { code: string; name: string; timeZone: string };
  unit: { code: string; name: string };
  service: string;
  arrangement: { kind: string; shells?: number; tubePasses?: number; mixedStream?: string };
  area: Measure;
  hotStream: { name: string; heatCapacity: HeatCapacityDraft };
  coldStream: { name: string; heatCapacity: HeatCapacityDraft };
  designDuty: Measure;
  designU: Measure;
  designFouling: Measure | { tema: string };
  reference: { hotInlet: Measure; coldInlet: Measure; hotFlow: Measure; coldFlow: Measure };
  dutyThreshold: Measure;
  minimumOutlet?: { stream: string; temperature: Measure };
  instruments: InstrumentDraft[];
  economics: Record<string, number | string>;
  notes: string;
}

const ROLES: [string, string, string][] = [
  ["hotIn", "Hot inlet temperature", "K"],
  ["hotOut", "Hot outlet temperature", "K"],
  ["coldIn", "Cold inlet temperature", "K"],
  ["coldOut", "Cold outlet temperature", "K"],
  ["hotFlow", "Hot mass flow", "kg/s"],
  ["coldFlow", "Cold mass flow", "kg/s"],
  ["hotPressureDrop", "Hot side pressure drop", "Pa"],
  ["coldPressureDrop", "Cold side pressure drop", "Pa"],
];

const ECONOMICS: [string, string][] = [
  ["fuelPricePerGJ", "Fuel price (per GJ)"],
  ["furnaceEfficiency", "Fired-heater efficiency (0–1)"],
  ["co2KgPerGJ", "CO₂ factor (kg/GJ)"],
  ["co2PricePerTonne", "CO₂ price (per tonne)"],
  ["cleaningCost", "Cleaning cost"],
  ["cleaningOutageDays", "Cleaning outage (days)"],
  ["lostProductionPerDay", "Lost production (per day)"],
];

export const EMPTY_ASSET: AssetDraft = {
  tag: "",
  name: "",
  site: { code: "", name: "", timeZone: "UTC" },
  unit: { code: "", name: "" },
  service: "",
  arrangement: { kind: "shell-and-tube", shells: 1, tubePasses: 2 },
  area: { value: "", unit: "m2" },
  hotStream: { name: "", heatCapacity: { kind: "constant", value: { value: "", unit: "kJ/(kg.K)" } } },
  coldStream: { name: "", heatCapacity: { kind: "water", pressure: { value: 5, unit: "bar" } } },
  designDuty: { value: "", unit: "kW" },
  designU: { value: "", unit: "W/(m2.K)" },
  designFouling: { value: "", unit: "m2.K/W" },
  reference: { hotInlet: { value: "", unit: "degC" }, coldInlet: { value: "", unit: "degC" }, hotFlow: { value: "", unit: "kg/s" }, coldFlow: { value: "", unit: "kg/s" } },
  dutyThreshold: { value: "", unit: "kW" },
  instruments: [],
  economics: {},
  notes: "",
};

/** Empty strings become "missing", numeric text becomes numbers, so the schema reports what is wrong. */
function toFile(draft: AssetDraft): unknown {
  const number = (value: number | string) => (value === "" ? undefined : Number(value));
  const measure = (m: Measure) => ({ value: number(m.value), unit: m.unit });
  const heat = (h: HeatCapacityDraft) =>
    h.kind === "constant" ? { kind: "constant", value: measure(h.value) } : h.kind === "linear" ? { kind: "linear", interceptJPerKgK: number(h.interceptJPerKgK), slopeJPerKgK2: number(h.slopeJPerKgK2) } : { kind: "water", pressure: measure(h.pressure) };
  const arrangement =
    draft.arrangement.kind === "shell-and-tube"
      ? { kind: "shell-and-tube", shells: Number(draft.arrangement.shells), tubePasses: Number(draft.arrangement.tubePasses) }
      : draft.arrangement.kind === "crossflow-mixed"
        ? { kind: "crossflow-mixed", mixedStream: draft.arrangement.mixedStream ?? "cold" }
        : { kind: draft.arrangement.kind };
  const economics = Object.fromEntries(Object.entries(draft.economics).filter(([, value]) => value !== "").map(([key, value]) => [key, Number(value)]));
  return {
    tag: draft.tag,
    name: draft.name,
    site: draft.site,
    unit: draft.unit,
    service: draft.service,
    arrangement,
    area: measure(draft.area),
    hotStream: { name: draft.hotStream.name, heatCapacity: heat(draft.hotStream.heatCapacity) },
    coldStream: { name: draft.coldStream.name, heatCapacity: heat(draft.coldStream.heatCapacity) },
    designDuty: measure(draft.designDuty),
    designU: measure(draft.designU),
    designFouling: "tema" in draft.designFouling ? draft.designFouling : measure(draft.designFouling),
    reference: { hotInlet: measure(draft.reference.hotInlet), coldInlet: measure(draft.reference.coldInlet), hotFlow: measure(draft.reference.hotFlow), coldFlow: measure(draft.reference.coldFlow) },
    dutyThreshold: measure(draft.dutyThreshold),
    ...(draft.minimumOutlet && draft.minimumOutlet.temperature.value !== "" ? { minimumOutlet: { stream: draft.minimumOutlet.stream, temperature: measure(draft.minimumOutlet.temperature) } } : {}),
    instruments: draft.instruments.map((instrument) => ({ role: instrument.role, tag: instrument.tag, uncertainty: number(instrument.uncertainty) })),
    economics,
    notes: draft.notes,
  };
}

function Field({ label, id, children, hint }: { label: string; id: string; children: ReactNode; hint?: string }) {
  return (
    <div className="field">
      <label htmlFor={id}>{label}</label>
      {children}
      {hint ? <small className="subtle">{hint}</small> : null}
    </div>
  );
}

function QuantityInput({ id, label, quantity, measure, onChange }: { id: string; label: string; quantity: Quantity; measure: Measure; onChange: (m: Measure) => void }) {
  return (
    <Field label={label} id={id}>
      <span className="quantity">
        <input id={id} type="number" step="any" inputMode="decimal" value={measure.value} onChange={(event) => onChange({ ...measure, value: event.target.value })} />
        <select aria-label={`${label} unit`} value={measure.unit} onChange={(event) => onChange({ ...measure, unit: event.target.value })}>
          {UNIT_TABLE[quantity].map((unit) => (
            <option key={unit.id} value={unit.id}>{unit.label}</option>
          ))}
        </select>
      </span>
    </Field>
  );
}

function HeatCapacityInput({ id, value, onChange }: { id: string; value: HeatCapacityDraft; onChange: (h: HeatCapacityDraft) => void }) {
  return (
    <>
      <Field label="Specific heat model" id={`${id}-kind`}>
        <select
          id={`${id}-kind`}
          value={value.kind}
          onChange={(event) => {
            const kind = event.target.value;
            onChange(kind === "water" ? { kind: "water", pressure: { value: 5, unit: "bar" } } : kind === "linear" ? { kind: "linear", interceptJPerKgK: "", slopeJPerKgK2: "" } : { kind: "constant", value: { value: "", unit: "kJ/(kg.K)" } });
          }}
        >
          <option value="constant">Constant</option>
          <option value="linear">Linear in temperature (cp = a + b·T[K])</option>
          <option value="water">Liquid water (IAPWS-IF97)</option>
        </select>
      </Field>
      {value.kind === "constant" ? <QuantityInput id={`${id}-cp`} label="Specific heat" quantity="specificHeat" measure={value.value} onChange={(m) => onChange({ kind: "constant", value: m })} /> : null}
      {value.kind === "linear" ? (
        <>
          <Field label="a, J/(kg·K)" id={`${id}-a`}>
            <input id={`${id}-a`} type="number" step="any" value={value.interceptJPerKgK} onChange={(event) => onChange({ ...value, interceptJPerKgK: event.target.value })} />
          </Field>
          <Field label="b, J/(kg·K²)" id={`${id}-b`}>
            <input id={`${id}-b`} type="number" step="any" value={value.slopeJPerKgK2} onChange={(event) => onChange({ ...value, slopeJPerKgK2: event.target.value })} />
          </Field>
        </>
      ) : null}
      {value.kind === "water" ? <QuantityInput id={`${id}-p`} label="Water pressure" quantity="pressure" measure={value.pressure} onChange={(m) => onChange({ kind: "water", pressure: m })} /> : null}
    </>
  );
}

export function AssetForm({ mode, initial }: { mode: "create" | "update"; initial: AssetDraft }) {
  const router = useRouter();
  const [draft, setDraft] = useState<AssetDraft>(initial);
  const [state, setState] = useState<SaveAssetState | null>(null);
  const [pending, startTransition] = useTransition();
  const set = <K extends keyof AssetDraft>(key: K, value: AssetDraft[K]) => setDraft((current) => ({ ...current, [key]: value }));
  const usesTema = "tema" in draft.designFouling;

  function submit(event: React.FormEvent) {
    event.preventDefault();
    startTransition(async () => {
      const result = await saveAssetAction(mode, JSON.stringify(toFile(draft)));
      setState(result);
      if (result.ok && result.tag) router.push(`/assets/${encodeURIComponent(result.tag)}?saved=1`);
    });
  }

  return (
    <form onSubmit={submit} className="asset-form" noValidate>
      {state && !state.ok ? (
        <div role="alert" className="form-errors">
          <strong>Not saved: {state.problems.length} problem{state.problems.length === 1 ? "" : "s"}.</strong>
          <ul>{state.problems.map((problem) => <li key={problem}>{problem}</li>)}</ul>
        </div>
      ) : null}
      <fieldset>
        <legend>Identity</legend>
        <Field label="Tag" id="tag" hint={mode === "update" ? "The tag cannot be changed." : undefined}>
          <input id="tag" value={draft.tag} readOnly={mode === "update"} required onChange={(event) => set("tag", event.target.value)} />
        </Field>
        <Field label="Name" id="name"><input id="name" value={draft.name} required onChange={(event) => set("name", event.target.value)} /></Field>
        <Field label="Service" id="service"><input id="service" value={draft.service} required onChange={(event) => set("service", event.target.value)} /></Field>
        <Field label="Site code" id="site-code"><input id="site-code" value={draft.site.code} onChange={(event) => set("site", { ...draft.site, code: event.target.value })} /></Field>
        <Field label="Site name" id="site-name"><input id="site-name" value={draft.site.name} onChange={(event) => set("site", { ...draft.site, name: event.target.value })} /></Field>
        <Field label="Site time zone (IANA)" id="site-zone"><input id="site-zone" value={draft.site.timeZone} onChange={(event) => set("site", { ...draft.site, timeZone: event.target.value })} /></Field>
        <Field label="Process unit code" id="unit-code"><input id="unit-code" value={draft.unit.code} onChange={(event) => set("unit", { ...draft.unit, code: event.target.value })} /></Field>
        <Field label="Process unit name" id="unit-name"><input id="unit-name" value={draft.unit.name} onChange={(event) => set("unit", { ...draft.unit, name: event.target.value })} /></Field>
      </fieldset>

      <fieldset>
        <legend>Configuration</legend>
        <Field label="Flow arrangement" id="arrangement">
          <select id="arrangement" value={draft.arrangement.kind} onChange={(event) => set("arrangement", { ...draft.arrangement, kind: event.target.value })}>
            <option value="shell-and-tube">Shell and tube, E shells in series</option>
            <option value="counterflow">Counterflow</option>
            <option value="parallel">Parallel flow</option>
            <option value="crossflow-unmixed">Crossflow, both streams unmixed</option>
            <option value="crossflow-mixed">Crossflow, one stream mixed</option>
          </select>
        </Field>
        {draft.arrangement.kind === "shell-and-tube" ? (
          <>
            <Field label="Shells in series" id="shells"><input id="shells" type="number" min={1} max={12} value={draft.arrangement.shells ?? 1} onChange={(event) => set("arrangement", { ...draft.arrangement, shells: Number(event.target.value) })} /></Field>
            <Field label="Tube passes per shell" id="passes"><input id="passes" type="number" min={2} step={2} value={draft.arrangement.tubePasses ?? 2} onChange={(event) => set("arrangement", { ...draft.arrangement, tubePasses: Number(event.target.value) })} /></Field>
          </>
        ) : null}
        {draft.arrangement.kind === "crossflow-mixed" ? (
          <Field label="Mixed stream" id="mixed">
            <select id="mixed" value={draft.arrangement.mixedStream ?? "cold"} onChange={(event) => set("arrangement", { ...draft.arrangement, mixedStream: event.target.value })}>
              <option value="hot">Hot</option>
              <option value="cold">Cold</option>
            </select>
          </Field>
        ) : null}
        <QuantityInput id="area" label="Heat-transfer area" quantity="area" measure={draft.area} onChange={(m) => set("area", m)} />
      </fieldset>

      <fieldset>
        <legend>Hot stream</legend>
        <Field label="Name" id="hot-name"><input id="hot-name" value={draft.hotStream.name} onChange={(event) => set("hotStream", { ...draft.hotStream, name: event.target.value })} /></Field>
        <HeatCapacityInput id="hot" value={draft.hotStream.heatCapacity} onChange={(heatCapacity) => set("hotStream", { ...draft.hotStream, heatCapacity })} />
      </fieldset>
      <fieldset>
        <legend>Cold stream</legend>
        <Field label="Name" id="cold-name"><input id="cold-name" value={draft.coldStream.name} onChange={(event) => set("coldStream", { ...draft.coldStream, name: event.target.value })} /></Field>
        <HeatCapacityInput id="cold" value={draft.coldStream.heatCapacity} onChange={(heatCapacity) => set("coldStream", { ...draft.coldStream, heatCapacity })} />
      </fieldset>

      <fieldset>
        <legend>Design and thresholds</legend>
        <QuantityInput id="design-duty" label="Design duty" quantity="power" measure={draft.designDuty} onChange={(m) => set("designDuty", m)} />
        <QuantityInput id="design-u" label="Design U" quantity="heatTransferCoefficient" measure={draft.designU} onChange={(m) => set("designU", m)} />
        <Field label="Design fouling allowance" id="fouling-source" hint={usesTema ? `Default from ${TEMA_TABLE_NAME}. Entries marked "from memory" must be confirmed against the table.` : undefined}>
          <select id="fouling-source" value={usesTema ? (draft.designFouling as { tema: string }).tema : ""} onChange={(event) => set("designFouling", event.target.value ? { tema: event.target.value } : { value: "", unit: "m2.K/W" })}>
            <option value="">Enter a value</option>
            {TEMA_DESIGN_FOULING.map((entry) => (
              <option key={entry.id} value={entry.id}>TEMA: {entry.label} — {entry.m2KPerW.toPrecision(3)} m²·K/W{entry.provenance === "from memory" ? " (from memory)" : ""}</option>
            ))}
          </select>
        </Field>
        {!usesTema ? <QuantityInput id="design-fouling" label="Design fouling value" quantity="foulingResistance" measure={draft.designFouling as Measure} onChange={(m) => set("designFouling", m)} /> : null}
        <QuantityInput id="threshold" label="Duty threshold at reference conditions" quantity="power" measure={draft.dutyThreshold} onChange={(m) => set("dutyThreshold", m)} />
      </fieldset>

      <fieldset>
        <legend>Reference operating conditions</legend>
        <QuantityInput id="ref-hot-in" label="Hot inlet temperature" quantity="temperature" measure={draft.reference.hotInlet} onChange={(m) => set("reference", { ...draft.reference, hotInlet: m })} />
        <QuantityInput id="ref-cold-in" label="Cold inlet temperature" quantity="temperature" measure={draft.reference.coldInlet} onChange={(m) => set("reference", { ...draft.reference, coldInlet: m })} />
        <QuantityInput id="ref-hot-flow" label="Hot mass flow" quantity="massFlow" measure={draft.reference.hotFlow} onChange={(m) => set("reference", { ...draft.reference, hotFlow: m })} />
        <QuantityInput id="ref-cold-flow" label="Cold mass flow" quantity="massFlow" measure={draft.reference.coldFlow} onChange={(m) => set("reference", { ...draft.reference, coldFlow: m })} />
      </fieldset>

      <fieldset>
        <legend>Instruments</legend>
        <p className="subtle">Standard uncertainty (one standard deviation) in SI: K for temperatures, kg/s for flows, Pa for pressure drops.</p>
        <table className="grid">
          <thead><tr><th scope="col">Measurement</th><th scope="col">Tag</th><th scope="col">Uncertainty</th><th scope="col"><span className="visually-hidden">Remove</span></th></tr></thead>
          <tbody>
            {draft.instruments.map((instrument, index) => (
              <tr key={instrument.role}>
                <td>{ROLES.find(([role]) => role === instrument.role)?.[1] ?? instrument.role}</td>
                <td><input aria-label={`${instrument.role} tag`} value={instrument.tag} onChange={(event) => set("instruments", draft.instruments.map((item, i) => (i === index ? { ...item, tag: event.target.value } : item)))} /></td>
                <td><input aria-label={`${instrument.role} uncertainty`} type="number" step="any" value={instrument.uncertainty} onChange={(event) => set("instruments", draft.instruments.map((item, i) => (i === index ? { ...item, uncertainty: event.target.value } : item)))} /> {ROLES.find(([role]) => role === instrument.role)?.[2]}</td>
                <td><button type="button" onClick={() => set("instruments", draft.instruments.filter((_, i) => i !== index))}>Remove</button></td>
              </tr>
            ))}
          </tbody>
        </table>
        <label htmlFor="add-instrument">Add instrument </label>
        <select id="add-instrument" value="" onChange={(event) => event.target.value && set("instruments", [...draft.instruments, { role: event.target.value, tag: "", uncertainty: "" }])}>
          <option value="">Choose a measurement…</option>
          {ROLES.filter(([role]) => !draft.instruments.some((instrument) => instrument.role === role)).map(([role, label]) => <option key={role} value={role}>{label}</option>)}
        </select>
      </fieldset>

      <fieldset>
        <legend>Economics (blank uses the site default)</legend>
        {ECONOMICS.map(([key, label]) => (
          <Field key={key} label={label} id={`eco-${key}`}>
            <input id={`eco-${key}`} type="number" step="any" value={draft.economics[key] ?? ""} onChange={(event) => set("economics", { ...draft.economics, [key]: event.target.value })} />
          </Field>
        ))}
      </fieldset>

      <fieldset>
        <legend>Notes</legend>
        <textarea aria-label="Notes" rows={3} value={draft.notes} onChange={(event) => set("notes", event.target.value)} />
      </fieldset>

      <p>
        <button type="submit" className="primary" disabled={pending}>{pending ? "Saving…" : mode === "create" ? "Create asset" : "Save changes"}</button>
      </p>
    </form>
  );
}
