// `npm run bench [-- --only import,assess,planner,session,api,workers]`: runs the benchmarks with bounded sizes (about 10–15
// minutes in all on a 2-core machine, more the first time, when the API and worker fleets are made), prints a table
// of figures and ratios, and writes docs/benchmarks.md with the machine, the date and the load average.
// Each benchmark runs in its own process, one after another; figures of a shared machine vary with the other work.
import { spawn } from "node:child_process";
import fsp from "node:fs/promises";
import os from "node:os";
import pg from "pg";
import { benchServerUrl } from "./bench-fleet";

const STEPS = ["import", "assess", "planner", "session", "api", "workers"] as const;
type Step = (typeof STEPS)[number];

const onlyIndex = process.argv.indexOf("--only");
const only = onlyIndex > 0 ? (process.argv[onlyIndex + 1] ?? "").split(",").map((name) => name.trim()) : [...STEPS];
const unknown = only.filter((name) => !(STEPS as readonly string[]).includes(name));
if (unknown.length > 0) {
  console.error(`unknown benchmark(s) ${unknown.join(", ")}; choose from ${STEPS.join(", ")}`);
  process.exit(1);
}
const selected = STEPS.filter((step) => only.includes(step));
const writeDocs = !process.argv.includes("--no-write");

const log = (message: string) => console.error(`[bench] ${message}`);
const load = () => os.loadavg().map((value) => value.toFixed(2)).join(" / ");

/** Runs a benchmark script; its last stdout line that parses as JSON is its result. */
async function runScript(script: string, args: string[]): Promise<{ result: unknown; seconds: number; loadBefore: string; loadAfter: string }> {
  const loadBefore = load();
  const started = performance.now();
  const child = spawn(process.execPath, ["--import", "tsx", script, ...args], { stdio: ["ignore", "pipe", "inherit"] });
  let output = "";
  child.stdout.on("data", (chunk: Buffer) => (output += chunk.toString()));
  const code = await new Promise<number>((resolve) => child.once("exit", (exit) => resolve(exit ?? 1)));
  if (code !== 0) throw new Error(`${script} exited with code ${code}`);
  // A JSON document at the end of the output (pretty-printed or on one line).
  const start = output.lastIndexOf("\n{") >= 0 ? output.lastIndexOf("\n{") + 1 : output.indexOf("{");
  const result: unknown = JSON.parse(output.slice(start));
  return { result, seconds: (performance.now() - started) / 1000, loadBefore, loadAfter: load() };
}

type Row = [string, string, string];
const rows: Row[] = [];
const notes: string[] = [];
const fmt = (value: number, digits = 1) => (Number.isFinite(value) ? value.toLocaleString("en-US", { maximumFractionDigits: digits, minimumFractionDigits: digits }) : "—");

interface ImportResult { rows: number; import: { seconds: number; rowsPerSecond: number; peakRssMB: number }; reimport: { seconds: number }; copy: { seconds: number; rowsPerSecond: number }; importToCopyRatio: number }
interface Timing { wallMs: number; cpuMs: number }
interface AssessResult { fiveYears: { periods: number; assess: Timing; ols: Timing; ratioWall: number; ratioCpu: number }; demoFleet: { assets: number; assess: Timing; ols: Timing; ratioCpu: number }; many: { count: number; wallMs: number; cpuMs: number } }
interface PlanResult { fleet: { assets: number; weeks: number }; timesSeconds: { buildCostTables: number; solveWall: number }; status: string; gap: number | null; gapOnTotalCost: number | null; cleanings: number }
interface SessionResult { calls: number; sessionUser: { cpuMsPerCall: number }; betterAuthGetSession: { cpuMsPerCall: number }; cpuRatio: number }
interface Endpoint { path: string; acceptEncoding: string | null; requestsPerSecond: number; p50Ms: number; p95Ms: number; p99Ms: number; non2xx: number; errors: number; serverCpuMsPerRequest: number | null }
interface ApiResult { assets: number; readings: number | null; connections: number; secondsPerEndpoint: number; endpoints: Endpoint[] }
interface WorkerRun { workers: number; assets: number; wallSeconds: number; jobsPerSecond: number; jobsPerWorker: number[]; workerCpuSeconds: number | null }

