// Planner decisions: accept a proposed cleaning week, move it, or release it back to the optimiser.
import type { PrismaClient } from "../../generated/prisma/client";
import { WEEK_MS, type CleaningPlan } from "../core/plan";
import { recordAudit, type Actor } from "../data/record-audit";
import { PlanningError } from "./load-plan-input";
import { isoDate, parseIsoDate, planningStartDate, weekStartOfDate } from "./planning-calendar";
import { latestPlanRun } from "./run-plan";

async function siteOfAsset(prisma: PrismaClient, tag: string) {
  const asset = await prisma.asset.findUnique({ where: { tag }, include: { unit: { include: { site: true } } } });
  if (!asset) throw new PlanningError(`unknown asset "${tag}"`);
  return { asset, site: asset.unit.site };
}

/**
 * acceptProposals: books the weeks the site's latest plan proposes for the given assets (all planned assets when
 * `tags` is empty). Booked weeks are locked in every later plan until moved or released.
 *
 * @returns the bookings made, as tag and week start (YYYY-MM-DD)
 */
export async function acceptProposals(prisma: PrismaClient, siteCode: string, tags: readonly string[], actor: Actor): Promise<{ tag: string; weekStart: string }[]> {
  const run = await latestPlanRun(prisma, siteCode);
  if (!run) throw new PlanningError(`site "${siteCode}" has no plan yet: run the planner first`);
  const plan = run.result as unknown as CleaningPlan;
  const wanted = new Set(tags);
  const chosen = plan.cleanings.filter((cleaning) => (wanted.size === 0 || wanted.has(cleaning.tag)) && !cleaning.locked);
  for (const tag of wanted) {
    if (!plan.cleanings.some((cleaning) => cleaning.tag === tag)) throw new PlanningError(`plan ${run.id} proposes no cleaning for "${tag}"`);
  }
  const made: { tag: string; weekStart: string }[] = [];
  await prisma.$transaction(async (tx) => {
    for (const cleaning of chosen) {
      const weekStart = new Date(plan.horizon.startMs + cleaning.startWeek * WEEK_MS);
      await tx.cleaningBooking.upsert({
        where: { assetId_weekStart: { assetId: Number(cleaning.assetId), weekStart } },
        create: { assetId: Number(cleaning.assetId), weekStart, origin: "accepted", planRunId: run.id, createdBy: actor.name },
        update: {},
      });
      made.push({ tag: cleaning.tag, weekStart: isoDate(weekStart.getTime()) });
    }
    if (made.length > 0) {
      await recordAudit(tx, {
        userId: actor.userId,
        actor: actor.name,
        action: "booking.accept",
        entity: "booking",
        entityId: String(run.id),
        summary: `Accepted ${made.length} proposed cleaning(s) of plan ${run.id}: ${made.map((entry) => `${entry.tag} ${entry.weekStart}`).join(", ")}`,
        details: { planRunId: run.id, bookings: made },
      });
    }
  });
  return made;
}

/**
 * moveBooking: books an asset's cleaning for the planning week containing `date` (YYYY-MM-DD), replacing its bookings
 * from the current week on. The week may not be in the past.
 */
export async function moveBooking(prisma: PrismaClient, tag: string, date: string, actor: Actor, options: { nowMs?: number; note?: string } = {}): Promise<{ tag: string; weekStart: string; replaced: string[] }> {
  const dateMs = parseIsoDate(date);
  if (dateMs === null) throw new PlanningError(`week must be a calendar date YYYY-MM-DD, got "${date}"`);
  const { asset, site } = await siteOfAsset(prisma, tag);
  const firstMonday = planningStartDate(options.nowMs ?? Date.now(), site.timeZone);
  const weekStartMs = weekStartOfDate(firstMonday, dateMs);
  if (weekStartMs < firstMonday) throw new PlanningError(`cannot book ${tag} for ${date}: planning starts on ${isoDate(firstMonday)}`);
  return prisma.$transaction(async (tx) => {
    const replaced = await tx.cleaningBooking.findMany({ where: { assetId: asset.id, weekStart: { gte: new Date(firstMonday) } } });
    await tx.cleaningBooking.deleteMany({ where: { assetId: asset.id, weekStart: { gte: new Date(firstMonday) } } });
    await tx.cleaningBooking.create({ data: { assetId: asset.id, weekStart: new Date(weekStartMs), origin: "moved", createdBy: actor.name, note: (options.note ?? "").slice(0, 500) } });
    const replacedDates = replaced.map((booking) => isoDate(booking.weekStart.getTime()));
    await recordAudit(tx, {
      userId: actor.userId,
      actor: actor.name,
      action: "booking.move",
      entity: "booking",
      entityId: tag,
      summary: `Booked ${tag} for the week of ${isoDate(weekStartMs)}${replacedDates.length ? ` (was ${replacedDates.join(", ")})` : ""}`,
      details: { weekStart: isoDate(weekStartMs), replaced: replacedDates },
    });
    return { tag, weekStart: isoDate(weekStartMs), replaced: replacedDates };
  });
}

/** releaseBooking: removes an asset's bookings from the current week on, so the optimiser chooses again. */
export async function releaseBooking(prisma: PrismaClient, tag: string, actor: Actor, options: { nowMs?: number } = {}): Promise<{ released: string[] }> {
  const { asset, site } = await siteOfAsset(prisma, tag);
  const firstMonday = planningStartDate(options.nowMs ?? Date.now(), site.timeZone);
  return prisma.$transaction(async (tx) => {
    const rows = await tx.cleaningBooking.findMany({ where: { assetId: asset.id, weekStart: { gte: new Date(firstMonday) } } });
    if (rows.length === 0) throw new PlanningError(`${tag} has no booked cleaning to release`);
    await tx.cleaningBooking.deleteMany({ where: { id: { in: rows.map((row) => row.id) } } });
    const released = rows.map((row) => isoDate(row.weekStart.getTime()));
    await recordAudit(tx, { userId: actor.userId, actor: actor.name, action: "booking.release", entity: "booking", entityId: tag, summary: `Released ${tag}'s booking(s) ${released.join(", ")}`, details: { released } });
    return { released };
  });
}

/** listBookings: the booked cleanings of a site from the current week on. */
export async function listBookings(prisma: PrismaClient, siteCode: string, nowMs = Date.now()) {
  const site = await prisma.site.findUnique({ where: { code: siteCode } });
  if (!site) throw new PlanningError(`unknown site "${siteCode}"`);
  const firstMonday = planningStartDate(nowMs, site.timeZone);
  const rows = await prisma.cleaningBooking.findMany({
    where: { asset: { unit: { siteId: site.id } }, weekStart: { gte: new Date(firstMonday) } },
    include: { asset: { select: { tag: true } } },
    orderBy: [{ weekStart: "asc" }, { asset: { tag: "asc" } }],
  });
  return rows.map((row) => ({ tag: row.asset.tag, weekStart: isoDate(row.weekStart.getTime()), origin: row.origin, planRunId: row.planRunId, note: row.note, createdBy: row.createdBy, createdAt: row.createdAt.toISOString() }));
}
