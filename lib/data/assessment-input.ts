// The assessment's input from stored rows: the register entry, the daily screened periods and the cleaning records.
import type { Asset, Cleaning, OperatingPeriod } from "../../generated/prisma/client";
import type { AssessmentInput, AssessmentPeriod } from "../core/assessment";
import { assetReferenceRating } from "./exchanger-model";

/** The stored period columns the assessment reads. */
export type StoredAssessmentPeriod = Pick<
  OperatingPeriod,
  "start" | "usable" | "recHotInK" | "recHotOutK" | "recColdInK" | "recColdOutK" | "recHotFlowKgPerS" | "recColdFlowKgPerS" | "recDutyW"
>;

/** Prisma `select` of StoredAssessmentPeriod. */
export const ASSESSMENT_PERIOD_COLUMNS = {
  start: true,
  usable: true,
  recHotInK: true,
  recHotOutK: true,
  recColdInK: true,
  recColdOutK: true,
  recHotFlowKgPerS: true,
  recColdFlowKgPerS: true,
  recDutyW: true,
} as const;

/** Reconciled periods as the assessment takes them; periods without a complete reconciliation are left out. */
export function assessmentPeriods(stored: readonly StoredAssessmentPeriod[]): AssessmentPeriod[] {
  const periods: AssessmentPeriod[] = [];
  for (const period of stored) {
    if (period.recHotInK === null || period.recHotOutK === null || period.recColdInK === null || period.recColdOutK === null || period.recHotFlowKgPerS === null || period.recColdFlowKgPerS === null || period.recDutyW === null) continue;
    periods.push({
      startMs: period.start.getTime(),
      hotInK: period.recHotInK,
      hotOutK: period.recHotOutK,
      coldInK: period.recColdInK,
      coldOutK: period.recColdOutK,
      hotFlowKgPerS: period.recHotFlowKgPerS,
      coldFlowKgPerS: period.recColdFlowKgPerS,
      dutyW: period.recDutyW,
      usable: period.usable,
    });
  }
  return periods;
}

/**
 * assessmentInput: the input of assessAsset for an asset as of `asOfMs`, from its register row, reconciled periods and
 * cleaning records. Each cleaning's fouling clock starts at its return to service (endDate, or date without one).
 */
export function assessmentInput(asset: Asset, periods: AssessmentPeriod[], cleanings: readonly Pick<Cleaning, "date" | "endDate" | "method" | "costCents">[], asOfMs: number): AssessmentInput {
  return {
    asset: {
      ...assetReferenceRating(asset),
      designUWPerM2K: asset.designUWPerM2K,
      designFoulingM2KPerW: asset.designFoulingM2KPerW,
      dutyThresholdW: asset.dutyThresholdW,
      ...(asset.minimumOutletK !== null && (asset.minimumOutletStream === "hot" || asset.minimumOutletStream === "cold")
        ? { minimumOutlet: { stream: asset.minimumOutletStream, temperatureK: asset.minimumOutletK } }
        : {}),
    },
    periods,
    cleanings: cleanings.map((cleaning) => ({
      timeMs: (cleaning.endDate ?? cleaning.date).getTime(),
      method: cleaning.method,
      ...(cleaning.costCents === null ? {} : { costCents: cleaning.costCents }),
    })),
    asOfMs,
  };
}
