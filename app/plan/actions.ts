"use server";

import { redirect } from "next/navigation";
import { requireRole } from "@/lib/auth/require-role";
import { getPrisma } from "@/lib/db";
import { acceptProposals, moveBooking, releaseBooking } from "@/lib/planning/bookings";
import { PlanningError } from "@/lib/planning/load-plan-input";
import { runPlan } from "@/lib/planning/run-plan";
import { addCalendarWindow, removeCalendarWindow, setExclusionGroup, updatePlanSettings } from "@/lib/planning/site-calendar";

const text = (formData: FormData, name: string): string => {
  const value = formData.get(name);
  return typeof value === "string" ? value.trim() : "";
};

const optionalNumber = (formData: FormData, name: string): number | undefined => {
  const value = text(formData, name);
  return value === "" ? undefined : Number(value);
};

/** Runs `work`, then returns to the planner page with a message (and extra query), or with the error in words. */
async function planAction(site: string, work: () => Promise<string | { message: string; query: string }>, anchor = ""): Promise<never> {
  let query: string;
  try {
    const result = await work();
    query = typeof result === "string" ? `message=${encodeURIComponent(result)}` : `message=${encodeURIComponent(result.message)}&${result.query}`;
  } catch (error) {
    if (!(error instanceof PlanningError)) throw error;
    query = `error=${encodeURIComponent(error.message)}`;
  }
  redirect(`/plan?site=${encodeURIComponent(site)}&${query}${anchor}`);
}

/** Re-plans the site around its bookings. */
export async function replanAction(formData: FormData): Promise<void> {
  const user = await requireRole("plan.run");
  const site = text(formData, "site");
  await planAction(site, async () => {
    const document = await runPlan(getPrisma(), { siteCode: site, actor: { userId: user.id, name: user.email } });
    return `Plan ${document.id}: ${document.cleanings.length} cleanings, ${document.comparison ? `${document.comparison.changes.length} asset(s) changed` : "first plan of this horizon"}.`;
  });
}

/** Books proposed weeks (one asset, or all with tag empty) and re-plans around them. */
export async function acceptAction(formData: FormData): Promise<void> {
  const user = await requireRole("bookings.edit");
  const site = text(formData, "site");
  const tag = text(formData, "tag");
  await planAction(site, async () => {
    const actor = { userId: user.id, name: user.email };
    const made = await acceptProposals(getPrisma(), site, tag ? [tag] : [], actor);
    await runPlan(getPrisma(), { siteCode: site, actor });
    return made.length ? `Booked ${made.map((entry) => `${entry.tag} (week of ${entry.weekStart})`).join(", ")}.` : "Nothing left to book.";
  });
}

/** Books an asset for another week, then re-plans; the page shows what moved and the cost difference. */
export async function moveAction(formData: FormData): Promise<void> {
  const user = await requireRole("bookings.edit");
  const site = text(formData, "site");
  const tag = text(formData, "tag");
  await planAction(site, async () => {
    const actor = { userId: user.id, name: user.email };
    const moved = await moveBooking(getPrisma(), tag, text(formData, "week"), actor, { note: text(formData, "note") });
    const document = await runPlan(getPrisma(), { siteCode: site, actor });
    const cost = document.comparison?.costDifference ?? 0;
    return `Booked ${moved.tag} for the week of ${moved.weekStart}; re-planned: cost ${cost >= 0 ? "+" : "−"}${Math.abs(Math.round(cost)).toLocaleString("en-GB")} ${document.totals.currency} against the previous plan.`;
  }, "#changes");
}

/** Frees an asset's booking and re-plans. */
export async function releaseAction(formData: FormData): Promise<void> {
  const user = await requireRole("bookings.edit");
  const site = text(formData, "site");
  const tag = text(formData, "tag");
  await planAction(site, async () => {
    const actor = { userId: user.id, name: user.email };
    const released = await releaseBooking(getPrisma(), tag, actor);
    await runPlan(getPrisma(), { siteCode: site, actor });
    return `Released ${tag} (${released.released.join(", ")}) and re-planned.`;
  }, "#changes");
}

