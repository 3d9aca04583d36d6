// Planning settings, turnaround and blackout windows, and exclusion groups of a site.
import { z } from "zod";
import type { PrismaClient } from "../../generated/prisma/client";
import { MAXIMUM_HORIZON_WEEKS } from "../core/plan";
import { recordAudit, type Actor } from "../data/record-audit";
import { PlanningError, resolvePlanSettings } from "./load-plan-input";
import { isoDate, parseIsoDate } from "./planning-calendar";

export const planSettingsSchema = z
  .object({
    crewCapacity: z.number().int("crewCapacity must be a whole number").min(0, "crewCapacity must be >= 0").max(1000),
    horizonWeeks: z.number().int("horizonWeeks must be a whole number").min(1, "horizonWeeks must be >= 1").max(MAXIMUM_HORIZON_WEEKS, `horizonWeeks must be <= ${MAXIMUM_HORIZON_WEEKS}`),
    deadlineQuantile: z.enum(["p10", "p50", "p90"]),
    minimumDaysBetweenCleanings: z.number().int().min(0, "minimumDaysBetweenCleanings must be >= 0").max(3650),
    timeLimitSeconds: z.number().int().min(1, "timeLimitSeconds must be >= 1").max(600, "timeLimitSeconds must be <= 600"),
  })
  .partial()
  .strict();

const isoDateText = (field: string) => z.string().refine((text) => parseIsoDate(text) !== null, `${field} must be a calendar date YYYY-MM-DD`);

export const calendarWindowSchema = z
  .object({
    kind: z.enum(["turnaround", "blackout"], { message: 'kind must be "turnaround" or "blackout"' }),
    name: z.string().trim().min(1, "name must not be empty").max(120, "name must be at most 120 characters"),
    startDate: isoDateText("startDate"),
    endDate: isoDateText("endDate"),
  })
  .strict()
  .refine((window) => (parseIsoDate(window.endDate) as number) >= (parseIsoDate(window.startDate) as number), { message: "endDate must not be before startDate", path: ["endDate"] });

async function siteId(prisma: PrismaClient, siteCode: string): Promise<number> {
  const site = await prisma.site.findUnique({ where: { code: siteCode }, select: { id: true } });
  if (!site) throw new PlanningError(`unknown site "${siteCode}"`);
  return site.id;
}

function firstIssue(error: z.ZodError): string {
  const issue = error.issues[0];
  return issue ? `${issue.path.join(".") || "input"}: ${issue.message}` : "invalid input";
}

/** The site's planning settings (stored values over the defaults). */
export async function getPlanSettings(prisma: PrismaClient, siteCode: string) {
  const id = await siteId(prisma, siteCode);
  return resolvePlanSettings(await prisma.planSettings.findUnique({ where: { siteId: id } }));
}

/** updatePlanSettings: validates and stores changed planning settings. */
export async function updatePlanSettings(prisma: PrismaClient, siteCode: string, input: unknown, actor: Actor) {
  const parsed = planSettingsSchema.safeParse(input);
  if (!parsed.success) throw new PlanningError(`planning settings: ${firstIssue(parsed.error)}`);
  const id = await siteId(prisma, siteCode);
  const before = await getPlanSettings(prisma, siteCode);
  const after = { ...before, ...parsed.data };
  await prisma.$transaction(async (tx) => {
    await tx.planSettings.upsert({ where: { siteId: id }, create: { siteId: id, ...after, updatedBy: actor.name }, update: { ...after, updatedBy: actor.name } });
    await recordAudit(tx, { userId: actor.userId, actor: actor.name, action: "calendar.settings", entity: "calendar", entityId: siteCode, summary: `Planning settings of ${siteCode}: ${Object.entries(parsed.data).map(([key, value]) => `${key} ${String(value)}`).join(", ")}`, details: { before, after } });
  });
  return after;
}

