import type { PrismaClient } from "../../generated/prisma/client";
import { recordAudit } from "./record-audit";

export class AlertNotFoundError extends Error {}

/**
 * Marks an alert as seen. It leaves the open list; its exclusion of the faulty
 * period from U estimation stays (the data remain suspect).
 */
export async function acknowledgeAlert(prisma: PrismaClient, id: number, by: string, note = "", userId: string | null = null): Promise<void> {
  const acknowledged = await prisma.$transaction(async (tx) => {
    const result = await tx.instrumentAlert.updateMany({ where: { id, acknowledgedAt: null }, data: { acknowledgedAt: new Date(), acknowledgedBy: by, note } });
    if (result.count === 0) return false;
    const alert = await tx.instrumentAlert.findUniqueOrThrow({ where: { id }, select: { instrumentTag: true, kind: true, asset: { select: { tag: true } } } });
    await recordAudit(tx, {
      userId,
      actor: by,
      action: "alert.acknowledge",
      entity: "alert",
      entityId: String(id),
      summary: `acknowledged the ${alert.kind} alert on ${alert.instrumentTag} of ${alert.asset.tag}${note ? `: ${note}` : ""}`,
      details: { tag: alert.asset.tag, instrumentTag: alert.instrumentTag, kind: alert.kind, note },
    });
    return true;
  });
  if (!acknowledged) {
    const exists = await prisma.instrumentAlert.findUnique({ where: { id }, select: { acknowledgedBy: true } });
    throw new AlertNotFoundError(exists ? `alert ${id} was already acknowledged by ${exists.acknowledgedBy}` : `no alert with id ${id}`);
  }
}
