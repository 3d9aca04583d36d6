// Gives a user a new password (an admin's reset, e.g. after a forgotten password): stores it hashed the way
// better-auth does, ends every session of that user, and audits it, in one transaction.
import { randomBytes } from "node:crypto";
import { hashPassword } from "better-auth/crypto";
import type { PrismaClient } from "../../generated/prisma/client";
import { passwordProblems, UserAccountError } from "./create-user";
import { recordAudit, type Actor } from "./record-audit";

/** "1 session" / "3 sessions": the count of ended sessions as the audit summary, the admin page and the CLI say it. */
export function sessionCount(count: number): string {
  return `${count} ${count === 1 ? "session" : "sessions"}`;
}

export interface PasswordResetResult {
  email: string;
  /** Sessions of the user that were ended (signed out everywhere, also a session stolen with the old password). */
  sessionsEnded: number;
}

/**
 * Sets `password` (same rules as createUser: 8 to 128 characters) as the user's email-and-password credential,
 * creating the credential account if the user has none, and deletes all of the user's sessions. The audit event
 * ("user.password-reset") names the user and the number of sessions ended, never the password.
 * Throws UserAccountError for a bad password ("password: ...") or an unknown user ("user: ...").
 */
export async function setUserPassword(prisma: PrismaClient, userId: string, password: string, by: Actor): Promise<PasswordResetResult> {
  const problems = passwordProblems(password);
  if (problems.length > 0) throw new UserAccountError(problems.join("; "));
  // better-auth's own hash (scrypt, salted), as createUser stores it, so its sign-in verifies it.
  const passwordHash = await hashPassword(password);
  return prisma.$transaction(async (tx) => {
    const user = await tx.user.findUnique({ where: { id: userId }, select: { email: true } });
    if (!user) throw new UserAccountError(`user: no user with id ${userId}`);
    // better-auth's email-and-password account: provider "credential", account id = user id.
    const updated = await tx.account.updateMany({ where: { userId, providerId: "credential" }, data: { password: passwordHash } });
    if (updated.count === 0) {
      await tx.account.create({ data: { id: randomBytes(24).toString("base64url"), accountId: userId, providerId: "credential", userId, password: passwordHash } });
    }
    const { count: sessionsEnded } = await tx.session.deleteMany({ where: { userId } });
    await recordAudit(tx, {
      userId: by.userId,
      actor: by.name,
      action: "user.password-reset",
      entity: "user",
      entityId: userId,
      summary: `set a new password for ${user.email} and ended ${sessionCount(sessionsEnded)}`,
      details: { email: user.email, sessionsEnded },
    });
    return { email: user.email, sessionsEnded };
  });
}
