// Records a cleaning of an asset and recomputes its assessment (a cleaning starts a new fouling cycle).
import type { PrismaClient } from "../../generated/prisma/client";
import { refreshAssessment } from "./refresh-assessment";
import { cleaningSchema, type CleaningInput } from "../validation/cleaning";

export class CleaningRecordError extends Error {}

export async function recordCleaning(prisma: PrismaClient, input: CleaningInput, createdBy: string): Promise<{ id: number; reassessed: boolean }> {
  const parsed = cleaningSchema.safeParse(input);
  if (!parsed.success) throw new CleaningRecordError(parsed.error.issues.map((issue) => `${issue.path.join(".") || "cleaning"}: ${issue.message}`).join("; "));
  const cleaning = parsed.data;
  const asset = await prisma.asset.findUnique({ where: { tag: cleaning.tag }, select: { id: true } });
  if (!asset) throw new CleaningRecordError(`unknown asset ${cleaning.tag}`);
  const overlapping = await prisma.cleaning.findFirst({
    where: { assetId: asset.id, date: { lte: cleaning.endDate ?? cleaning.date }, OR: [{ endDate: { gte: cleaning.date } }, { endDate: null, date: { gte: cleaning.date } }] },
  });
  if (overlapping) throw new CleaningRecordError(`${cleaning.tag} already has a cleaning recorded on ${overlapping.date.toISOString().slice(0, 10)} that overlaps this one`);
  const created = await prisma.cleaning.create({
    data: {
      assetId: asset.id,
      date: cleaning.date,
      endDate: cleaning.endDate ?? null,
      method: cleaning.method,
      costCents: cleaning.cost === undefined ? null : Math.round(cleaning.cost * 100),
      notes: cleaning.notes,
      createdBy,
    },
  });
  const reassessed = (await refreshAssessment(prisma, cleaning.tag)) !== null;
  return { id: created.id, reassessed };
}
