import Link from "next/link";
import { AdvisoryCaution } from "../_components/advisory-caution";
import { PlanTimeline } from "../_components/plan-timeline";
import { requireSignedInUser } from "@/lib/auth/current-user";
import { can } from "@/lib/auth/permissions";
import { getPrisma } from "@/lib/db";
import { formatMoney } from "@/lib/present/format";
import { listBookings } from "@/lib/planning/bookings";
import { PlanningError } from "@/lib/planning/load-plan-input";
import { planDocument, type PlanDocument } from "@/lib/planning/plan-document";
import { resolveSiteCode } from "@/lib/planning/resolve-site";
import { latestPlanRun } from "@/lib/planning/run-plan";
import { getPlanSettings, listCalendarWindows, listExclusionGroups } from "@/lib/planning/site-calendar";
import { acceptAction, addWindowAction, groupAction, moveAction, releaseAction, removeWindowAction, replanAction, settingsAction, whatIfAction } from "./actions";

export const dynamic = "force-dynamic";

type SearchParams = Promise<Record<string, string | string[] | undefined>>;
const one = (value: string | string[] | undefined): string | undefined => (Array.isArray(value) ? value[0] : value);

function signedMoney(value: number, currency: string): string {
  return `${value >= 0 ? "+" : ""}${formatMoney(value, currency)}`;
}

