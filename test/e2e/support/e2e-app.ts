// The app as users meet it, for the browser tests: a test database with part of the demo fleet and the demo
// accounts, a production build (`next build` into .next-e2e) and `next start` on a free port.
import { spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { refreshFleet } from "../../../lib/data/refresh-fleet";
import { seedDemoFleetIfEmpty } from "../../../lib/data/seed-demo-fleet";
import { seedDemoUsersIfNone } from "../../../lib/data/seed-demo-users";
import { createTestDatabase, type TestDatabase } from "../../support/test-database";
import { freePort } from "../../support/free-port";

export const E2E_TAGS = ["E-1101", "E-1105", "E-2201"];
export const DIST_DIR = ".next-e2e";

/** Debian's Chromium (or CHROMIUM_PATH); null when absent, or when FOULCAST_E2E=0 turns the browser tests off. */
export function chromiumPath(): string | null {
  if (process.env.FOULCAST_E2E === "0") return null;
  const candidate = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
  return fs.existsSync(candidate) ? candidate : null;
}

function run(command: string, args: string[], env: NodeJS.ProcessEnv, output: string[]): ChildProcess {
  const child = spawn(command, args, { env, stdio: ["ignore", "pipe", "pipe"], detached: true });
  child.stdout?.on("data", (chunk: Buffer) => output.push(chunk.toString()));
  child.stderr?.on("data", (chunk: Buffer) => output.push(chunk.toString()));
  return child;
}

function exitOf(child: ChildProcess): Promise<number> {
  return new Promise((resolve) => (child.exitCode !== null ? resolve(child.exitCode) : child.once("exit", (code) => resolve(code ?? 1))));
}

export interface E2eApp {
  baseUrl: string;
  database: TestDatabase;
  stop(): Promise<void>;
}

/** Builds and starts the app on a test database; throws with the server's output when it does not come up. */
export async function startE2eApp(): Promise<E2eApp> {
  const database = await createTestDatabase();
  await seedDemoFleetIfEmpty(database.prisma, { tags: E2E_TAGS });
  await refreshFleet(database.prisma, {});
  await seedDemoUsersIfNone(database.prisma);
  const port = await freePort();
  const baseUrl = `http://localhost:${port}`;
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    DATABASE_URL: database.url,
    PORT: String(port),
    FOULCAST_BASE_URL: baseUrl,
    FOULCAST_DIST_DIR: DIST_DIR,
    BETTER_AUTH_SECRET: process.env.BETTER_AUTH_SECRET ?? "e2e-only-secret-0123456789abcdef0123456789",
    NEXT_TELEMETRY_DISABLED: "1",
    NODE_ENV: "production",
  };
  const next = path.join("node_modules", ".bin", "next");
  const output: string[] = [];
  if (process.env.FOULCAST_E2E_REUSE_BUILD !== "1" || !fs.existsSync(path.join(DIST_DIR, "BUILD_ID"))) {
    const code = await exitOf(run(next, ["build"], env, output));
    if (code !== 0) throw new Error(`next build failed (${code}):\n${output.join("").slice(-4000)}`);
  }
  const server = run(next, ["start", "-p", String(port)], env, output);
  const deadline = Date.now() + 120_000;
  for (;;) {
    if (server.exitCode !== null) throw new Error(`next start exited (${server.exitCode}):\n${output.join("").slice(-4000)}`);
    try {
      const response = await fetch(`${baseUrl}/api/health`);
      if (response.ok) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) throw new Error(`the app did not answer within 120 s:\n${output.join("").slice(-4000)}`);
    await new Promise((resolve) => setTimeout(resolve, 500));
  }
  return {
    baseUrl,
    database,
    async stop() {
      if (server.exitCode === null && server.pid) {
        process.kill(-server.pid, "SIGTERM");
        await Promise.race([exitOf(server), new Promise((resolve) => setTimeout(resolve, 10_000))]);
        if (server.exitCode === null) process.kill(-server.pid, "SIGKILL");
      }
      await database.drop();
    },
  };
}
