// The site must keep an admin: refuses a change that would take away the role of its only admin
// (a demotion or a removal). Call it inside the change's transaction.
import type { Prisma } from "../../generated/prisma/client";
import { UserAccountError } from "./create-user";

/**
 * Throws UserAccountError (`<field>: <email> is the only admin; ...`) when `user` is an admin and no other admin
 * exists. Takes a transaction-scoped advisory lock first, so two admins demoting or removing each other at once are
 * serialised and the second sees the first's commit. Does nothing for a user who is not an admin.
 */
export async function ensureAnotherAdmin(tx: Prisma.TransactionClient, user: { email: string; role: string }, field: "role" | "user"): Promise<void> {
  if (user.role !== "admin") return;
  await tx.$executeRawUnsafe(`select pg_advisory_xact_lock(hashtext('foulcast.user-roles'))`);
  const admins = await tx.user.count({ where: { role: "admin" } });
  if (admins <= 1) throw new UserAccountError(`${field}: ${user.email} is the only admin; make another user admin first`);
}