const handlers: Record<Step, () => Promise<void>> = {
  import: async () => {
    const run = await runScript("scripts/bench/import.ts", ["--rows", "525600"]);
    const result = run.result as ImportResult;
    rows.push([`import, ${result.rows.toLocaleString("en-US")} one-minute rows (a year of one exchanger)`, `${fmt(result.import.seconds, 2)} s, ${result.import.rowsPerSecond.toLocaleString("en-US")} rows/s (peak RSS ${result.import.peakRssMB} MB)`, `COPY ${fmt(result.copy.seconds, 2)} s, ${result.copy.rowsPerSecond.toLocaleString("en-US")} rows/s; import/COPY rate ${fmt(result.importToCopyRatio, 3)}`]);
    rows.push(["import of the same file again (all unchanged)", `${fmt(result.reimport.seconds, 2)} s`, ""]);
    notes.push(`import: ${fmt(run.seconds, 0)} s, load average ${run.loadBefore} → ${run.loadAfter}`);
  },
  assess: async () => {
    const run = await runScript("scripts/bench/assess.ts", ["--json", "--count", "120"]);
    const result = run.result as AssessResult;
    rows.push([`assessAsset, one exchanger, five years hourly (${result.fiveYears.periods.toLocaleString("en-US")} periods)`, `${fmt(result.fiveYears.assess.wallMs)} ms wall, ${fmt(result.fiveYears.assess.cpuMs)} ms CPU`, `straight-line least squares of Rf on time (lib/core/fit QR) ${fmt(result.fiveYears.ols.cpuMs, 3)} ms CPU; grey-box/straight line ${fmt(result.fiveYears.ratioCpu, 0)}× (CPU)`]);
    rows.push([`assessAsset, demo fleet (${result.demoFleet.assets} exchangers, 2.25 years hourly)`, `${fmt(result.demoFleet.assess.cpuMs / result.demoFleet.assets)} ms CPU per exchanger`, `straight line: ${fmt(result.demoFleet.ratioCpu, 0)}× less`]);
    rows.push([`${result.many.count} assessments in a row (demo inputs in turn)`, `${fmt(result.many.wallMs / 1000, 2)} s wall, ${fmt(result.many.cpuMs / 1000, 2)} s CPU`, `→ 500 exchangers ≈ ${fmt((500 * result.many.cpuMs) / result.many.count / 1000, 0)} s CPU`]);
    notes.push(`assess: ${fmt(run.seconds, 0)} s, load average ${run.loadBefore} → ${run.loadAfter}`);
  },
  planner: async () => {
    const run = await runScript("scripts/bench/plan.ts", ["--assets", "500", "--weeks", "52"]);
    const result = run.result as PlanResult;
    rows.push([`cleaning plan, ${result.fleet.assets} exchangers × ${result.fleet.weeks} weeks (HiGHS)`, `build ${fmt(result.timesSeconds.buildCostTables, 2)} s, solve ${fmt(result.timesSeconds.solveWall, 2)} s; ${result.status}, ${result.cleanings} cleanings`, `gap ${result.gap === null ? "—" : `${fmt(result.gap * 100, 3)} %`} (saving), ${result.gapOnTotalCost === null ? "—" : `${fmt(result.gapOnTotalCost * 100, 3)} %`} (total cost); target < 10 s, gap ≤ 1 %`]);
    notes.push(`planner: ${fmt(run.seconds, 0)} s, load average ${run.loadBefore} → ${run.loadAfter}`);
  },
  session: async () => {
    const run = await runScript("scripts/bench/session-check.ts", ["--calls", "500", "--json"]);
    const result = run.result as SessionResult;
    rows.push([`session check of a request (${result.calls} calls, signed in as the demo viewer)`, `${fmt(result.sessionUser.cpuMsPerCall, 2)} ms CPU per call`, `better-auth getSession ${fmt(result.betterAuthGetSession.cpuMsPerCall, 2)} ms CPU per call (${fmt(result.cpuRatio)}×)`]);
    notes.push(`session: ${fmt(run.seconds, 0)} s, load average ${run.loadBefore} → ${run.loadAfter}`);
  },
  api: async () => {
    const run = await runScript("scripts/bench/api-load.ts", ["--build", "--assets", "500", "--connections", "20", "--seconds", "10", "--requests", "3000", "--json"]);
    const result = run.result as ApiResult;
    for (const endpoint of result.endpoints) {
      const target = endpoint.path.startsWith("/api/fleet") || endpoint.path === "/api/assets" ? `; target p95 < 200 ms: ${endpoint.p95Ms < 200 ? "met" : "missed"}` : "";
      rows.push([
        `GET ${endpoint.path}${endpoint.acceptEncoding ? ` (Accept-Encoding: ${endpoint.acceptEncoding})` : ""}, ${result.assets} exchangers, ${result.connections} clients, ${result.secondsPerEndpoint} s`,
        `${fmt(endpoint.requestsPerSecond)} req/s; p50 ${fmt(endpoint.p50Ms, 0)} ms, p95 ${fmt(endpoint.p95Ms, 0)} ms, p99 ${fmt(endpoint.p99Ms, 0)} ms`,
        `server CPU ${endpoint.serverCpuMsPerRequest === null ? "?" : fmt(endpoint.serverCpuMsPerRequest)} ms/request; ${endpoint.non2xx} non-2xx, ${endpoint.errors} errors${target}`,
      ]);
    }
    notes.push(`api: ${fmt(run.seconds, 0)} s, load average ${run.loadBefore} → ${run.loadAfter}${result.readings ? `; ${result.readings.toLocaleString("en-US")} readings in the database` : ""}`);
  },
  workers: async () => {
    const run = await runScript("scripts/bench/workers.ts", ["--assets", "24", "--workers", "1,2", "--json"]);
    const runs = (run.result as { runs: WorkerRun[] }).runs;
    const one = runs.find((entry) => entry.workers === 1);
    for (const entry of runs) {
      rows.push([
        `reassessment jobs, ${entry.assets} exchangers, ${entry.workers} worker process(es)`,
        `${fmt(entry.wallSeconds)} s, ${fmt(entry.jobsPerSecond, 3)} jobs/s (split ${entry.jobsPerWorker.join(" + ")})`,
        `worker CPU ${entry.workerCpuSeconds === null ? "?" : `${fmt(entry.workerCpuSeconds)} s`}${one && entry !== one ? `; speed-up over one worker ${fmt(one.wallSeconds / entry.wallSeconds, 2)}×` : ""}`,
      ]);
    }
    notes.push(`workers: ${fmt(run.seconds, 0)} s, load average ${run.loadBefore} → ${run.loadAfter}`);
  },
};

