// Fouling assessment command.
import type { Command } from "commander";
import { assessmentDocument } from "../../lib/data/assessment-document";
import { getPrisma } from "../../lib/db";
import { printJson, UsageError, withDatabase } from "./context";

const date = (iso: string | null) => (iso ? iso.slice(0, 10) : "—");

export function registerAssessCommands(program: Command): void {
  program
    .command("assess")
    .description("the fouling assessment of an asset: clean-U model, fouling trend, threshold forecasts (docs: README)")
    .requiredOption("--asset <tag>", "asset tag")
    .option("--json", "print the assessment JSON (the same document as GET /api/assets/{tag}/assessment)")
    .option("--recompute", "recompute from the stored periods instead of using the stored assessment")
    .option("--detail", "include the fouling-resistance series and the forecast band (JSON)")
    .action(async (options: { asset: string; json?: boolean; recompute?: boolean; detail?: boolean }) => {
      await withDatabase(async () => {
        const lookup = await assessmentDocument(getPrisma(), options.asset, { recompute: options.recompute, detail: options.detail });
        if (lookup.kind === "unknown-asset") throw new UsageError(`unknown asset ${options.asset}`);
        if (lookup.kind === "no-usable-data") throw new UsageError(`${options.asset} has no usable screened data to assess yet (import readings, then npm run cli -- screen --asset ${options.asset})`);
        const document = lookup.document;
        if (options.json) return printJson(document);
        const duty = document.forecasts.duty;
        console.log(`${document.tag} as of ${document.asOf}`);
        if (document.cleanModel) console.log(`  clean U at reference ${document.cleanModel.cleanUAtReferenceWPerM2K.toFixed(1)} W/(m²·K); fit ${document.cleanModel.fitPercent.estimation?.toFixed(1) ?? "—"} % (estimation), ${document.cleanModel.fitPercent.validation?.toFixed(1) ?? "—"} % (validation)`);
        if (document.currentObservedU) console.log(`  observed U ${document.currentObservedU.uWPerM2K.toFixed(1)} W/(m²·K) = ${document.currentObservedU.percentOfClean.toFixed(1)} % of clean`);
        console.log(`  fouling resistance ${document.foulingResistance.current?.toExponential(3) ?? "—"} m²·K/W; trend ${document.trend?.model ?? "none"}${document.trend ? ` (${document.trend.reason})` : ""}`);
        if (document.referenceDuty.lossW !== null) console.log(`  duty at reference ${((document.referenceDuty.currentW ?? 0) / 1e3).toFixed(0)} kW, loss ${(document.referenceDuty.lossW / 1e3).toFixed(0)} kW vs clean`);
        console.log(`  duty below threshold: ${duty.status}; P10 ${date(duty.p10)}, P50 ${date(duty.p50)}, P90 ${date(duty.p90)}${duty.crossedAt ? `; crossed ${date(duty.crossedAt)}` : ""}`);
        const allowance = document.forecasts.foulingAllowance;
        console.log(`  design fouling allowance reached: ${allowance.status}; P10 ${date(allowance.p10)}, P50 ${date(allowance.p50)}, P90 ${date(allowance.p90)}`);
        for (const alert of document.alerts) console.log(`  open alert #${alert.id}: ${alert.instrumentTag} ${alert.kind} from ${date(alert.start)}`);
        console.log(`  ${document.advisory}`);
      });
    });
}
