// Who may read one station. Staff read every station; an office user (role `user`) reads only the station
// linked to them. Another station answers 404 exactly like an unknown id, so a user learns nothing about it.
import { eq } from 'drizzle-orm';
import { station } from '@/db/schema';
import type { Db } from '../db';
import { notFound } from '../http/errors';
import type { SessionUser } from '../http/require-role';
import { STAFF } from '../roles';

type DbOrCtx = Db | { db: Db };
const dbOf = (x: DbOrCtx): Db => ('db' in x && !('select' in x) ? x.db : (x as Db));

/** The station row when `user` may read it; otherwise a 404 (never the data, never a hint it exists). */
export function assertCanReadStation(source: DbOrCtx, user: SessionUser, stationId: number) {
  const row = dbOf(source).select().from(station).where(eq(station.id, stationId)).get();
  if (!row) throw notFound('That station');
  if (STAFF.includes(user.role)) return row;
  if (user.role === 'user' && row.userId === user.id) return row;
  throw notFound('That station');
}

/** The station linked to an office user, or null. */
export function ownStationId(source: DbOrCtx, user: SessionUser): number | null {
  const row = dbOf(source).select({ id: station.id }).from(station).where(eq(station.userId, user.id)).get();
  return row?.id ?? null;
}