async function postgresVersion(): Promise<string> {
  const client = new pg.Client({ connectionString: benchServerUrl() });
  try {
    await client.connect();
    return (await client.query<{ server_version: string }>("show server_version")).rows[0]?.server_version ?? "?";
  } catch {
    return "? (server not reachable)";
  } finally {
    await client.end().catch(() => undefined);
  }
}

const cpus = os.cpus();
const started = new Date();
const loadAtStart = load();
const failures: string[] = [];
for (const step of selected) {
  log(`== ${step} (load average ${load()})`);
  try {
    await handlers[step]();
  } catch (error) {
    failures.push(`${step}: ${error instanceof Error ? error.message : String(error)}`);
    log(`${step} failed: ${error instanceof Error ? error.message : String(error)}`);
  }
}
const loadAtEnd = load();
const machine = [
  `CPU: ${cpus.length} × ${cpus[0]?.model ?? "?"}`,
  `RAM: ${(os.totalmem() / 2 ** 30).toFixed(1)} GiB`,
  `Node ${process.version}, PostgreSQL ${await postgresVersion()} (${benchServerUrl().replace(/\/\/[^@]*@/, "//")}; the import benchmark uses the configured server, embedded by default)`,
  `load average (1 / 5 / 15 min) at start ${loadAtStart}, at end ${loadAtEnd}`,
];
const table = ["| measurement | result | comparison |", "|---|---|---|", ...rows.map((row) => `| ${row.join(" | ")} |`)].join("\n");
console.log(`\n${machine.join("\n")}\n\n${table}\n`);
for (const failure of failures) console.log(`FAILED ${failure}`);

if (writeDocs && selected.length === STEPS.length && failures.length === 0) {
  const document = `# Benchmarks

Written by \`npm run bench\` (scripts/bench/run-all.ts) on ${started.toISOString().slice(0, 16).replace("T", " ")} UTC. Rerun it to refresh
this page; \`npm run bench -- --only import,planner\` runs a subset (and leaves this page alone).

## Machine

${machine.map((line) => `- ${line}`).join("\n")}

The machine is shared: other sessions (builds, test suites, browsers) ran at the same time, so wall-clock figures are
inflated and vary from run to run; CPU times are steadier. See the load average per benchmark below.

## Figures

${table}

## Per benchmark

${notes.map((note) => `- ${note}`).join("\n")}

## What each line measures

- **import**: scripts/bench/import.ts — \`importReadings\` of a year of one-minute CSV into a scratch database, against
  PostgreSQL's \`COPY FROM STDIN\` of the same rows already in SI (docs/import.md).
- **assessAsset**: scripts/bench/assess.ts — the grey-box assessment (clean-U model by bounded Levenberg–Marquardt,
  per-cycle trend models, forecasts), pure computation, against a straight-line least-squares fit of the same daily Rf
  series (lib/core/fit QR): the ratio is what the model costs over the plainest fit.
- **cleaning plan**: scripts/bench/plan.ts — the seeded 500-exchanger, 52-week instance (docs/planner.md).
- **session check**: scripts/bench/session-check.ts — in-process CPU of \`sessionUser\` (lib/auth/session-user.ts: the
  signed cookie checked, then the session and its user in one pooled query), which every page, action and API request
  runs, against better-auth's \`getSession\` on the same cookie.
- **GET …**: scripts/bench/api-load.ts — autocannon on loopback against a production build of the working tree (made
  at the start of the step into .next-bench), served by \`npm start -- --no-build\` on a 500-exchanger fleet (the 24 demo exchangers and copies of them, 19,704 hourly readings
  each), signed in as the demo viewer. Latency percentiles are over every answered request; server CPU per request
  is the web server process's CPU time divided by the requests answered. \`GET /api/fleet\` without trend=1 leaves out
  the trend line points; with Accept-Encoding: gzip Next's server compresses the same answer for each request.
- **reassessment jobs**: scripts/bench/workers.ts — every exchanger queued on "reassess-asset", taken by one, then two
  \`npm run worker\` processes (one job at a time each), from the first job queued to the last completed.
`;
  await fsp.writeFile("docs/benchmarks.md", document, "utf8");
  log("wrote docs/benchmarks.md");
} else if (writeDocs) {
  log("docs/benchmarks.md not written: only a full run without failures writes it");
}
process.exit(failures.length > 0 ? 1 : 0);
