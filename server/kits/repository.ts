// Drizzle queries for kits.
import { and, asc, count, desc, eq, isNotNull, isNull, like, ne, sql } from 'drizzle-orm';
import { kit } from '@/db/schema';
import type { Db } from '../db';

export type KitRow = typeof kit.$inferSelect;
export type KitListFilter = { sort: 'name' | 'minDos' | 'residentKB' | 'updatedAt'; dir: 'asc' | 'desc'; q?: string; archived: boolean; limit: number; offset: number };

export function createKitRepository(db: Db) {
  const where = (f: Pick<KitListFilter, 'q' | 'archived'>) =>
    and(f.archived ? isNotNull(kit.archivedAt) : isNull(kit.archivedAt), f.q ? like(kit.name, `%${f.q.replace(/[%_]/g, '')}%`) : undefined);

  return {
    list(f: KitListFilter) {
      // "3.30" and "10.0" sort as text wrongly; minDos sorts by its number.
      const column = f.sort === 'minDos' ? sql`cast(${kit.minDos} as real)` : kit[f.sort];
      const items = db
        .select()
        .from(kit)
        .where(where(f))
        .orderBy(f.dir === 'desc' ? desc(column) : asc(column), asc(kit.id))
        .limit(f.limit)
        .offset(f.offset)
        .all();
      return { items, total: db.select({ n: count() }).from(kit).where(where(f)).get()!.n };
    },
    find: (id: number): KitRow | undefined => db.select().from(kit).where(eq(kit.id, id)).get(),
    nameTaken: (name: string, exceptId?: number) =>
      !!db
        .select({ id: kit.id })
        .from(kit)
        .where(and(sql`lower(${kit.name}) = lower(${name})`, exceptId ? ne(kit.id, exceptId) : undefined))
        .get(),
    insert: (values: Omit<typeof kit.$inferInsert, 'id'>): KitRow => db.insert(kit).values(values).returning().get(),
    update: (id: number, version: number, values: Partial<typeof kit.$inferInsert>): KitRow | undefined =>
      db
        .update(kit)
        .set({ ...values, updatedAt: new Date(), version: version + 1 })
        .where(and(eq(kit.id, id), eq(kit.version, version)))
        .returning()
        .get(),
  };
}
