import type { PrismaClient } from "../../generated/prisma/client";

export interface UserRow {
  id: string;
  email: string;
  name: string;
  role: string;
  createdAt: string;
  /** Start of the newest session that has not expired, ISO 8601; null when not signed in. */
  activeSince: string | null;
}

/** Every user account, by email. */
export async function listUsers(prisma: PrismaClient): Promise<UserRow[]> {
  const users = await prisma.user.findMany({
    orderBy: { email: "asc" },
    select: { id: true, email: true, name: true, role: true, createdAt: true, sessions: { where: { expiresAt: { gt: new Date() } }, orderBy: { createdAt: "desc" }, take: 1, select: { createdAt: true } } },
  });
  return users.map(({ sessions, createdAt, ...user }) => ({ ...user, createdAt: createdAt.toISOString(), activeSince: sessions[0]?.createdAt.toISOString() ?? null }));
}
