// Reads a site's register, assessments, calendar and bookings into the planner's input (lib/core/plan).
import type { PlanSettings, PrismaClient } from "../../generated/prisma/client";
import { optimalCleaningInterval } from "../core/economics";
import { MAXIMUM_HORIZON_WEEKS, weekOfInstant, type ExclusionGroup, type PlanAsset, type PlanInput, type PlanOptions, type TurnaroundWindow } from "../core/plan";
import { assetPlanBasis } from "./asset-plan-basis";
import { isoDate, planningStartDate, weeksOfDateRange } from "./planning-calendar";

/** Planning settings used when a site has none stored. */
export const DEFAULT_PLAN_SETTINGS = {
  crewCapacity: 2,
  horizonWeeks: 52,
  deadlineQuantile: "p10" as const,
  minimumDaysBetweenCleanings: 90,
  timeLimitSeconds: 30,
};

/** Most cleanings of one asset the planner considers in a horizon. */
const MAXIMUM_CLEANINGS_PER_ASSET = 3;

export type PlanSettingsValues = { crewCapacity: number; horizonWeeks: number; deadlineQuantile: "p10" | "p50" | "p90"; minimumDaysBetweenCleanings: number; timeLimitSeconds: number };

/** A site's stored planning settings, or the defaults for a site that has none. */
export function resolvePlanSettings(stored: Pick<PlanSettings, "crewCapacity" | "horizonWeeks" | "deadlineQuantile" | "minimumDaysBetweenCleanings" | "timeLimitSeconds"> | null): PlanSettingsValues {
  if (!stored) return { ...DEFAULT_PLAN_SETTINGS };
  const { crewCapacity, horizonWeeks, minimumDaysBetweenCleanings, timeLimitSeconds } = stored;
  return { crewCapacity, horizonWeeks, deadlineQuantile: stored.deadlineQuantile as PlanSettingsValues["deadlineQuantile"], minimumDaysBetweenCleanings, timeLimitSeconds };
}

export class PlanningError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "PlanningError";
  }
}

export interface LoadedPlanInput {
  site: { id: number; code: string; name: string; timeZone: string; currency: string };
  settings: PlanSettingsValues;
  input: PlanInput;
  options: PlanOptions;
  /** Assets of the site that could not be planned, and why. */
  excluded: { tag: string; reason: string }[];
  /** Calendar and bookings as entered, for the record of the run. */
  calendar: {
    windows: { kind: string; name: string; startDate: string; endDate: string }[];
    groups: { name: string; tags: string[] }[];
    bookings: { tag: string; weekStart: string; origin: string }[];
  };
}

/**
 * loadPlanInput: the planner input of one site: horizon from the first Monday on or after `nowMs` (site time zone),
 * crews and deadline quantile from the site's planning settings, turnaround and blackout windows as weeks, exclusion
 * groups, and one PlanAsset per asset that has an assessment with a clean model and a fouling trend (assetPlanBasis).
 * Bookings inside the horizon become locked weeks. The number of cleanings an asset may get in the horizon is the
 * horizon over its optimal cycle (service plus outage), rounded up, 1 to 3.
 *
 * @throws PlanningError for an unknown site or settings outside their ranges
 */
