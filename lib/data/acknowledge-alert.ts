import type { PrismaClient } from "../../generated/prisma/client";

export class AlertNotFoundError extends Error {}

/**
 * Marks an alert as seen. It leaves the open list; its exclusion of the faulty
 * period from U estimation stays (the data remain suspect).
 */
export async function acknowledgeAlert(prisma: PrismaClient, id: number, by: string, note = ""): Promise<void> {
  const result = await prisma.instrumentAlert.updateMany({ where: { id, acknowledgedAt: null }, data: { acknowledgedAt: new Date(), acknowledgedBy: by, note } });
  if (result.count === 0) {
    const exists = await prisma.instrumentAlert.findUnique({ where: { id }, select: { acknowledgedBy: true } });
    throw new AlertNotFoundError(exists ? `alert ${id} was already acknowledged by ${exists.acknowledgedBy}` : `no alert with id ${id}`);
  }
}