/** addCalendarWindow: stores a turnaround or blackout window (inclusive site calendar dates). */
export async function addCalendarWindow(prisma: PrismaClient, siteCode: string, input: unknown, actor: Actor) {
  const parsed = calendarWindowSchema.safeParse(input);
  if (!parsed.success) throw new PlanningError(`calendar window: ${firstIssue(parsed.error)}`);
  const id = await siteId(prisma, siteCode);
  const window = parsed.data;
  return prisma.$transaction(async (tx) => {
    const row = await tx.calendarWindow.create({ data: { siteId: id, kind: window.kind, name: window.name, startDate: new Date(parseIsoDate(window.startDate) as number), endDate: new Date(parseIsoDate(window.endDate) as number), createdBy: actor.name } });
    await recordAudit(tx, { userId: actor.userId, actor: actor.name, action: "calendar.add", entity: "calendar", entityId: String(row.id), summary: `Added ${window.kind} "${window.name}" ${window.startDate} to ${window.endDate} at ${siteCode}`, details: window });
    return { id: row.id, ...window };
  });
}

/** removeCalendarWindow: deletes a window of the site. */
export async function removeCalendarWindow(prisma: PrismaClient, siteCode: string, windowId: number, actor: Actor) {
  const id = await siteId(prisma, siteCode);
  await prisma.$transaction(async (tx) => {
    const row = await tx.calendarWindow.findFirst({ where: { id: windowId, siteId: id } });
    if (!row) throw new PlanningError(`site ${siteCode} has no calendar window ${windowId}`);
    await tx.calendarWindow.delete({ where: { id: row.id } });
    await recordAudit(tx, { userId: actor.userId, actor: actor.name, action: "calendar.remove", entity: "calendar", entityId: String(row.id), summary: `Removed ${row.kind} "${row.name}" ${isoDate(row.startDate.getTime())} to ${isoDate(row.endDate.getTime())} at ${siteCode}` });
  });
}

/** listCalendarWindows: the site's windows, earliest first. */
export async function listCalendarWindows(prisma: PrismaClient, siteCode: string) {
  const id = await siteId(prisma, siteCode);
  const rows = await prisma.calendarWindow.findMany({ where: { siteId: id }, orderBy: { startDate: "asc" } });
  return rows.map((row) => ({ id: row.id, kind: row.kind, name: row.name, startDate: isoDate(row.startDate.getTime()), endDate: isoDate(row.endDate.getTime()) }));
}

/**
 * setExclusionGroup: creates or replaces a group of exchangers that must not be out together (an empty list deletes
 * the group). Every tag must belong to the site.
 */
export async function setExclusionGroup(prisma: PrismaClient, siteCode: string, name: string, tags: readonly string[], actor: Actor) {
  const trimmed = name.trim();
  if (!trimmed || trimmed.length > 120) throw new PlanningError("group name must be 1 to 120 characters");
  const id = await siteId(prisma, siteCode);
  const assets = await prisma.asset.findMany({ where: { tag: { in: [...tags] }, unit: { siteId: id } }, select: { id: true, tag: true } });
  const unknown = tags.filter((tag) => !assets.some((asset) => asset.tag === tag));
  if (unknown.length) throw new PlanningError(`not assets of ${siteCode}: ${unknown.join(", ")}`);
  if (tags.length === 1) throw new PlanningError("a group needs at least two exchangers");
  await prisma.$transaction(async (tx) => {
    await tx.exclusionGroup.deleteMany({ where: { siteId: id, name: trimmed } });
    if (assets.length > 0) await tx.exclusionGroup.create({ data: { siteId: id, name: trimmed, members: { create: assets.map((asset) => ({ assetId: asset.id })) } } });
    await recordAudit(tx, { userId: actor.userId, actor: actor.name, action: "calendar.group", entity: "calendar", entityId: siteCode, summary: assets.length ? `Group "${trimmed}" at ${siteCode}: ${tags.join(", ")} never out together` : `Removed group "${trimmed}" at ${siteCode}`, details: { name: trimmed, tags } });
  });
}

/** listExclusionGroups: the site's groups with their tags. */
export async function listExclusionGroups(prisma: PrismaClient, siteCode: string) {
  const id = await siteId(prisma, siteCode);
  const groups = await prisma.exclusionGroup.findMany({ where: { siteId: id }, include: { members: { include: { asset: { select: { tag: true } } } } }, orderBy: { name: "asc" } });
  return groups.map((group) => ({ name: group.name, tags: group.members.map((member) => member.asset.tag).sort() }));
}