export async function loadPlanInput(prisma: PrismaClient, siteCode: string, options: { nowMs: number; horizonWeeks?: number; crewCapacity?: number }): Promise<LoadedPlanInput> {
  const site = await prisma.site.findUnique({ where: { code: siteCode }, include: { planSettings: true } });
  if (!site) throw new PlanningError(`unknown site "${siteCode}"`);
  const resolved = resolvePlanSettings(site.planSettings);
  const settings: PlanSettingsValues = {
    ...resolved,
    crewCapacity: options.crewCapacity ?? resolved.crewCapacity,
    horizonWeeks: options.horizonWeeks ?? resolved.horizonWeeks,
  };
  if (!Number.isInteger(settings.horizonWeeks) || settings.horizonWeeks < 1 || settings.horizonWeeks > MAXIMUM_HORIZON_WEEKS) {
    throw new PlanningError(`horizon must be 1 to ${MAXIMUM_HORIZON_WEEKS} whole weeks, got ${settings.horizonWeeks}`);
  }
  if (!Number.isInteger(settings.crewCapacity) || settings.crewCapacity < 0) {
    throw new PlanningError(`crew capacity must be a whole number >= 0, got ${settings.crewCapacity}`);
  }
  const startMs = planningStartDate(options.nowMs, site.timeZone);
  const weeks = settings.horizonWeeks;
  const horizonDays = weeks * 7;

  const [windows, groups, assets] = await Promise.all([
    prisma.calendarWindow.findMany({ where: { siteId: site.id }, orderBy: { startDate: "asc" } }),
    prisma.exclusionGroup.findMany({ where: { siteId: site.id }, include: { members: { include: { asset: { select: { tag: true } } } } }, orderBy: { name: "asc" } }),
    prisma.asset.findMany({
      where: { unit: { siteId: site.id } },
      include: { assessment: true, bookings: { orderBy: { weekStart: "asc" } } },
      orderBy: { tag: "asc" },
    }),
  ]);

  const blackoutWeeks = new Set<number>();
  const turnarounds: TurnaroundWindow[] = [];
  for (const window of windows) {
    const covered = weeksOfDateRange(startMs, weeks, window.startDate.getTime(), window.endDate.getTime());
    if (covered.length === 0) continue;
    if (window.kind === "blackout") for (const week of covered) blackoutWeeks.add(week);
    else turnarounds.push({ name: window.name, firstWeek: covered[0] as number, lastWeek: covered.at(-1) as number });
  }

  const excluded: { tag: string; reason: string }[] = [];
  const planAssets: PlanAsset[] = [];
  for (const asset of assets) {
    const basis = assetPlanBasis(asset, site, asset.assessment);
    if (!basis.ok) {
      excluded.push({ tag: asset.tag, reason: basis.reason });
      continue;
    }
    const optimum = optimalCleaningInterval(basis.economics, basis.forecasts.cleanCycle);
    const cycleDays = Math.max(optimum.intervalDays, settings.minimumDaysBetweenCleanings) + basis.economics.method.outageDays;
    const maximumCleanings = Math.min(MAXIMUM_CLEANINGS_PER_ASSET, Math.max(1, Math.ceil(horizonDays / cycleDays)));
    const lockedWeeks = asset.bookings
      .map((booking) => weekOfInstant(startMs, booking.weekStart.getTime()))
      .filter((week) => week >= 0 && week < weeks)
      .slice(0, maximumCleanings);
    planAssets.push({
      id: String(asset.id),
      tag: asset.tag,
      economics: basis.economics,
      currentCycle: basis.forecasts.currentCycle,
      cleanCycle: basis.forecasts.cleanCycle,
      lastReturnToServiceMs: basis.forecasts.cycleOriginMs,
      minimumDaysBetweenCleanings: settings.minimumDaysBetweenCleanings,
      maximumCleanings: Math.max(maximumCleanings, lockedWeeks.length),
      thresholdCrossing: basis.thresholdCrossing,
      lockedWeeks,
    });
  }
  const planned = new Set(planAssets.map((asset) => asset.tag));
  const idByTag = new Map(assets.map((asset) => [asset.tag, String(asset.id)]));
  const exclusionGroups: ExclusionGroup[] = groups
    .map((group) => ({ name: group.name, assetIds: group.members.map((member) => member.asset.tag).filter((tag) => planned.has(tag)).map((tag) => idByTag.get(tag) as string) }))
    .filter((group) => group.assetIds.length >= 2);

  return {
    site: { id: site.id, code: site.code, name: site.name, timeZone: site.timeZone, currency: site.currency },
    settings,
    input: { horizon: { startMs, weeks }, site: { crewCapacity: settings.crewCapacity, blackoutWeeks: [...blackoutWeeks].sort((a, b) => a - b), turnarounds, groups: exclusionGroups }, assets: planAssets },
    options: { deadlineQuantile: settings.deadlineQuantile, timeLimitSeconds: settings.timeLimitSeconds },
    excluded,
    calendar: {
      windows: windows.map((window) => ({ kind: window.kind, name: window.name, startDate: isoDate(window.startDate.getTime()), endDate: isoDate(window.endDate.getTime()) })),
      groups: groups.map((group) => ({ name: group.name, tags: group.members.map((member) => member.asset.tag) })),
      bookings: assets.flatMap((asset) => asset.bookings.map((booking) => ({ tag: asset.tag, weekStart: isoDate(booking.weekStart.getTime()), origin: booking.origin }))),
    },
  };
}
