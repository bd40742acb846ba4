// Writes the append-only audit trail. Every create, update, upload, plan, review, download and role change
// calls record(); nothing updates or deletes rows (the migration's triggers refuse it too).
import { and, desc, eq, gte, lte, type SQL } from 'drizzle-orm';
import { auditEvent } from '@/db/schema';
import type { Db } from '../db';
import type { SessionUser } from '../http/require-role';

export type AuditEntry = {
  action: string;
  entity: string;
  entityId?: string | number | null;
  siteId?: number | null;
  details?: Record<string, unknown>;
};

export function createAudit(db: Db) {
  return {
    record(actor: Pick<SessionUser, 'id' | 'email'> | null, entry: AuditEntry) {
      db.insert(auditEvent)
        .values({
          at: new Date(),
          actorId: actor?.id ?? null,
          actorEmail: actor?.email ?? null,
          action: entry.action,
          entity: entry.entity,
          entityId: entry.entityId == null ? null : String(entry.entityId),
          siteId: entry.siteId ?? null,
          details: entry.details ?? {},
        })
        .run();
    },
    list(filter: { action?: string; entity?: string; actorId?: string; siteId?: number; from?: Date; to?: Date; limit: number; offset: number }) {
      const where: SQL[] = [];
      if (filter.action) where.push(eq(auditEvent.action, filter.action));
      if (filter.entity) where.push(eq(auditEvent.entity, filter.entity));
      if (filter.actorId) where.push(eq(auditEvent.actorId, filter.actorId));
      if (filter.siteId) where.push(eq(auditEvent.siteId, filter.siteId));
      if (filter.from) where.push(gte(auditEvent.at, filter.from));
      if (filter.to) where.push(lte(auditEvent.at, filter.to));
      return db
        .select()
        .from(auditEvent)
        .where(where.length ? and(...where) : undefined)
        .orderBy(desc(auditEvent.id))
        .limit(filter.limit)
        .offset(filter.offset)
        .all();
    },
  };
}

export type Audit = ReturnType<typeof createAudit>;