function Changes({ plan, title }: { plan: PlanDocument; title: string }) {
  const { comparison, totals } = plan;
  if (!comparison) return null;
  return (
    <section className="panel" id="changes" aria-labelledby="changes-title">
      <h2 id="changes-title">{title}</h2>
      <p>
        Against plan {comparison.previousRunId}: {comparison.changes.length} exchanger(s) changed, {comparison.unchangedAssets} unchanged. Total cost{" "}
        <strong className={comparison.costDifference > 0 ? "cost-up" : "cost-down"}>{signedMoney(comparison.costDifference, totals.currency)}</strong>.
      </p>
      {comparison.changes.length ? (
        <table className="grid">
          <thead><tr><th scope="col">Tag</th><th scope="col">Change</th><th scope="col">Was</th><th scope="col">Now</th><th scope="col" className="num">Cost difference</th></tr></thead>
          <tbody>
            {comparison.changes.map((change) => (
              <tr key={change.tag}>
                <td>{change.tag}</td><td>{change.change}</td><td>{change.from.join(", ") || "no cleaning"}</td><td>{change.to.join(", ") || "no cleaning"}</td>
                <td className={`num ${change.costDifference > 0 ? "cost-up" : "cost-down"}`}>{signedMoney(change.costDifference, totals.currency)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
    </section>
  );
}

export default async function PlanPage({ searchParams }: { searchParams: SearchParams }) {
  const user = await requireSignedInUser();
  const params = await searchParams;
  const prisma = getPrisma();
  let siteCode: string;
  try {
    siteCode = await resolveSiteCode(prisma, one(params.site));
  } catch (error) {
    if (error instanceof PlanningError) return <><h1>Cleaning plan</h1><p className="empty">{error.message}</p></>;
    throw error;
  }
  const runId = Number(one(params.run) ?? NaN);
  const run = Number.isInteger(runId) ? await prisma.planRun.findFirst({ where: { id: runId, site: { code: siteCode } } }) : await latestPlanRun(prisma, siteCode);
  const whatIfId = Number(one(params.whatIf) ?? NaN);
  const whatIfRun = Number.isInteger(whatIfId) ? await prisma.planRun.findFirst({ where: { id: whatIfId, kind: "what-if", site: { code: siteCode } } }) : null;
  const [settings, windows, groups, bookings] = await Promise.all([getPlanSettings(prisma, siteCode), listCalendarWindows(prisma, siteCode), listExclusionGroups(prisma, siteCode), listBookings(prisma, siteCode)]);
  const mayPlan = can(user.role, "plan.run");
  const mayBook = can(user.role, "bookings.edit");
  const mayEditCalendar = can(user.role, "calendar.edit");
  const plan = run ? planDocument(run) : null;
  const whatIf = whatIfRun ? planDocument(whatIfRun) : null;
  const message = one(params.message);
  const error = one(params.error);
  const currency = plan?.totals.currency ?? "";
  const bookedTags = new Set(bookings.map((booking) => booking.tag));
  return (
    <>
      <h1>Cleaning plan — {siteCode}</h1>
      {message ? <p className="notice" role="status">{message}</p> : null}
      {error ? <p className="form-errors" role="alert">{error}</p> : null}
      {mayPlan ? (
        <form action={replanAction} className="actions">
          <input type="hidden" name="site" value={siteCode} />
          <button type="submit">{plan ? "Plan again" : "Make the first plan"}</button>
          <span className="subtle">Re-plans every exchanger around the booked weeks, the crews and the calendar below.</span>
        </form>
      ) : null}
      {!plan ? (
        <p className="empty">No plan yet for {siteCode}.{mayPlan ? "" : " A planner can make one."}</p>
      ) : (
        <>
          <section className="panel" aria-labelledby="summary-title">
            <h2 id="summary-title">Plan {plan.id}{plan.kind === "what-if" ? " (what-if)" : ""}: {plan.horizon.start} to {plan.horizon.end}</h2>
            <dl className="facts">
              <dt>Total cost over the horizon</dt><dd>{formatMoney(plan.totals.planCost, currency)}</dd>
              <dt>Without any cleaning</dt><dd>{formatMoney(plan.totals.noCleaningCost, currency)}</dd>
              <dt>Saving</dt><dd><strong>{formatMoney(plan.totals.saving, currency)}</strong></dd>
              <dt>Solver</dt><dd>{plan.status} (HiGHS: {plan.solver.status}), gap {plan.solver.gap === null ? "n/a" : `${(plan.solver.gap * 100).toFixed(3)} %`}, {plan.solver.solveSeconds.toFixed(2)} s</dd>
              <dt>Made</dt><dd>{plan.createdAt.slice(0, 16).replace("T", " ")} UTC by {plan.createdBy}</dd>
            </dl>
            <p className="actions">
              Export: <a href={`/api/plan/runs/${plan.id}/export?format=ics`}>iCalendar</a> <a href={`/api/plan/runs/${plan.id}/export?format=csv`}>CSV</a> <a href={`/api/plan/runs/${plan.id}/export?format=xlsx`}>Excel (XLSX)</a> <a href={`/api/plan/runs/${plan.id}`}>JSON</a>
            </p>
            <p className="subtle">Costs are fuel and CO2 for the duty lost to fouling, cleaning and outage costs, and lost production below the duty threshold, from each exchanger&apos;s P50 fouling forecast; the cost of the state each exchanger is left in at the horizon end is included so late cleanings are not undervalued.</p>
          </section>

          {plan.violations.length ? (
            <section className="form-errors" role="alert">
              <strong>Rules this plan cannot keep:</strong>
              <ul>{plan.violations.map((violation) => <li key={violation.message}>{violation.message}</li>)}</ul>
            </section>
          ) : null}

          <h2>Timeline</h2>
          <PlanTimeline plan={plan} />

          <Changes plan={plan} title="What changed in this re-plan" />

          <h2>Cleanings</h2>
          {mayBook && plan.cleanings.some((cleaning) => cleaning.state === "proposed") ? (
            <form action={acceptAction} className="actions">
              <input type="hidden" name="site" value={siteCode} />
              <input type="hidden" name="tag" value="" />
              <button type="submit">Book every proposed week</button>
            </form>
          ) : null}
          <table className="grid" aria-label="Planned cleanings">
            <thead>
              <tr>
                <th scope="col">Start (week of)</th><th scope="col">Tag</th><th scope="col">State</th><th scope="col">Window</th><th scope="col" className="num">Outage (d)</th>
                <th scope="col" className="num">Exchanger saving</th><th scope="col">{plan.settings.deadlineQuantile.toUpperCase()} threshold</th><th scope="col">Why this week</th>{mayBook ? <th scope="col">Planner</th> : null}
              </tr>
            </thead>
            <tbody>
              {plan.cleanings.map((cleaning) => {
                const margin = cleaning.thresholds.find((entry) => entry.quantile === plan.settings.deadlineQuantile);
                return (
                  <tr key={`${cleaning.tag}-${cleaning.start}`} id={`clean-${cleaning.tag}-${cleaning.start}`}>
                    <td>{cleaning.start}</td>
                    <td><Link href={`/assets/${encodeURIComponent(cleaning.tag)}`}>{cleaning.tag}</Link></td>
                    <td>{cleaning.state}</td>
                    <td>{cleaning.window}</td>
                    <td className="num">{cleaning.outageDays}</td>
                    <td className="num">{formatMoney(cleaning.savingVsNoCleaning, currency)}</td>
                    <td>{margin ? `${margin.crossing} (${margin.marginDays >= 0 ? `starts ${Math.round(margin.marginDays)} d before it` : `starts ${Math.round(-margin.marginDays)} d after it: late`})` : "beyond the forecast"}</td>
                    <td>
                      <details><summary>{cleaning.explanation[1] ?? "explanation"}</summary><ul>{cleaning.explanation.map((line) => <li key={line}>{line}</li>)}</ul></details>
                    </td>
                    {mayBook ? (
                      <td>
                        {cleaning.state === "proposed" ? (
                          <form action={acceptAction}><input type="hidden" name="site" value={siteCode} /><input type="hidden" name="tag" value={cleaning.tag} /><button type="submit">Book</button></form>
                        ) : (
                          <form action={releaseAction}><input type="hidden" name="site" value={siteCode} /><input type="hidden" name="tag" value={cleaning.tag} /><button type="submit">Release</button></form>
                        )}
                        <form action={moveAction} className="inline-form">
                          <input type="hidden" name="site" value={siteCode} /><input type="hidden" name="tag" value={cleaning.tag} />
                          <label className="field">Move to week of<input type="date" name="week" required defaultValue={cleaning.start} min={plan.horizon.start} /></label>
                          <button type="submit">Move</button>
                        </form>
                      </td>
                    ) : null}
                  </tr>
                );
              })}
            </tbody>
          </table>
          {plan.excluded.length ? (
            <p className="subtle">Not planned: {plan.excluded.map((entry) => `${entry.tag} (${entry.reason})`).join("; ")}.</p>
          ) : null}
          <p className="subtle">Exchangers without a cleaning in the horizon: {plan.assets.filter((asset) => asset.weeks.length === 0).map((asset) => asset.tag).join(", ") || "none"}. Booked weeks not in this plan yet: {bookings.filter((booking) => !plan.cleanings.some((cleaning) => cleaning.tag === booking.tag && cleaning.start === booking.weekStart)).map((booking) => `${booking.tag} ${booking.weekStart}`).join(", ") || "none"}.{bookedTags.size ? "" : ""}</p>

          <section className="panel" id="what-if" aria-labelledby="what-if-title">
            <h2 id="what-if-title">What if</h2>
            {mayPlan ? (
              <form action={whatIfAction} className="inline-form">
                <input type="hidden" name="site" value={siteCode} />
                <label className="field">Fuel price (% of today)<input type="number" name="fuelPercent" min={0} max={1000} step={5} defaultValue={100} /></label>
                <label className="field">CO2 price (% of today)<input type="number" name="co2Percent" min={0} max={1000} step={5} defaultValue={100} /></label>
                <label className="field">Crews per week (+/−)<input type="number" name="crewDelta" min={-10} max={10} step={1} defaultValue={0} /></label>
                <button type="submit">Compare</button>
              </form>
            ) : <p className="subtle">Planners can compare scenarios here.</p>}
            {whatIf ? (
              <>
                <p>
                  What-if {whatIf.id} ({[whatIf.scenario?.fuelPriceFactor !== undefined ? `fuel ×${whatIf.scenario.fuelPriceFactor}` : null, whatIf.scenario?.co2PriceFactor !== undefined ? `CO2 ×${whatIf.scenario.co2PriceFactor}` : null, whatIf.scenario?.crewCapacityDelta !== undefined ? `crews ${whatIf.scenario.crewCapacityDelta > 0 ? "+" : ""}${whatIf.scenario.crewCapacityDelta}` : null].filter(Boolean).join(", ")}):
                  total {formatMoney(whatIf.totals.planCost, currency)}, saving {formatMoney(whatIf.totals.saving, currency)}, {whatIf.cleanings.length} cleanings. <Link href={`/plan?site=${siteCode}&run=${whatIf.id}`}>Open its timeline</Link>
                </p>
                <Changes plan={whatIf} title="Scenario against the baseline" />
              </>
            ) : null}
          </section>
        </>
      )}

      <section className="panel" id="calendar" aria-labelledby="calendar-title">
        <h2 id="calendar-title">Crews and calendar</h2>
        <form action={settingsAction} className="inline-form">
          <input type="hidden" name="site" value={siteCode} />
          <label className="field">Crews (cleanings at once)<input type="number" name="crewCapacity" min={0} max={100} defaultValue={settings.crewCapacity} disabled={!mayEditCalendar} /></label>
          <label className="field">Horizon (weeks)<input type="number" name="horizonWeeks" min={1} max={104} defaultValue={settings.horizonWeeks} disabled={!mayEditCalendar} /></label>
          <label className="field">Latest date from
            <select name="deadlineQuantile" defaultValue={settings.deadlineQuantile} disabled={!mayEditCalendar}>
              <option value="p10">P10 (cautious)</option><option value="p50">P50 (median)</option><option value="p90">P90 (late)</option>
            </select>
          </label>
          <label className="field">Days in service before a cleaning<input type="number" name="minimumDaysBetweenCleanings" min={0} max={3650} defaultValue={settings.minimumDaysBetweenCleanings} disabled={!mayEditCalendar} /></label>
          {mayEditCalendar ? <button type="submit">Save settings</button> : null}
        </form>
        <table className="grid" aria-label="Calendar windows">
          <thead><tr><th scope="col">Kind</th><th scope="col">Name</th><th scope="col">From</th><th scope="col">To</th>{mayEditCalendar ? <th scope="col" /> : null}</tr></thead>
          <tbody>
            {windows.map((window) => (
              <tr key={window.id}>
                <td>{window.kind}</td><td>{window.name}</td><td>{window.startDate}</td><td>{window.endDate}</td>
                {mayEditCalendar ? <td><form action={removeWindowAction}><input type="hidden" name="site" value={siteCode} /><input type="hidden" name="id" value={window.id} /><button type="submit" aria-label={`Remove ${window.name}`}>Remove</button></form></td> : null}
              </tr>
            ))}
            {windows.length === 0 ? <tr><td colSpan={5} className="subtle">No turnaround or blackout windows.</td></tr> : null}
          </tbody>
        </table>
        {mayEditCalendar ? (
          <form action={addWindowAction} className="inline-form">
            <input type="hidden" name="site" value={siteCode} />
            <label className="field">Kind<select name="kind"><option value="turnaround">turnaround</option><option value="blackout">blackout</option></select></label>
            <label className="field">Name<input name="name" required maxLength={120} /></label>
            <label className="field">From<input type="date" name="startDate" required /></label>
            <label className="field">To<input type="date" name="endDate" required /></label>
            <button type="submit">Add window</button>
          </form>
        ) : null}
        <h3>Never out together</h3>
        <ul>{groups.map((group) => <li key={group.name}><strong>{group.name}</strong>: {group.tags.join(", ")}</li>)}</ul>
        {mayEditCalendar ? (
          <form action={groupAction} className="inline-form">
            <input type="hidden" name="site" value={siteCode} />
            <label className="field">Group name<input name="name" required maxLength={120} /></label>
            <label className="field">Tags (comma separated; empty removes the group)<input name="tags" size={40} /></label>
            <button type="submit">Save group</button>
          </form>
        ) : null}
      </section>
      <AdvisoryCaution />
    </>
  );
}
