// API load benchmark: a production server (the last `next build`, served by `npm start -- --no-build`) on a fleet of
// many exchangers in its own database, signed in as the demo viewer, under autocannon on loopback: the fleet API
// (GET /api/fleet, or GET /api/assets where that route does not exist), one asset's assessment, and the fleet page.
// The server runs the build in .next-bench (made on first use, or again with --build).
// Run: node --import tsx scripts/bench/api-load.ts [--assets 500] [--connections 20] [--seconds 10] [--requests 3000]
//      [--url http://127.0.0.1:3000 (use a running server; its own database)] [--port 3311] [--build] [--json]
//      [--paths /api/health,/api/fleet,gzip:/api/fleet (instead of the default list)] [--server-pid PID (with --url)]
// A path written gzip:/… is asked for with Accept-Encoding: gzip, as browsers and most HTTP clients do (autocannon
// counts the compressed bytes and does not inflate them).
// Database: foulcast_bench_<assets> on DATABASE_URL's server, else on the local PostgreSQL at 127.0.0.1:5432; made,
// filled (demo fleet, then copies: scripts/bench/bench-fleet.ts, a few minutes the first time) and kept for reruns.
import autocannon from "autocannon";
import { spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import { benchServerUrl, createDatabaseIfMissing, ensureDemoFleet, growFleet } from "./bench-fleet";

const log = (message: string) => console.error(`[bench] ${message}`);
const BENCH_DIST_DIR = ".next-bench";

function option(name: string, fallback: number): number {
  const index = process.argv.indexOf(`--${name}`);
  return index > 0 ? Number(process.argv[index + 1]) : fallback;
}
function textOption(name: string): string | undefined {
  const index = process.argv.indexOf(`--${name}`);
  return index > 0 ? process.argv[index + 1] : undefined;
}

export interface EndpointFigures {
  path: string;
  /** The request's Accept-Encoding, when it sent one. */
  acceptEncoding: string | null;
  requests: number;
  requestsPerSecond: number;
  p50Ms: number;
  p95Ms: number;
  p99Ms: number;
  maxMs: number;
  non2xx: number;
  errors: number;
  /** CPU time (user + system) of the web server process per answered request, ms; null when not known. */
  serverCpuMsPerRequest: number | null;
}

/** CPU seconds (user + system) a process has used, from /proc/<pid>/stat (Linux); null elsewhere. */
function cpuSeconds(pid: number | null): number | null {
  if (pid === null) return null;
  try {
    const fields = fs.readFileSync(`/proc/${pid}/stat`, "utf8").split(") ")[1]?.split(" ") ?? [];
    // proc(5): utime and stime are fields 14 and 15, i.e. 11 and 12 after the command name; 100 ticks per second.
    return (Number(fields[11]) + Number(fields[12])) / 100;
  } catch {
    return null;
  }
}

/** The Next.js server that `scripts/start.ts` (process `launcherPid`) runs as its child. */
function webServerPid(launcherPid: number | undefined): number | null {
  if (launcherPid === undefined) return null;
  try {
    const children = fs.readFileSync(`/proc/${launcherPid}/task/${launcherPid}/children`, "utf8").trim().split(/\s+/).filter(Boolean).map(Number);
    return children[0] ?? null;
  } catch {
    return null;
  }
}

/** The value below which `fraction` of the sorted sample lies (nearest rank, Hyndman & Fan definition 1). */
function percentile(sorted: number[], fraction: number): number {
  if (sorted.length === 0) return Number.NaN;
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil(fraction * sorted.length) - 1))] as number;
}

async function waitForHealth(base: string, server: ChildProcess | null, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (server && server.exitCode !== null) throw new Error(`the server exited with code ${server.exitCode}`);
    const ok = await fetch(`${base}/api/health`).then((response) => response.ok, () => false);
    if (ok) return;
    await new Promise((resolve) => setTimeout(resolve, 500));
  }
  throw new Error(`no healthy server at ${base} within ${timeoutMs / 1000} s`);
}

