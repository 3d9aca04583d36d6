// The embedded server's life cycle as users meet it: the first process starts
// it, later processes find it running and share it, the owner stops it cleanly,
// and the next start finds the data intact.
import { execFile } from "node:child_process";
import fsp from "node:fs/promises";
import path from "node:path";
import { promisify } from "node:util";
import pg from "pg";
import { afterAll, describe, expect, it } from "vitest";
import { embeddedSettings } from "../../lib/database/connection-settings";
import { ensureEmbeddedServer } from "../../lib/database/embedded-server";
import { freePort } from "../support/free-port";

const run = promisify(execFile);

async function query(url: string, sql: string): Promise<pg.QueryResult> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    return await client.query(sql);
  } finally {
    await client.end();
  }
}

describe("ensureEmbeddedServer", async () => {
  const port = await freePort();
  const relativeDir = `.foulcast/test-lifecycle-${process.pid}`;
  const env = { FOULCAST_PG_DIR: relativeDir, FOULCAST_PG_PORT: String(port) };
  const settings = embeddedSettings(env);

  afterAll(async () => {
    await fsp.rm(settings.dataDir, { recursive: true, force: true });
    await fsp.rm(`${settings.dataDir}.start-lock`, { force: true });
  });

  it("initialises and starts a server in an empty folder and owns it", async () => {
    const first = await ensureEmbeddedServer(settings);
    expect(first.owned).toBe(true);
    await query(first.url, "create table kept (value text)");
    await query(first.url, "insert into kept values ('survives a restart')");

    const second = await ensureEmbeddedServer(settings);
    expect(second.owned).toBe(false);
    expect((await query(second.url, "select value from kept")).rows).toEqual([{ value: "survives a restart" }]);

    // Another process (the CLI) uses the running server and leaves it running.
    const cliEnv = { ...process.env, ...env, DATABASE_URL: "" };
    const { stdout } = await run("node_modules/.bin/tsx", ["scripts/cli.ts", "status", "--json"], { env: cliEnv, timeout: 60_000 });
    const status = JSON.parse(stdout) as { database: { kind: string; startedByThisCommand: boolean; port: number } };
    expect(status.database).toMatchObject({ kind: "embedded", startedByThisCommand: false, port });
    expect((await query(first.url, "select 1 as up")).rows).toEqual([{ up: 1 }]);

    // Still in use by the second user: releasing leaves it running for that user.
    expect(await first.release()).toBe(false);
    expect((await query(second.url, "select 1 as up")).rows).toEqual([{ up: 1 }]);
    // The last user out stops it, even though it did not start it.
    expect(await second.release()).toBe(true);
    await expect(query(first.url, "select 1")).rejects.toThrow();
    // A clean shutdown leaves no postmaster.pid behind.
    await expect(fsp.access(path.join(settings.dataDir, "postmaster.pid"))).rejects.toThrow();
  });

  it("finds the data intact at the next start", async () => {
    const again = await ensureEmbeddedServer(settings);
    expect(again.owned).toBe(true);
    expect((await query(again.url, "select value from kept")).rows).toEqual([{ value: "survives a restart" }]);
    expect(await again.release()).toBe(true);
  });

  it("lets two processes start at once: one starts the server, both succeed, and the last one out stops it", async () => {
    const cliEnv = { ...process.env, ...env, DATABASE_URL: "" };
    const results = await Promise.all([
      run("node_modules/.bin/tsx", ["scripts/cli.ts", "status", "--json"], { env: cliEnv, timeout: 90_000 }),
      run("node_modules/.bin/tsx", ["scripts/cli.ts", "status", "--json"], { env: cliEnv, timeout: 90_000 }),
    ]);
    const statuses = results.map((result) => JSON.parse(result.stdout) as { assets: number; migrations: number });
    for (const status of statuses) expect(status.migrations).toBeGreaterThan(0);
    // Each command stopped what it started: nothing listens any more.
    await expect(query(settings.url, "select 1")).rejects.toThrow();
  });
});
