// Reassessment of many assets: inline in this process, or as jobs for the workers (npm run worker).
import type { Command } from "commander";
import { refreshFleet } from "../../lib/data/refresh-fleet";
import { getPrisma } from "../../lib/db";
import { enqueueReassessment } from "../../lib/jobs/enqueue-reassessment";
import { openJobQueue } from "../../lib/jobs/open-job-queue";
import { log, printJson, UsageError, withDatabase } from "./context";

export function registerReassessCommands(program: Command): void {
  program
    .command("reassess")
    .description("recompute screening, instrument alerts and assessments of assets, here or on the job queue (docs: README, Speed and scale)")
    .option("--all", "every asset in the register")
    .option("--asset <tags...>", "these assets")
    .option("--enqueue", "queue one job per asset for the workers (npm run worker, or the one npm start runs) instead of computing here")
    .option("--json", "print the result as JSON")
    .action(async (options: { all?: boolean; asset?: string[]; enqueue?: boolean; json?: boolean }) => {
      if (!options.all === !options.asset) throw new UsageError("give either --all or --asset <tags...>");
      await withDatabase(async (database) => {
        const prisma = getPrisma();
        const assets = await prisma.asset.findMany({
          where: options.asset ? { tag: { in: options.asset } } : {},
          select: { id: true, tag: true },
          orderBy: { tag: "asc" },
        });
        const missing = (options.asset ?? []).filter((tag) => !assets.some((asset) => asset.tag === tag));
        if (missing.length > 0) throw new UsageError(`unknown asset(s): ${missing.join(", ")}`);
        if (options.enqueue) {
          const queue = await openJobQueue(database.url);
          try {
            const result = await enqueueReassessment(queue, assets);
            if (options.json) printJson({ assets: assets.length, ...result });
            else console.log(`Queued ${result.queued} reassessment job(s); ${result.alreadyQueued} asset(s) already had one waiting.`);
          } finally {
            await queue.stop({ graceful: false, wait: true, timeout: 5_000 });
          }
          return;
        }
        const started = performance.now();
        const results = await refreshFleet(prisma, { tags: assets.map((asset) => asset.tag), log: options.json ? undefined : log });
        const seconds = (performance.now() - started) / 1000;
        if (options.json) printJson({ assets: results.length, seconds });
        else console.log(`Reassessed ${results.length} asset(s) in ${seconds.toFixed(1)} s.`);
      });
    });
}
