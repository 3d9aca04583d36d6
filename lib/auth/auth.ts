// The better-auth server instance: email and password accounts in our
// PostgreSQL database (Prisma adapter), sessions in the "session" table.
import { betterAuth } from "better-auth";
import { prismaAdapter } from "better-auth/adapters/prisma";
import { nextCookies } from "better-auth/next-js";
import type { PrismaClient } from "../../generated/prisma/client";
import { MAX_PASSWORD_LENGTH, MIN_PASSWORD_LENGTH } from "../data/create-user";
import { recordAudit } from "../data/record-audit";
import { getPrisma } from "../db";
import { authSecret } from "./auth-secret";
import { authSettings, SESSION_EXPIRES_IN_SECONDS, SESSION_UPDATE_AGE_SECONDS } from "./auth-settings";
import { ROLES } from "./permissions";

function createAuth(prisma: PrismaClient) {
  const settings = authSettings();
  return betterAuth({
    appName: "Foulcast",
    baseURL: settings.baseUrl,
    secret: authSecret(),
    trustedOrigins: settings.trustedOrigins,
    database: prismaAdapter(prisma, { provider: "postgresql" }),
    emailAndPassword: {
      enabled: true,
      // Accounts are made by an admin (/admin/users, `npm run cli -- user add`), never by visitors.
      disableSignUp: true,
      minPasswordLength: MIN_PASSWORD_LENGTH,
      maxPasswordLength: MAX_PASSWORD_LENGTH,
    },
    user: {
      additionalFields: {
        role: { type: [...ROLES], required: false, defaultValue: "viewer", input: false },
        unitSystem: { type: ["si", "us"], required: false, defaultValue: "si", input: true },
      },
    },
    session: { expiresIn: SESSION_EXPIRES_IN_SECONDS, updateAge: SESSION_UPDATE_AGE_SECONDS },
    advanced: {
      useSecureCookies: settings.secureCookies,
      // better-auth skips its Origin check when NODE_ENV is "test"; keep it on everywhere so tests see what users get.
      disableOriginCheck: false,
    },
    telemetry: { enabled: false },
    databaseHooks: {
      session: {
        create: {
          after: async (session) => {
            const user = await prisma.user.findUnique({ where: { id: session.userId }, select: { email: true } });
            if (!user) return;
            await recordAudit(prisma, { userId: session.userId, actor: user.email, action: "user.sign-in", entity: "user", entityId: session.userId, summary: `${user.email} signed in` });
          },
        },
      },
    },
    // Last, as better-auth asks: lets server actions (the sign-in form) set the session cookie.
    plugins: [nextCookies()],
  });
}

export type FoulcastAuth = ReturnType<typeof createAuth>;

const globalForAuth = globalThis as unknown as { foulcastAuth?: { auth: FoulcastAuth; prisma: PrismaClient } };

/** The process-wide instance, built on first use (after DATABASE_URL is known) and rebuilt if the Prisma client was replaced. */
export function getAuth(): FoulcastAuth {
  const prisma = getPrisma();
  if (globalForAuth.foulcastAuth?.prisma !== prisma) globalForAuth.foulcastAuth = { auth: createAuth(prisma), prisma };
  return globalForAuth.foulcastAuth.auth;
}
