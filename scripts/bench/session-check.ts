// Session check benchmark: CPU per call of the request's session check (lib/auth/session-user.ts sessionUser: a
// signed-cookie check and one query) against better-auth's own getSession on the same cookie, in-process.
// Run: node --import tsx scripts/bench/session-check.ts [--calls 500] [--json]
// Database: DATABASE_URL, else foulcast_bench_24 on the local PostgreSQL at 127.0.0.1:5432 (made and filled with
// the demo fleet and its accounts on first use).
import { getAuth } from "../../lib/auth/auth";
import { sessionUser } from "../../lib/auth/session-user";
import { disconnectPrisma } from "../../lib/db";
import { benchServerUrl, createDatabaseIfMissing, ensureDemoFleet } from "./bench-fleet";

const log = (message: string) => console.error(`[bench] ${message}`);
const callsIndex = process.argv.indexOf("--calls");
const calls = callsIndex > 0 ? Number(process.argv[callsIndex + 1]) : 500;

interface Timing { wallMsPerCall: number; cpuMsPerCall: number }

async function time(run: () => Promise<unknown>): Promise<Timing> {
  for (let index = 0; index < 20; index += 1) await run(); // warm-up: JIT, pool connections
  const cpuBefore = process.cpuUsage();
  const started = performance.now();
  for (let index = 0; index < calls; index += 1) await run();
  const cpu = process.cpuUsage(cpuBefore);
  return { wallMsPerCall: Number(((performance.now() - started) / calls).toFixed(3)), cpuMsPerCall: Number(((cpu.user + cpu.system) / 1000 / calls).toFixed(3)) };
}

async function main(): Promise<void> {
  if (!process.env.DATABASE_URL) {
    const url = await createDatabaseIfMissing(benchServerUrl(), "foulcast_bench_24");
    await ensureDemoFleet(url, log);
    process.env.DATABASE_URL = url;
  }
  const { headers: signInHeaders } = await getAuth().api.signInEmail({ body: { email: "viewer@brakwater.example", password: "foulcast-demo" }, returnHeaders: true });
  const cookie = signInHeaders.getSetCookie().map((line) => line.split(";")[0]).join("; ");
  const headers = new Headers({ cookie });
  if ((await sessionUser(headers))?.email !== "viewer@brakwater.example") throw new Error("the session check did not find the signed-in viewer");
  const direct = await time(() => sessionUser(headers));
  const library = await time(() => getAuth().api.getSession({ headers }));
  const report = { calls, sessionUser: direct, betterAuthGetSession: library, cpuRatio: Number((library.cpuMsPerCall / direct.cpuMsPerCall).toFixed(1)) };
  log(`sessionUser ${direct.cpuMsPerCall} ms CPU/call; better-auth getSession ${library.cpuMsPerCall} ms CPU/call (${report.cpuRatio}×)`);
  console.log(JSON.stringify(report, null, process.argv.includes("--json") ? undefined : 2));
  await disconnectPrisma();
}

await main();
