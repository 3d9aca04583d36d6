// `npm run worker -- [--concurrency N]`: takes reassessment jobs (queue "reassess-asset") until stopped with Ctrl-C
// or SIGTERM, which lets the jobs in progress finish. Run any number of these, on this machine or others that reach
// the same database: they split the queued assets between them. With separate workers, start the web server with
// FOULCAST_WORKERS=0 so that it runs none itself.
import exitHook from "async-exit-hook";
import { Command } from "commander";
import { prepareDatabase } from "../lib/database/prepare-database";
import { jobQueueSettings } from "../lib/jobs/job-queue-settings";
import { runReassessWorker } from "../lib/jobs/run-reassess-worker";

const log = (message: string) => console.log(`[foulcast worker ${process.pid}] ${message}`);

const options = new Command()
  .name("npm run worker --")
  .description("reassessment worker: screening, instrument alerts and assessment of each queued asset")
  .option("--concurrency <n>", "jobs at the same time in this process (default FOULCAST_WORKERS, or 1 when that is 0)")
  .option("--quiet", "do not print a line per job")
  .parse(process.argv)
  .opts<{ concurrency?: string; quiet?: boolean }>();

const concurrency = options.concurrency === undefined ? Math.max(1, jobQueueSettings().inProcessWorkers) : Number(options.concurrency);
if (!Number.isInteger(concurrency) || concurrency < 1 || concurrency > 32) {
  console.error(`--concurrency must be a whole number from 1 to 32, got "${options.concurrency}"`);
  process.exit(1);
}

const database = await prepareDatabase({ log });
const worker = await runReassessWorker(database.url, {
  concurrency,
  onJob: options.quiet
    ? undefined
    : (outcome, milliseconds) =>
        log(`${outcome.tag ?? `asset ${outcome.assetId} (deleted)`}: ${outcome.usablePeriods}/${outcome.periods} usable days, ${outcome.assessed ? "assessed" : "not assessed"} in ${(milliseconds / 1000).toFixed(2)} s`),
  onFailure: (data, error) => log(`${data.tag}: failed (${error instanceof Error ? error.message : String(error)}); pg-boss retries it`),
});
log(`ready: ${concurrency} concurrent job(s) on queue "reassess-asset"`);

exitHook.forceExitTimeout(90_000);
exitHook((done) => {
  void (async () => {
    log("stopping: finishing the jobs in progress");
    await worker.stop();
    await database.release();
    log("stopped");
    done();
  })();
});
