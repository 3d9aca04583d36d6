// User accounts for real sites: add, list, change a role, set a new password, remove. Changes are audited as
// cli:<os user>.
import type { Command } from "commander";
import os from "node:os";
import { ROLES } from "../../lib/auth/permissions";
import { changeUserRole } from "../../lib/data/change-user-role";
import { createUser, normaliseEmail, UserAccountError } from "../../lib/data/create-user";
import { listUsers } from "../../lib/data/list-users";
import { removeUser } from "../../lib/data/remove-user";
import { sessionCount, setUserPassword } from "../../lib/data/set-user-password";
import { getPrisma } from "../../lib/db";
import { printJson, UsageError, withDatabase } from "./context";

const cliActor = () => ({ userId: null, name: `cli:${os.userInfo().username}` });

/** The first line of standard input (a password piped in, so it stays out of the shell history). */
async function readFirstLine(): Promise<string> {
  let text = "";
  for await (const chunk of process.stdin) {
    text += String(chunk);
    if (text.includes("\n")) break;
  }
  return text.split(/\r?\n/)[0] ?? "";
}

/** The id of the user with `email` (compared lower-case), or a UsageError naming the email. */
async function userIdByEmail(email: string): Promise<string> {
  const normalised = normaliseEmail(email);
  const found = await getPrisma().user.findUnique({ where: { email: normalised }, select: { id: true } });
  if (!found) throw new UsageError(`no user with email ${normalised}`);
  return found.id;
}

/** Runs a data function, turning its UserAccountError (the user's mistake) into a UsageError (message, exit 1). */
async function asUsage<T>(work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (error) {
    if (error instanceof UserAccountError) throw new UsageError(error.message);
    throw error;
  }
}

export function registerUserCommands(program: Command): void {
  const user = program.command("user").description("user accounts and roles (viewer, engineer, planner, admin)");
  user
    .command("add")
    .description("create a user; without --password the password is read from the first line of standard input")
    .requiredOption("--email <email>", "sign-in email")
    .requiredOption("--role <role>", ROLES.join(" | "))
    .option("--password <password>", "initial password (at least 8 characters)")
    .option("--name <name>", "display name (default: the part of the email before @)")
    .action(async (options: { email: string; role: string; password?: string; name?: string }) => {
      const password = options.password ?? (await readFirstLine());
      await withDatabase(async () => {
        const created = await asUsage(() => createUser(getPrisma(), { email: options.email, role: options.role, password, name: options.name }, cliActor()));
        console.log(`Created ${created.email} with role ${created.role}.`);
      });
    });
  user
    .command("list")
    .description("list user accounts and their roles")
    .option("--json", "print JSON")
    .action(async (options: { json?: boolean }) => {
      await withDatabase(async () => {
        const users = await listUsers(getPrisma());
        if (options.json) return printJson(users);
        if (users.length === 0) console.log("No users.");
        for (const row of users) console.log(`${row.email.padEnd(36)} ${row.role.padEnd(9)} created ${row.createdAt.slice(0, 10)}`);
      });
    });
  user
    .command("role")
    .description("change a user's role (refuses to remove the last admin)")
    .requiredOption("--email <email>", "the user's email")
    .requiredOption("--role <role>", ROLES.join(" | "))
    .action(async (options: { email: string; role: string }) => {
      await withDatabase(async () => {
        const result = await asUsage(async () => changeUserRole(getPrisma(), await userIdByEmail(options.email), options.role, cliActor()));
        console.log(result.changed ? `${result.email}: ${result.before} -> ${result.after}.` : `${result.email} already has the role ${result.after}.`);
      });
    });
  user
    .command("password")
    .description("set a new password for a user and end all their sessions; without --password it is read from the first line of standard input")
    .requiredOption("--email <email>", "the user's email")
    .option("--password <password>", "the new password (8 to 128 characters)")
    .action(async (options: { email: string; password?: string }) => {
      const password = options.password ?? (await readFirstLine());
      await withDatabase(async () => {
        const result = await asUsage(async () => setUserPassword(getPrisma(), await userIdByEmail(options.email), password, cliActor()));
        console.log(`Set a new password for ${result.email}; ended ${sessionCount(result.sessionsEnded)}.`);
      });
    });
  user
    .command("remove")
    .description("remove a user with their sessions and sign-in account (refuses the only admin); the audit log keeps their events")
    .requiredOption("--email <email>", "the user's email")
    .action(async (options: { email: string }) => {
      await withDatabase(async () => {
        const result = await asUsage(async () => removeUser(getPrisma(), await userIdByEmail(options.email), cliActor()));
        console.log(`Removed ${result.email} (${result.role}); ended ${sessionCount(result.sessionsEnded)}.`);
      });
    });
}
