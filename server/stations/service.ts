// Stations and their profiles: directory, read, create, update and archive (optimistic locking), profile
// drafts saved by the wizard on every step.
import { stationCreateSchema, type ProfileWriteInput, type StationCreateInput, type StationUpdateInput } from '@/db/requests/stations';
import { eq } from 'drizzle-orm';
import { station, user } from '@/db/schema';
import type { AppContext } from '../context';
import { badRequest, conflict, HttpError, notFound } from '../http/errors';
import type { SessionUser } from '../http/require-role';
import { createKitRepository } from '../kits/repository';
import { nextFreeNumbers } from '../sites/next-number';
import { createSiteRepository } from '../sites/repository';
import { isUniqueViolation } from '../sites/unique';
import { directoryRows, filterAndSort } from './directory';
import { createStationRepository, type StationRow } from './repository';

type ListFilter = Parameters<typeof filterAndSort>[1] & { limit: number; offset: number };

const stale = (what: string, version: number) =>
  conflict(`This ${what} was changed by someone else (now version ${version}). Reload it and make your change again.`, 'stale');

export function createStationService(ctx: AppContext) {
  const repo = createStationRepository(ctx.db);
  const sites = createSiteRepository(ctx.db);
  const kits = createKitRepository(ctx.db);

  function site(id: number) {
    const row = sites.find(id);
    if (!row) throw notFound('That site');
    return row;
  }

  function get(id: number): StationRow {
    const row = repo.find(id);
    if (!row) throw notFound('That station');
    return row;
  }

  /** 409 with the field named when another station of the site holds the name or number. */
  function assertFree(siteId: number, name: string | undefined, number: number | undefined, exceptId?: number) {
    const fields: Record<string, string> = {};
    const byName = name ? repo.byName(siteId, name) : undefined;
    if (byName && byName.id !== exceptId) fields.name = `${byName.name} is already station ${byName.number} at this site.`;
    const byNumber = number !== undefined ? repo.byNumber(siteId, number) : undefined;
    if (byNumber && byNumber.id !== exceptId) fields.number = `Number ${number} already belongs to ${byNumber.name}${byNumber.archivedAt ? ' (archived)' : ''}.`;
    if (Object.keys(fields).length) throw new HttpError(409, 'taken', Object.values(fields).join(' '), fields);
  }

  function assertKit(kitId: number | null | undefined) {
    if (kitId && !kits.find(kitId)) throw badRequest('That kit was not found.', { kitId: 'That kit was not found.' });
  }

  function create(actor: SessionUser, input: StationCreateInput) {
    const v = stationCreateSchema.parse(input);
    const s = site(v.siteId);
    assertFree(s.id, v.name, v.number);
    assertKit(v.kitId);
    const now = new Date();
    try {
      const row = ctx.db.transaction(() => {
        const st = repo.insert({ siteId: s.id, kind: v.kind, name: v.name, number: v.number, location: v.location, notes: v.notes, createdAt: now, updatedAt: now });
        if (st.kind === 'pc') repo.insertProfile({ stationId: st.id, data: {}, kitId: v.kitId ?? null, wizardStep: 'dos', updatedBy: actor.id, updatedAt: now });
        return st;
      });
      ctx.audit.record(actor, { action: 'station.create', entity: 'station', entityId: row.id, siteId: s.id, details: { name: row.name, number: row.number, kind: row.kind } });
      return row;
    } catch (err) {
      if (isUniqueViolation(err)) throw conflict('Another station of this site took that name or number a moment ago.', 'taken');
      throw err;
    }
  }

  function update(actor: SessionUser, id: number, input: StationUpdateInput) {
    const current = get(id);
    const { version, ...values } = input;
    assertFree(current.siteId, values.name, values.number, id);
    let row: StationRow | undefined;
    try {
      row = repo.update(id, version, values);
    } catch (err) {
      if (isUniqueViolation(err)) throw conflict('Another station of this site took that name or number a moment ago.', 'taken');
      throw err;
    }
    if (!row) throw stale('station', get(id).version);
    ctx.audit.record(actor, { action: 'station.update', entity: 'station', entityId: id, siteId: row.siteId, details: { fields: Object.keys(values) } });
    return row;
  }

  function setArchived(actor: SessionUser, id: number, version: number, archived: boolean) {
    const row = repo.update(id, version, { archivedAt: archived ? new Date() : null });
    if (!row) throw stale('station', get(id).version);
    ctx.audit.record(actor, { action: archived ? 'station.archive' : 'station.restore', entity: 'station', entityId: id, siteId: row.siteId });
    return row;
  }

  function list(siteId: number, f: ListFilter) {
    const s = site(siteId);
    const all = directoryRows(repo, s.id);
    // A site has at most a few hundred stations, so sorting on derived columns (DOS, status) in memory is cheap.
    const rows = filterAndSort(all, f);
    const nextNumbers = nextFreeNumbers(s.numberRanges, all.map((r) => r.number));
    return { items: rows.slice(f.offset, f.offset + f.limit), total: rows.length, limit: f.limit, offset: f.offset, nextNumbers };
  }

  function detail(id: number) {
    const st = get(id);
    const s = site(st.siteId);
    const p = repo.profile(id) ?? null;
    const files = repo.files(id);
    const current = (kind: string) => files.find((f) => f.kind === kind) ?? null;
    const { userId, ...station } = st;
    return {
      station: { ...station, linkedUser: userId !== null },
      site: { id: s.id, name: s.name, numberRanges: s.numberRanges },
      profile: p && { data: p.data, kitId: p.kitId, wizardStep: p.wizardStep, version: p.version, updatedAt: p.updatedAt },
      files: { autoexec: current('AUTOEXEC.BAT'), config: current('CONFIG.SYS') },
    };
  }

  function writeProfile(actor: SessionUser, id: number, input: ProfileWriteInput) {
    const st = get(id);
    if (st.kind !== 'pc') throw badRequest('Only PC stations have a machine profile.');
    assertKit(input.kitId);
    const values = { data: input.data, kitId: input.kitId, wizardStep: input.wizardStep, updatedBy: actor.id };
    const existing = repo.profile(id);
    let row;
    if (!existing) {
      if (input.version !== 0) throw stale('profile', 0);
      row = repo.insertProfile({ stationId: id, ...values, updatedAt: new Date() });
    } else {
      row = repo.updateProfile(id, input.version, values);
      if (!row) throw stale('profile', existing.version);
    }
    ctx.audit.record(actor, { action: 'profile.update', entity: 'profile', entityId: id, siteId: st.siteId, details: { step: input.wizardStep, kitId: input.kitId } });
    return { data: row.data, kitId: row.kitId, wizardStep: row.wizardStep, version: row.version, updatedAt: row.updatedAt };
  }

  /** An office user sees only the station linked to them; each has at most one. */
  function linkUser(actor: SessionUser, id: number, input: { version: number; email: string | null }) {
    const st = get(id);
    let userId: string | null = null;
    if (input.email) {
      const person = ctx.db.select().from(user).where(eq(user.email, input.email)).get();
      if (!person || person.role !== 'user') {
        throw badRequest('No office user has that e-mail address.', { email: 'No account with the role “office user” has that e-mail address.' });
      }
      const other = ctx.db.select().from(station).where(eq(station.userId, person.id)).get();
      if (other && other.id !== id) throw new HttpError(409, 'taken', `${person.name} is already linked to station ${other.name}.`, { email: `Already linked to ${other.name}.` });
      userId = person.id;
    }
    const row = repo.update(id, input.version, { userId });
    if (!row) throw stale('station', get(id).version);
    ctx.audit.record(actor, { action: userId ? 'station.link-user' : 'station.unlink-user', entity: 'station', entityId: id, siteId: st.siteId, details: { userId } });
    return { id, version: row.version, linkedUser: userId !== null };
  }

  return { get, create, update, setArchived, list, detail, writeProfile, linkUser, repo };
}

export type StationService = ReturnType<typeof createStationService>;