async function signIn(base: string): Promise<string> {
  const response = await fetch(`${base}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { "Content-Type": "application/json", Origin: base },
    body: JSON.stringify({ email: "viewer@brakwater.example", password: "foulcast-demo" }),
  });
  if (!response.ok) throw new Error(`sign-in failed with ${response.status}: ${await response.text()}`);
  const cookies = response.headers.getSetCookie().map((cookie) => cookie.split(";")[0]);
  if (cookies.length === 0) throw new Error("sign-in answered without a session cookie");
  return cookies.join("; ");
}

async function load(base: string, entry: string, cookie: string, connections: number, seconds: number, requests: number, serverPid: number | null): Promise<EndpointFigures> {
  const acceptEncoding = entry.startsWith("gzip:") ? "gzip" : null;
  const path = acceptEncoding ? entry.slice("gzip:".length) : entry;
  const headers: Record<string, string> = { cookie, ...(acceptEncoding ? { "accept-encoding": acceptEncoding } : {}) };
  // Warm-up, not measured: a few requests one by one (the first ones compile and fill caches), then one request per
  // connection at the same concurrency, all answered before the measurement starts (a warm-up by duration would leave
  // slow pages' requests running into it), so the figures are of a server that has been running, as in use.
  for (let index = 0; index < 3; index += 1) await fetch(`${base}${path}`, { headers }).then((response) => response.arrayBuffer());
  await autocannon({ url: `${base}${path}`, connections, amount: connections, timeout: 60, headers });
  const latencies: number[] = [];
  const cpuBefore = cpuSeconds(serverPid);
  // autocannon's `amount` would override `duration`; stop at whichever bound comes first instead.
  const instance = autocannon({ url: `${base}${path}`, connections, duration: seconds, timeout: 30, headers });
  instance.on("response", (_client, _status, _bytes, responseTimeMs) => {
    latencies.push(responseTimeMs);
    if (latencies.length === requests) instance.stop();
  });
  const result = await instance;
  const cpuAfter = cpuSeconds(serverPid);
  latencies.sort((a, b) => a - b);
  return {
    path,
    acceptEncoding,
    requests: latencies.length,
    requestsPerSecond: Number((latencies.length / result.duration).toFixed(1)),
    p50Ms: percentile(latencies, 0.5),
    p95Ms: percentile(latencies, 0.95),
    p99Ms: percentile(latencies, 0.99),
    maxMs: latencies.at(-1) ?? Number.NaN,
    non2xx: result.non2xx,
    errors: result.errors + result.timeouts,
    serverCpuMsPerRequest: cpuBefore === null || cpuAfter === null || latencies.length === 0 ? null : Number((((cpuAfter - cpuBefore) * 1000) / latencies.length).toFixed(1)),
  };
}

export interface ApiLoadReport {
  assets: number;
  readings: number | null;
  connections: number;
  secondsPerEndpoint: number;
  endpoints: EndpointFigures[];
}

async function main(): Promise<void> {
  const assets = option("assets", 500);
  const connections = option("connections", 20);
  const seconds = option("seconds", 10);
  const requests = option("requests", 3000);
  const port = option("port", 3311);
  const runningUrl = textOption("url");
  let server: ChildProcess | null = null;
  let readings: number | null = null;
  let base = runningUrl ?? `http://127.0.0.1:${port}`;
  try {
    if (!runningUrl) {
      const url = await createDatabaseIfMissing(benchServerUrl(), `foulcast_bench_${assets}`);
      await ensureDemoFleet(url, log);
      readings = (await growFleet(url, assets, log)).readings;
      // Its own build folder, so that a rebuild for `npm start` or the browser tests never swaps the served files.
      if (process.argv.includes("--build") || !fs.existsSync(`${BENCH_DIST_DIR}/BUILD_ID`)) {
        log(`next build into ${BENCH_DIST_DIR}`);
        const build = spawn("node_modules/.bin/next", ["build"], { stdio: ["ignore", "ignore", "inherit"], env: { ...process.env, NEXT_TELEMETRY_DISABLED: "1", FOULCAST_DIST_DIR: BENCH_DIST_DIR } });
        const code = await new Promise<number>((resolve) => build.once("exit", (exit) => resolve(exit ?? 1)));
        if (code !== 0) throw new Error(`next build failed with exit code ${code}`);
      }
      log(`starting the production server on port ${port} with ${assets} assets`);
      server = spawn(process.execPath, ["--import", "tsx", "scripts/start.ts", "--no-build"], {
        stdio: ["ignore", "ignore", "inherit"],
        env: { ...process.env, DATABASE_URL: url, PORT: String(port), FOULCAST_WORKERS: "0", FOULCAST_BASE_URL: base, FOULCAST_DIST_DIR: BENCH_DIST_DIR },
      });
      await waitForHealth(base, server, 180_000);
    }
    base = base.replace(/\/$/, "");
    const serverPid = runningUrl ? (option("server-pid", 0) || null) : webServerPid(server?.pid);
    const cookie = await signIn(base);
    const fleetApi = (await fetch(`${base}/api/fleet`, { headers: { cookie } })).ok ? "/api/fleet" : "/api/assets";
    const list = (await (await fetch(`${base}/api/assets`, { headers: { cookie } })).json()) as { assets: { tag: string }[] };
    const tag = list.assets.find((asset) => asset.tag === "E-1105")?.tag ?? list.assets[0]?.tag;
    if (!tag) throw new Error("the server lists no assets");
    const endpoints: EndpointFigures[] = [];
    const paths = textOption("paths")?.split(",") ?? [fleetApi, `gzip:${fleetApi}`, `${fleetApi}?trend=1`, `/api/assets/${encodeURIComponent(tag)}/assessment`, "/", "/?per=all"];
    for (const path of paths) {
      log(`autocannon ${path}: ${connections} connections, at most ${seconds} s or ${requests} requests`);
      const figures = await load(base, path, cookie, connections, seconds, requests, serverPid);
      log(`  ${figures.requestsPerSecond} req/s, p50 ${figures.p50Ms.toFixed(0)} ms, p95 ${figures.p95Ms.toFixed(0)} ms, p99 ${figures.p99Ms.toFixed(0)} ms, non-2xx ${figures.non2xx}, server CPU ${figures.serverCpuMsPerRequest ?? "?"} ms/request`);
      endpoints.push(figures);
    }
    const report: ApiLoadReport = { assets: list.assets.length, readings, connections, secondsPerEndpoint: seconds, endpoints };
    if (process.argv.includes("--json")) console.log(JSON.stringify(report));
    else console.log(JSON.stringify(report, null, 2));
  } finally {
    if (server && server.exitCode === null) {
      server.kill("SIGTERM");
      await new Promise((resolve) => server?.once("exit", resolve));
    }
  }
}

await main();
process.exit(0);
