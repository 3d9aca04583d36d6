// `npm start`: prepare the database (start the embedded server when
// DATABASE_URL is unset, apply migrations, load the demo fleet into an empty
// database), build the web app, then serve it on http://localhost:3000.
// Ctrl-C or SIGTERM stops the web server and then the embedded database.
import exitHook from "async-exit-hook";
import { spawn, type ChildProcess } from "node:child_process";
import { prepareDatabase } from "../lib/database/prepare-database";
import { seedDemoFleetIfEmpty } from "../lib/data/seed-demo-fleet";
import { DEMO_PASSWORD, seedDemoUsersIfNone } from "../lib/data/seed-demo-users";
import { authSecret } from "../lib/auth/auth-secret";
import { refreshFleet } from "../lib/data/refresh-fleet";
import { disconnectPrisma, getPrisma } from "../lib/db";
import { jobQueueSettings } from "../lib/jobs/job-queue-settings";
import { runReassessWorker, type RunningWorker } from "../lib/jobs/run-reassess-worker";

const dev = process.argv.includes("--dev");
const skipBuild = process.argv.includes("--no-build") || process.env.FOULCAST_SKIP_BUILD === "1";
const port = process.env.PORT ?? "3000";
const log = (message: string) => console.log(`[foulcast] ${message}`);

let web: ChildProcess | null = null;
let worker: RunningWorker | null = null;

function run(command: string, args: string[], env: NodeJS.ProcessEnv): ChildProcess {
  return spawn(command, args, { stdio: "inherit", env });
}

function waitForExit(child: ChildProcess): Promise<number> {
  return new Promise((resolve) => {
    if (child.exitCode !== null) resolve(child.exitCode);
    else child.once("exit", (code) => resolve(code ?? 1));
  });
}

const database = await prepareDatabase({ log });
process.env.DATABASE_URL = database.url;
exitHook.forceExitTimeout(20_000);
exitHook((done) => {
  void (async () => {
    if (web && web.exitCode === null) {
      web.kill("SIGTERM");
      await waitForExit(web);
    }
    await worker?.stop(15_000);
    await disconnectPrisma();
    await database.release();
    log("Web server stopped.");
    done();
  })();
});

// npm runs this script through `sh -c`; a SIGTERM sent to npm ends that shell
// but does not reach us. When our parent goes away, shut down as for SIGTERM.
const parentAtStart = process.ppid;
setInterval(() => {
  if (process.ppid !== parentAtStart) process.kill(process.pid, "SIGTERM");
}, 1_000).unref();

if (database.migrations.applied.length > 0) log(`Applied migrations: ${database.migrations.applied.join(", ")}`);
const seeded = await seedDemoFleetIfEmpty(getPrisma(), { log });
if (seeded) {
  log(`Loaded the demo fleet: ${seeded.assets} exchangers, ${seeded.readings} readings. Screening the data...`);
  await refreshFleet(getPrisma(), { log });
}
const demoUsers = await seedDemoUsersIfNone(getPrisma());
if (demoUsers.length > 0) {
  log(`No user accounts yet: made the demo accounts ${demoUsers.join(", ")} (password "${DEMO_PASSWORD}").`);
  log("They are for the demo only: create your own users (npm run cli -- user add) and delete these.");
}
await disconnectPrisma();
// Make the session-signing secret now (unless BETTER_AUTH_SECRET is set), so the web server only reads it.
authSecret();

// Reassessments after web imports go to the job queue (FOULCAST_QUEUE=on for the web server unless set), taken by a
// worker in this process (FOULCAST_WORKERS concurrent jobs, default 1; 0 when separate `npm run worker` processes run),
// so a reassessment never holds up the web server's requests.
const queueSettings = jobQueueSettings();
if (queueSettings.inProcessWorkers > 0) {
  worker = await runReassessWorker(database.url, {
    concurrency: queueSettings.inProcessWorkers,
    onJob: (outcome, milliseconds) => log(`Reassessed ${outcome.tag ?? `asset ${outcome.assetId}`} (queued job, ${(milliseconds / 1000).toFixed(1)} s)`),
    onFailure: (data, error) => log(`Reassessment of ${data.tag} failed: ${error instanceof Error ? error.message : String(error)}`),
  });
  log(`Reassessment worker running (${queueSettings.inProcessWorkers} job(s) at a time; FOULCAST_WORKERS=0 turns it off).`);
}
const env = { ...process.env, DATABASE_URL: database.url, NEXT_TELEMETRY_DISABLED: "1", FOULCAST_QUEUE: process.env.FOULCAST_QUEUE ?? "on" };
const next = "node_modules/.bin/next";
if (!dev && !skipBuild) {
  log("Building the web app (next build)...");
  const code = await waitForExit(run(next, ["build"], env));
  if (code !== 0) {
    log(`next build failed with exit code ${code}`);
    process.exit(code);
  }
}
log(`Serving on http://localhost:${port}`);
web = run(next, [dev ? "dev" : "start", "-p", port], env);
const code = await waitForExit(web);
// The web server ended by itself (not through a signal): release the database too.
await worker?.stop(15_000);
await database.release();
process.exit(code);
