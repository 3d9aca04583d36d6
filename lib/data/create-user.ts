// Creates a user account with an email, a role and an initial password (hashed
// by better-auth's scrypt), and audits it, in one transaction.
import { randomBytes } from "node:crypto";
import { hashPassword } from "better-auth/crypto";
import type { PrismaClient } from "../../generated/prisma/client";
import { isRole, ROLES, type Role } from "../auth/permissions";
import { recordAudit, type Actor } from "./record-audit";

/** Password length limits: better-auth's defaults (8 to 128), which its sign-in also applies. */
export const MIN_PASSWORD_LENGTH = 8;
export const MAX_PASSWORD_LENGTH = 128;

export class UserAccountError extends Error {}

export interface NewUser {
  email: string;
  role: string;
  password: string;
  /** Display name; defaults to the part of the email before "@". */
  name?: string;
}

/** Emails are stored lower-case (better-auth looks them up lower-cased). */
export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

/** Every problem with a new account's fields, naming the field; empty when it is fine. */
export function newUserProblems(user: NewUser): string[] {
  const problems: string[] = [];
  if (!/^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(normaliseEmail(user.email))) problems.push(`email: "${user.email}" is not an email address`);
  if (!isRole(user.role)) problems.push(`role: must be one of ${ROLES.join(", ")}, got "${user.role}"`);
  problems.push(...passwordProblems(user.password));
  return problems;
}

/** Every problem with a password (new account or new password), naming the field; empty when it is fine. */
export function passwordProblems(password: string): string[] {
  if (password.length < MIN_PASSWORD_LENGTH) return [`password: must be at least ${MIN_PASSWORD_LENGTH} characters`];
  if (password.length > MAX_PASSWORD_LENGTH) return [`password: must be at most ${MAX_PASSWORD_LENGTH} characters`];
  return [];
}

export async function createUser(prisma: PrismaClient, user: NewUser, by: Actor): Promise<{ id: string; email: string; role: Role }> {
  const problems = newUserProblems(user);
  if (problems.length > 0) throw new UserAccountError(problems.join("; "));
  const email = normaliseEmail(user.email);
  const role = user.role as Role;
  const passwordHash = await hashPassword(user.password);
  return prisma.$transaction(async (tx) => {
    if (await tx.user.findUnique({ where: { email }, select: { id: true } })) throw new UserAccountError(`email: a user ${email} already exists`);
    const id = randomBytes(24).toString("base64url");
    const name = user.name?.trim() || email.split("@")[0] || email;
    await tx.user.create({ data: { id, email, name, role, emailVerified: true } });
    // better-auth's email-and-password account: provider "credential", account id = user id.
    await tx.account.create({ data: { id: randomBytes(24).toString("base64url"), accountId: id, providerId: "credential", userId: id, password: passwordHash } });
    await recordAudit(tx, { userId: by.userId, actor: by.name, action: "user.create", entity: "user", entityId: id, summary: `created user ${email} with role ${role}`, details: { email, role } });
    return { id, email, role };
  });
}
