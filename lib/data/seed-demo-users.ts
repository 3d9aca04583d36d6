// The demo accounts, one per role, made when the user table is empty. For the
// demo only: a real site creates its own users and deletes these.
import type { PrismaClient } from "../../generated/prisma/client";
import { ROLES } from "../auth/permissions";
import { createUser } from "./create-user";

export const DEMO_PASSWORD = "foulcast-demo";
export const DEMO_EMAIL_DOMAIN = "brakwater.example";

export function demoUserEmail(role: string): string {
  return `${role}@${DEMO_EMAIL_DOMAIN}`;
}

/** Creates viewer@, engineer@, planner@ and admin@brakwater.example when there are no users; returns their emails. */
export async function seedDemoUsersIfNone(prisma: PrismaClient): Promise<string[]> {
  if ((await prisma.user.count()) > 0) return [];
  const created: string[] = [];
  for (const role of ROLES) {
    const user = await createUser(prisma, { email: demoUserEmail(role), role, password: DEMO_PASSWORD, name: `Demo ${role}` }, { userId: null, name: "system" });
    created.push(user.email);
  }
  return created;
}
