// Economics of one exchanger on its page: what fouling costs now and ahead, this cycle, and the best cleaning interval.
import type { Asset, Site } from "@/generated/prisma/client";
import type { EconomicsSummary } from "@/lib/planning/economics-summary";
import { formatQuantity, type UnitSystem } from "@/lib/present/display-units";
import { formatMoney, formatSignificant } from "@/lib/present/format";

const GJ = 1e9;

/** Which of the economic inputs come from the asset's register row and which from the site defaults. */
function source(assetValue: number | null): string {
  return assetValue === null ? "site default" : "this exchanger";
}

export function EconomicsPanel({ economics, reason, asset, site, system }: { economics: EconomicsSummary | null; reason: string | null; asset: Asset; site: Site; system: UnitSystem }) {
  if (!economics) {
    return (
      <section className="panel" aria-labelledby="economics-heading">
        <h3 id="economics-heading">Economics</h3>
        <p className="subtle">Cannot be costed yet: {reason ?? "no assessment"}.</p>
      </section>
    );
  }
  const money = (value: number) => formatMoney(value, economics.currency);
  const interval = economics.optimalInterval;
  const { inputs } = economics;
  return (
    <section className="panel" aria-labelledby="economics-heading">
      <h3 id="economics-heading">Economics</h3>
      <dl className="facts">
        <dt>Cost of fouling now</dt><dd><strong>{money(economics.costPerDay)} per day</strong> (energy {money(economics.energyCostPerDay)}, lost production {money(economics.lostProductionPerDay)})</dd>
        <dt>Extra fuel</dt><dd>{formatQuantity(system, "energy", economics.fuelGJPerDay * GJ, 3)} per day</dd>
        <dt>Extra CO₂</dt><dd>{formatSignificant(economics.co2TonnesPerDay, 3)} t per day</dd>
        <dt>This cycle so far</dt><dd>{money(economics.cycleCostToDate)} over {formatSignificant(economics.cycleAgeDays, 3)} days</dd>
      </dl>
      <table className="grid compact" aria-label="Projected cost of fouling without cleaning">
        <thead><tr><th scope="col">Without cleaning, in</th><th scope="col" className="num">Cost per day then</th><th scope="col" className="num">Cost from now to then</th></tr></thead>
        <tbody>
          {economics.projection.map((point) => (
            <tr key={point.daysFromNow}><td>{point.daysFromNow} days</td><td className="num">{money(point.costPerDay)}</td><td className="num">{money(point.costFromNow)}</td></tr>
          ))}
        </tbody>
      </table>
      <h4>Optimal cleaning interval</h4>
      <p>
        {interval.status === "optimum" ? (
          <><strong>{formatSignificant(interval.intervalDays, 3)} days</strong> in service between cleanings, averaging {money(interval.averageCostPerDay)} per day.</>
        ) : interval.status === "no-optimum-within-maximum" ? (
          <>No optimum within {formatSignificant(interval.intervalDays, 3)} days: at this fouling rate a cleaning does not pay for itself within the longest cycle considered.</>
        ) : (
          <>At the shortest cycle considered ({formatSignificant(interval.intervalDays, 3)} days): fouling costs more right after a cleaning than the average over a cycle.</>
        )}
      </p>
      <p className="subtle">
        The interval minimises the average cost per day over a cycle: cleaning cost plus fouling cost, divided by the cycle length (service days plus {formatSignificant(interval.downtimeDays, 2)} days out).
      </p>
      <details>
        <summary>Inputs used</summary>
        <table className="grid compact">
          <thead><tr><th scope="col">Input</th><th scope="col" className="num">Value</th><th scope="col">From</th></tr></thead>
          <tbody>
            <tr><td>Fuel price</td><td className="num">{formatSignificant(inputs.fuelPricePerGJ, 3)} {economics.currency}/GJ</td><td>{source(asset.fuelPriceCentsPerGJ)}</td></tr>
            <tr><td>Furnace efficiency</td><td className="num">{formatSignificant(inputs.heaterEfficiency * 100, 3)} %</td><td>{source(asset.furnaceEfficiency)}</td></tr>
            <tr><td>CO₂ per GJ of fuel</td><td className="num">{formatSignificant(inputs.co2KgPerGJFuel, 3)} kg</td><td>{source(asset.co2KgPerGJ)}</td></tr>
            <tr><td>CO₂ price</td><td className="num">{formatSignificant(inputs.co2PricePerTonne, 3)} {economics.currency}/t</td><td>{source(asset.co2PriceCentsPerTonne)}</td></tr>
            <tr><td>Cleaning cost</td><td className="num">{money(inputs.cleaningCost)}</td><td>{source(asset.cleaningCostCents)}</td></tr>
            <tr><td>Outage per cleaning</td><td className="num">{formatSignificant(inputs.outageDays, 2)} days</td><td>{source(asset.cleaningOutageDays)}</td></tr>
            <tr><td>Lost production while limited or out</td><td className="num">{money(inputs.lostProductionPerDay)} per day</td><td>{source(asset.lostProductionCentsPerDay)}</td></tr>
            <tr><td>Cost of one cleaning, outage included</td><td className="num">{money(economics.cleaningEventCost)}</td><td>computed</td></tr>
          </tbody>
        </table>
        <p className="subtle">Site defaults belong to {site.name}; an exchanger&apos;s own values are set in its register entry.</p>
      </details>
    </section>
  );
}
