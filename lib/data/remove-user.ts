// Removes a user account (someone who left or changed jobs): the user row with its sessions and accounts, audited
// in the same transaction. The audit log keeps every event that names the user: AuditEvent.userId has no foreign
// key, and actor and summary hold the email as text.
import type { PrismaClient } from "../../generated/prisma/client";
import { UserAccountError } from "./create-user";
import { ensureAnotherAdmin } from "./ensure-another-admin";
import { recordAudit, type Actor } from "./record-audit";

export interface RemovedUser {
  email: string;
  role: string;
  /** Sessions that ended with the account. */
  sessionsEnded: number;
  /** Sign-in accounts (the email-and-password credential) deleted with it. */
  accountsRemoved: number;
}

/**
 * Deletes the user with their "session" and "account" rows (which prisma/schema.prisma also cascades,
 * onDelete: Cascade). Refuses (UserAccountError, "user: ...") an unknown user, the caller's
 * own account (`by.userId`; the CLI has none) and the only admin.
 */
export async function removeUser(prisma: PrismaClient, userId: string, by: Actor): Promise<RemovedUser> {
  return prisma.$transaction(async (tx) => {
    const user = await tx.user.findUnique({ where: { id: userId }, select: { email: true, role: true } });
    if (!user) throw new UserAccountError(`user: no user with id ${userId}`);
    if (by.userId === userId) throw new UserAccountError(`user: ${user.email} is your own account; another admin must remove it`);
    await ensureAnotherAdmin(tx, user, "user");
    // The schema cascades a user's delete to both tables; deleting them first gives exact counts for the audit event.
    const { count: sessionsEnded } = await tx.session.deleteMany({ where: { userId } });
    const { count: accountsRemoved } = await tx.account.deleteMany({ where: { userId } });
    await tx.user.delete({ where: { id: userId } });
    await recordAudit(tx, {
      userId: by.userId,
      actor: by.name,
      action: "user.remove",
      entity: "user",
      entityId: userId,
      summary: `removed user ${user.email} (${user.role})`,
      details: { email: user.email, role: user.role, sessionsEnded, accountsRemoved },
    });
    return { email: user.email, role: user.role, sessionsEnded, accountsRemoved };
  });
}
