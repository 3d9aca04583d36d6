// The assessment as the CLI (`assess --json`) and the API
// (GET /api/assets/{tag}/assessment) return it: one documented shape (README).
import type { PrismaClient } from "../../generated/prisma/client";
import type { Assessment } from "../core/assessment";
import type { CrossingForecast } from "../core/forecast";
import { listAlerts, type AlertRow } from "./list-alerts";
import { getStoredAssessment, refreshAssessment } from "./refresh-assessment";

export const ADVISORY_NOTICE =
  "Advisory only: estimates from operating data. Cleaning means isolating, draining and opening equipment under pressure and temperature; site procedures, permits to work, local codes and licensed engineering practice govern.";

type Forecast = Pick<CrossingForecast, "status" | "p10" | "p50" | "p90" | "crossedAt" | "criticalFoulingM2KPerW">;

export interface AssessmentDocument {
  tag: string;
  asOf: string;
  computedAt: string;
  units: Record<string, string>;
  cleanModel: {
    parameters: { name: string; value: number; standardError: number | null; unit: string }[];
    fitPercent: { estimation: number | null; validation: number | null };
    cleanUAtReferenceWPerM2K: number;
    filmTerms: string;
    notes: string[];
  } | null;
  currentObservedU: Assessment["currentObservedU"];
  foulingResistance: { current: number | null; recentMedian: number | null };
  referenceDuty: Assessment["referenceDuty"];
  trend: { model: string; parameters: NonNullable<Assessment["trend"]>["parameters"]; reason: string; priorUsed: boolean } | null;
  forecasts: { duty: Forecast; foulingAllowance: Forecast; minimumOutlet: Forecast | null };
  alerts: Pick<AlertRow, "id" | "instrumentTag" | "role" | "kind" | "start" | "end" | "size" | "sizeUnit" | "evidence">[];
  notes: string[];
  advisory: string;
  series?: Assessment["foulingResistance"]["series"];
  band?: NonNullable<Assessment["trend"]>["band"];
}

function forecast(value: CrossingForecast): Forecast {
  return { status: value.status, p10: value.p10, p50: value.p50, p90: value.p90, crossedAt: value.crossedAt, criticalFoulingM2KPerW: value.criticalFoulingM2KPerW };
}

export function toAssessmentDocument(tag: string, computedAt: string, assessment: Assessment, alerts: AlertRow[], detail: boolean): AssessmentDocument {
  const clean = assessment.cleanModel;
  return {
    tag,
    asOf: assessment.asOf,
    computedAt,
    units: { temperature: "K", flow: "kg/s", duty: "W", energy: "J", u: "W/(m2.K)", foulingResistance: "m2.K/W", time: "ISO-8601 UTC" },
    cleanModel: clean
      ? {
          parameters: [
            { name: "hotFilmResistanceAtReferenceFlow", value: clean.parameters.hotFilmResistanceRefM2KPerW, standardError: clean.standardErrors.hotFilm, unit: "m2.K/W" },
            { name: "coldFilmResistanceAtReferenceFlow", value: clean.parameters.coldFilmResistanceRefM2KPerW, standardError: clean.standardErrors.coldFilm, unit: "m2.K/W" },
            { name: "wallResistance", value: clean.parameters.wallResistanceM2KPerW, standardError: clean.standardErrors.wall, unit: "m2.K/W" },
            { name: "hotFlowExponent", value: clean.parameters.exponentHot, standardError: clean.standardErrors.exponentHot, unit: "1" },
            { name: "coldFlowExponent", value: clean.parameters.exponentCold, standardError: clean.standardErrors.exponentCold, unit: "1" },
          ],
          fitPercent: clean.fitPercent,
          cleanUAtReferenceWPerM2K: clean.cleanUAtReferenceWPerM2K,
          filmTerms: clean.filmTerms.mode,
          notes: clean.notes,
        }
      : null,
    currentObservedU: assessment.currentObservedU,
    foulingResistance: { current: assessment.foulingResistance.current, recentMedian: assessment.foulingResistance.recentMedian },
    referenceDuty: assessment.referenceDuty,
    trend: assessment.trend ? { model: assessment.trend.model, parameters: assessment.trend.parameters, reason: assessment.trend.reason, priorUsed: assessment.trend.priorUsed !== null } : null,
    forecasts: {
      duty: forecast(assessment.forecasts.duty),
      foulingAllowance: forecast(assessment.forecasts.foulingAllowance),
      minimumOutlet: assessment.forecasts.minimumOutlet ? forecast(assessment.forecasts.minimumOutlet) : null,
    },
    alerts: alerts.map(({ id, instrumentTag, role, kind, start, end, size, sizeUnit, evidence }) => ({ id, instrumentTag, role, kind, start, end, size, sizeUnit, evidence })),
    notes: assessment.notes,
    advisory: ADVISORY_NOTICE,
    ...(detail ? { series: assessment.foulingResistance.series, band: assessment.trend?.band ?? [] } : {}),
  };
}

export type AssessmentLookup = { kind: "unknown-asset" } | { kind: "no-usable-data" } | { kind: "assessed"; document: AssessmentDocument };

/**
 * The stored assessment without what the compact document leaves out: the Rf series, the trend's prediction band
 * and the cycles, about 95 % of the stored JSON (160 kB of 170 kB for a demo exchanger), cut in PostgreSQL so that
 * the app neither receives nor parses them (measured in-process: 6–10 ms of CPU per document instead of 10–12 ms).
 * Only for toAssessmentDocument without detail; test/data/refresh-assessment.test.ts checks both reads agree.
 */
async function storedAssessmentWithoutSeries(prisma: PrismaClient, tag: string): Promise<{ computedAt: string; assessment: Assessment } | null> {
  const rows = await prisma.$queryRaw<{ computedAt: Date; result: Assessment }[]>`
    select aa."computedAt",
           (aa.result - 'foulingResistance' - 'trend' - 'cycles') || jsonb_build_object(
             'foulingResistance', jsonb_build_object('current', aa.result #> '{foulingResistance,current}', 'recentMedian', aa.result #> '{foulingResistance,recentMedian}', 'series', '[]'::jsonb),
             'trend', case when jsonb_typeof(aa.result -> 'trend') = 'object' then (aa.result -> 'trend') - 'band' else 'null'::jsonb end,
             'cycles', '[]'::jsonb
           ) as result
    from "AssetAssessment" aa join "Asset" a on a.id = aa."assetId"
    where a.tag = ${tag}`;
  const row = rows[0];
  return row ? { computedAt: row.computedAt.toISOString(), assessment: row.result } : null;
}

/** The stored assessment document of an asset, computed first when there is none (or when asked to recompute). */
export async function assessmentDocument(prisma: PrismaClient, tag: string, options: { recompute?: boolean; detail?: boolean } = {}): Promise<AssessmentLookup> {
  if (!(await prisma.asset.findUnique({ where: { tag }, select: { id: true } }))) return { kind: "unknown-asset" };
  const read = options.detail ? getStoredAssessment : storedAssessmentWithoutSeries;
  let stored = options.recompute ? null : await read(prisma, tag);
  if (!stored && (await refreshAssessment(prisma, tag))) stored = await read(prisma, tag);
  if (!stored) return { kind: "no-usable-data" };
  const alerts = await listAlerts(prisma, { tag });
  return { kind: "assessed", document: toAssessmentDocument(tag, stored.computedAt, stored.assessment, alerts, options.detail ?? false) };
}
