// Changes the units one user reads and enters (SI or US customary), recorded in the audit log.
import type { PrismaClient } from "../../generated/prisma/client";
import type { UnitSystem } from "../present/display-units";
import { recordAudit } from "./record-audit";

/** setUnitSystem: stores `unitSystem` on the user's row and an audit event user.units in one transaction; no-op when unchanged. */
export async function setUnitSystem(prisma: PrismaClient, user: { id: string; email: string }, unitSystem: UnitSystem): Promise<{ changed: boolean }> {
  return prisma.$transaction(async (tx) => {
    const before = await tx.user.findUniqueOrThrow({ where: { id: user.id }, select: { unitSystem: true } });
    if (before.unitSystem === unitSystem) return { changed: false };
    await tx.user.update({ where: { id: user.id }, data: { unitSystem } });
    await recordAudit(tx, {
      userId: user.id,
      actor: user.email,
      action: "user.units",
      entity: "user",
      entityId: user.id,
      summary: `${user.email} now reads ${unitSystem === "us" ? "US customary" : "SI"} units`,
      details: { before: before.unitSystem, after: unitSystem },
    });
    return { changed: true };
  });
}
