// Changes a user's role (takes effect on their next request) and audits it.
import type { PrismaClient } from "../../generated/prisma/client";
import { isRole, ROLES, type Role } from "../auth/permissions";
import { UserAccountError } from "./create-user";
import { ensureAnotherAdmin } from "./ensure-another-admin";
import { recordAudit, type Actor } from "./record-audit";

/** Refuses to leave the site without an admin. */
export async function changeUserRole(prisma: PrismaClient, userId: string, role: string, by: Actor): Promise<{ email: string; before: Role | string; after: Role; changed: boolean }> {
  if (!isRole(role)) throw new UserAccountError(`role: must be one of ${ROLES.join(", ")}, got "${role}"`);
  return prisma.$transaction(async (tx) => {
    const user = await tx.user.findUnique({ where: { id: userId }, select: { email: true, role: true } });
    if (!user) throw new UserAccountError(`user: no user with id ${userId}`);
    if (user.role === role) return { email: user.email, before: user.role, after: role, changed: false };
    await ensureAnotherAdmin(tx, user, "role");
    await tx.user.update({ where: { id: userId }, data: { role } });
    await recordAudit(tx, {
      userId: by.userId,
      actor: by.name,
      action: "user.change-role",
      entity: "user",
      entityId: userId,
      summary: `changed the role of ${user.email} from ${user.role} to ${role}`,
      details: { email: user.email, before: user.role, after: role },
    });
    return { email: user.email, before: user.role, after: role, changed: true };
  });
}