/** What-if: the same plan with scaled fuel or CO2 prices or changed crews, stored as its own run. */
export async function whatIfAction(formData: FormData): Promise<void> {
  const user = await requireRole("plan.run");
  const site = text(formData, "site");
  const fuelPriceFactor = optionalNumber(formData, "fuelPercent");
  const co2PriceFactor = optionalNumber(formData, "co2Percent");
  const crewCapacityDelta = optionalNumber(formData, "crewDelta");
  await planAction(site, async () => {
    for (const [name, value] of [["fuel price", fuelPriceFactor], ["CO2 price", co2PriceFactor], ["crew change", crewCapacityDelta]] as const) {
      if (value !== undefined && !Number.isFinite(value)) throw new PlanningError(`${name} must be a number`);
    }
    if (crewCapacityDelta !== undefined && !Number.isInteger(crewCapacityDelta)) throw new PlanningError("crew change must be a whole number");
    const scenario = {
      ...(fuelPriceFactor !== undefined && fuelPriceFactor !== 100 ? { fuelPriceFactor: fuelPriceFactor / 100 } : {}),
      ...(co2PriceFactor !== undefined && co2PriceFactor !== 100 ? { co2PriceFactor: co2PriceFactor / 100 } : {}),
      ...(crewCapacityDelta ? { crewCapacityDelta } : {}),
    };
    if (Object.keys(scenario).length === 0) throw new PlanningError("change the fuel price, the CO2 price or the crews to compare a scenario");
    if ((scenario.fuelPriceFactor ?? 1) < 0 || (scenario.co2PriceFactor ?? 1) < 0) throw new PlanningError("prices cannot be negative");
    const document = await runPlan(getPrisma(), { siteCode: site, actor: { userId: user.id, name: user.email }, scenario });
    return { message: `What-if ${document.id} planned against baseline plan ${document.comparison?.previousRunId ?? "?"}.`, query: `whatIf=${document.id}` };
  }, "#what-if");
}

/** Saves the planning settings. */
export async function settingsAction(formData: FormData): Promise<void> {
  const user = await requireRole("calendar.edit");
  const site = text(formData, "site");
  await planAction(site, async () => {
    const settings = await updatePlanSettings(getPrisma(), site, {
      crewCapacity: optionalNumber(formData, "crewCapacity"),
      horizonWeeks: optionalNumber(formData, "horizonWeeks"),
      deadlineQuantile: text(formData, "deadlineQuantile") || undefined,
      minimumDaysBetweenCleanings: optionalNumber(formData, "minimumDaysBetweenCleanings"),
    }, { userId: user.id, name: user.email });
    return `Settings saved: ${settings.crewCapacity} crews, ${settings.horizonWeeks} weeks, deadline ${settings.deadlineQuantile.toUpperCase()}. Plan again to apply them.`;
  }, "#calendar");
}

/** Adds a turnaround or blackout window. */
export async function addWindowAction(formData: FormData): Promise<void> {
  const user = await requireRole("calendar.edit");
  const site = text(formData, "site");
  await planAction(site, async () => {
    const window = await addCalendarWindow(getPrisma(), site, { kind: text(formData, "kind"), name: text(formData, "name"), startDate: text(formData, "startDate"), endDate: text(formData, "endDate") }, { userId: user.id, name: user.email });
    return `Added ${window.kind} "${window.name}". Plan again to apply it.`;
  }, "#calendar");
}

/** Removes a window. */
export async function removeWindowAction(formData: FormData): Promise<void> {
  const user = await requireRole("calendar.edit");
  const site = text(formData, "site");
  await planAction(site, async () => {
    await removeCalendarWindow(getPrisma(), site, Number(text(formData, "id")), { userId: user.id, name: user.email });
    return "Window removed. Plan again to apply it.";
  }, "#calendar");
}

/** Sets (or with no tags removes) an exclusion group. */
export async function groupAction(formData: FormData): Promise<void> {
  const user = await requireRole("calendar.edit");
  const site = text(formData, "site");
  await planAction(site, async () => {
    const tags = text(formData, "tags").split(/[\s,;]+/).filter(Boolean);
    await setExclusionGroup(getPrisma(), site, text(formData, "name"), tags, { userId: user.id, name: user.email });
    return tags.length ? `Group saved. Plan again to apply it.` : "Group removed.";
  }, "#calendar");
}
