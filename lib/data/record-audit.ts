// Writes one audit event: who did what to which record. Pass the transaction
// client of the change itself, so the event commits (or rolls back) with it.
import type { Prisma, PrismaClient } from "../../generated/prisma/client";

/** Who made a change: a signed-in user (id and email), or the CLI / a job (userId null, e.g. "cli:alice"). */
export interface Actor {
  userId: string | null;
  name: string;
}

export interface AuditEntry {
  userId: string | null;
  /** The name shown: the user's email, "cli:<os user>" or "system". */
  actor: string;
  /** entity.verb, e.g. asset.update, cleaning.record, alert.acknowledge, import.completed, user.create */
  action: string;
  /** asset | import | cleaning | alert | plan | booking | calendar | user */
  entity: string;
  entityId: string;
  /** One line for people. */
  summary: string;
  details?: Record<string, unknown>;
}

export async function recordAudit(db: PrismaClient | Prisma.TransactionClient, entry: AuditEntry): Promise<{ id: number }> {
  if (!entry.actor.trim()) throw new Error("recordAudit: actor must name who made the change");
  if (!/^[a-z]+\.[a-z-]+$/.test(entry.action)) throw new Error(`recordAudit: action must look like "entity.verb", got "${entry.action}"`);
  return db.auditEvent.create({
    data: {
      userId: entry.userId,
      actor: entry.actor,
      action: entry.action,
      entity: entry.entity,
      entityId: entry.entityId,
      summary: entry.summary,
      details: (entry.details ?? {}) as Prisma.InputJsonValue,
    },
    select: { id: true },
  });
}
