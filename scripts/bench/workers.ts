// Worker benchmark: the fleet's reassessment (screening, instrument alerts, assessment per asset) as jobs on the
// "reassess-asset" queue, taken by 1 worker process, then by 2, … (each `scripts/worker.ts --concurrency 1`).
// Measures the wall time from enqueueing every asset to the last job completed (workers started and idle before),
// jobs per second, how the jobs split between the processes, and the CPU time the workers used (Linux /proc).
// Run: node --import tsx scripts/bench/workers.ts [--assets 24] [--workers 1,2] [--json]
// Database: foulcast_bench_<assets> (see scripts/bench/bench-fleet.ts; more than 24 assets are copies of the demo
// assets, which cost the same work as their originals), made and kept for reruns.
import { spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import pg from "pg";
import { enqueueReassessment } from "../../lib/jobs/enqueue-reassessment";
import { openJobQueue, REASSESS_QUEUE } from "../../lib/jobs/open-job-queue";
import { benchServerUrl, createDatabaseIfMissing, ensureDemoFleet, growFleet } from "./bench-fleet";

const log = (message: string) => console.error(`[bench] ${message}`);

function option(name: string, fallback: string): string {
  const index = process.argv.indexOf(`--${name}`);
  return index > 0 ? (process.argv[index + 1] ?? fallback) : fallback;
}

/** CPU seconds (user + system) a process has used, from /proc/<pid>/stat; null where /proc is not there. */
function cpuSeconds(pid: number): number | null {
  try {
    const fields = fs.readFileSync(`/proc/${pid}/stat`, "utf8").split(") ")[1]?.split(" ") ?? [];
    // fields after "comm": state is index 0, utime index 11, stime index 12 (proc(5)), in clock ticks (100 per second on Linux).
    return (Number(fields[11]) + Number(fields[12])) / 100;
  } catch {
    return null;
  }
}

interface WorkerProcess {
  child: ChildProcess;
  jobs: number;
  ready: Promise<void>;
}

function startWorker(url: string): WorkerProcess {
  const child = spawn(process.execPath, ["--import", "tsx", "scripts/worker.ts", "--concurrency", "1"], { stdio: ["ignore", "pipe", "inherit"], env: { ...process.env, DATABASE_URL: url } });
  const worker: WorkerProcess = { child, jobs: 0, ready: Promise.resolve() };
  worker.ready = new Promise((resolve, reject) => {
    let buffered = "";
    child.stdout?.on("data", (chunk: Buffer) => {
      buffered += chunk.toString();
      const lines = buffered.split("\n");
      buffered = lines.pop() ?? "";
      for (const line of lines) {
        if (line.includes("ready:")) resolve();
        if (line.includes(" assessed in ") || line.includes(" not assessed in ")) worker.jobs += 1;
      }
    });
    child.once("exit", (code) => reject(new Error(`worker exited with code ${code} before it was ready`)));
  });
  return worker;
}

export interface WorkerRun {
  workers: number;
  assets: number;
  wallSeconds: number;
  jobsPerSecond: number;
  jobsPerWorker: number[];
  workerCpuSeconds: number | null;
}

async function countCompleted(client: pg.Client): Promise<number> {
  const result = await client.query<{ count: string }>(`select count(*) as count from pgboss.job where name = $1 and state = 'completed'`, [REASSESS_QUEUE]);
  return Number(result.rows[0]?.count ?? 0);
}

async function runOnce(url: string, workers: number): Promise<WorkerRun> {
  const queue = await openJobQueue(url);
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  const processes: WorkerProcess[] = [];
  try {
    await client.query(`delete from pgboss.job where name = $1`, [REASSESS_QUEUE]);
    for (let index = 0; index < workers; index += 1) processes.push(startWorker(url));
    await Promise.all(processes.map((worker) => worker.ready));
    const cpuBefore = processes.map((worker) => cpuSeconds(worker.child.pid ?? -1));
    const assets = (await client.query<{ id: number; tag: string }>(`select id, tag from "Asset" order by tag`)).rows;
    const started = performance.now();
    await enqueueReassessment(queue, assets);
    while ((await countCompleted(client)) < assets.length) {
      const failed = await client.query(`select 1 from pgboss.job where name = $1 and state = 'failed' limit 1`, [REASSESS_QUEUE]);
      if (failed.rowCount) throw new Error("a reassessment job failed; see the worker output");
      await new Promise((resolve) => setTimeout(resolve, 200));
    }
    const wallSeconds = (performance.now() - started) / 1000;
    const cpuAfter = processes.map((worker) => cpuSeconds(worker.child.pid ?? -1));
    const cpuUsed = cpuAfter.every((value, index) => value !== null && cpuBefore[index] !== null)
      ? cpuAfter.reduce<number>((sum, value, index) => sum + (value as number) - (cpuBefore[index] as number), 0)
      : null;
    return {
      workers,
      assets: assets.length,
      wallSeconds: Number(wallSeconds.toFixed(1)),
      jobsPerSecond: Number((assets.length / wallSeconds).toFixed(3)),
      jobsPerWorker: processes.map((worker) => worker.jobs),
      workerCpuSeconds: cpuUsed === null ? null : Number(cpuUsed.toFixed(1)),
    };
  } finally {
    for (const worker of processes) {
      if (worker.child.exitCode === null) {
        worker.child.kill("SIGTERM");
        await new Promise((resolve) => worker.child.once("exit", resolve));
      }
    }
    await client.end();
    await queue.stop({ graceful: false, wait: true, timeout: 5_000 });
  }
}

async function main(): Promise<void> {
  const assets = Number(option("assets", "24"));
  const counts = option("workers", "1,2").split(",").map(Number);
  const url = await createDatabaseIfMissing(benchServerUrl(), `foulcast_bench_${assets}`);
  await ensureDemoFleet(url, log);
  if (assets > 24) await growFleet(url, assets, log);
  const runs: WorkerRun[] = [];
  for (const workers of counts) {
    log(`${workers} worker process(es), ${assets} assets; load average ${os.loadavg().map((value) => value.toFixed(1)).join(" ")}`);
    const run = await runOnce(url, workers);
    log(`  ${run.wallSeconds} s, ${run.jobsPerSecond} jobs/s, split ${run.jobsPerWorker.join("+")}, worker CPU ${run.workerCpuSeconds ?? "?"} s`);
    runs.push(run);
  }
  console.log(JSON.stringify({ runs }, null, process.argv.includes("--json") ? undefined : 2));
}

await main();
process.exit(0);
