import type { Prisma, PrismaClient } from "../../generated/prisma/client";

export interface AuditFilter {
  entity?: string;
  /** Part of the actor's name (case-insensitive), e.g. an email or "cli:". */
  actor?: string;
  entityId?: string;
  /** 1-based. */
  page?: number;
  pageSize?: number;
}

export interface AuditEventRow {
  id: number;
  at: string;
  actor: string;
  action: string;
  entity: string;
  entityId: string;
  summary: string;
}

export interface AuditPage {
  events: AuditEventRow[];
  total: number;
  page: number;
  pages: number;
  pageSize: number;
}

export const AUDIT_PAGE_SIZE = 50;

/** Audit events, newest first, filtered and paginated. */
export async function listAuditEvents(prisma: PrismaClient, filter: AuditFilter = {}): Promise<AuditPage> {
  const pageSize = Math.min(Math.max(Math.trunc(filter.pageSize ?? AUDIT_PAGE_SIZE), 1), 500);
  const where: Prisma.AuditEventWhereInput = {
    ...(filter.entity ? { entity: filter.entity } : {}),
    ...(filter.entityId ? { entityId: filter.entityId } : {}),
    ...(filter.actor ? { actor: { contains: filter.actor, mode: "insensitive" } } : {}),
  };
  const total = await prisma.auditEvent.count({ where });
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const page = Math.min(Math.max(Math.trunc(filter.page ?? 1) || 1, 1), pages);
  const rows = await prisma.auditEvent.findMany({ where, orderBy: [{ at: "desc" }, { id: "desc" }], skip: (page - 1) * pageSize, take: pageSize });
  return {
    events: rows.map((row) => ({ id: row.id, at: row.at.toISOString(), actor: row.actor, action: row.action, entity: row.entity, entityId: row.entityId, summary: row.summary })),
    total,
    page,
    pages,
    pageSize,
  };
}
