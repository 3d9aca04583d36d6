import type { PrismaClient } from "../../generated/prisma/client";

export interface AlertRow {
  id: number;
  tag: string;
  role: string;
  instrumentTag: string;
  kind: string;
  start: string;
  end: string | null;
  size: number;
  sizeUnit: string;
  evidence: string;
  detectedAt: string;
  acknowledgedAt: string | null;
  acknowledgedBy: string | null;
  note: string;
}

/** Instrument alerts, newest first; by default only those not yet acknowledged. */
export async function listAlerts(prisma: PrismaClient, options: { tag?: string; includeAcknowledged?: boolean } = {}): Promise<AlertRow[]> {
  const alerts = await prisma.instrumentAlert.findMany({
    where: { ...(options.tag ? { asset: { tag: options.tag } } : {}), ...(options.includeAcknowledged ? {} : { acknowledgedAt: null }) },
    include: { asset: { select: { tag: true } } },
    orderBy: [{ start: "desc" }, { id: "desc" }],
  });
  return alerts.map((alert) => ({
    id: alert.id,
    tag: alert.asset.tag,
    role: alert.role,
    instrumentTag: alert.instrumentTag,
    kind: alert.kind,
    start: alert.start.toISOString(),
    end: alert.end?.toISOString() ?? null,
    size: alert.size,
    sizeUnit: alert.sizeUnit,
    evidence: alert.evidence,
    detectedAt: alert.detectedAt.toISOString(),
    acknowledgedAt: alert.acknowledgedAt?.toISOString() ?? null,
    acknowledgedBy: alert.acknowledgedBy,
    note: alert.note,
  }));
}
