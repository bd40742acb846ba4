// Kits: the network software and what it needs. Admins and technicians edit; staff read.
import { kitCreateSchema, type KitCreateInput, type KitUpdateInput } from '@/db/requests/kits';
import type { AppContext } from '../context';
import { conflict, HttpError, notFound } from '../http/errors';
import type { SessionUser } from '../http/require-role';
import { isUniqueViolation } from '../sites/unique';
import { createKitRepository, type KitListFilter, type KitRow } from './repository';

const nameTaken = (name: string) => {
  const message = `A kit named “${name}” exists already.`;
  return new HttpError(409, 'name_taken', message, { name: message });
};

export function createKitService(ctx: AppContext) {
  const repo = createKitRepository(ctx.db);

  function get(id: number): KitRow {
    const row = repo.find(id);
    if (!row) throw notFound('That kit');
    return row;
  }

  function versioned(id: number, version: number, values: Parameters<typeof repo.update>[2]): KitRow {
    if (values.name && repo.nameTaken(values.name, id)) throw nameTaken(values.name);
    let row: KitRow | undefined;
    try {
      row = repo.update(id, version, values);
    } catch (err) {
      if (isUniqueViolation(err)) throw nameTaken(values.name ?? '');
      throw err;
    }
    if (row) return row;
    const current = get(id);
    throw conflict(`This kit was changed by someone else (now version ${current.version}). Reload it and make your change again.`, 'stale');
  }

  return {
    list: (f: KitListFilter) => repo.list(f),
    get,
    create(actor: SessionUser, input: KitCreateInput) {
      const values = kitCreateSchema.parse(input);
      if (repo.nameTaken(values.name)) throw nameTaken(values.name);
      const now = new Date();
      let row: KitRow;
      try {
        row = repo.insert({ ...values, createdAt: now, updatedAt: now });
      } catch (err) {
        if (isUniqueViolation(err)) throw nameTaken(values.name);
        throw err;
      }
      ctx.audit.record(actor, { action: 'kit.create', entity: 'kit', entityId: row.id, details: { name: row.name } });
      return row;
    },
    update(actor: SessionUser, id: number, input: KitUpdateInput) {
      const { version, ...values } = input;
      const row = versioned(id, version, values);
      ctx.audit.record(actor, { action: 'kit.update', entity: 'kit', entityId: id, details: { fields: Object.keys(values) } });
      return row;
    },
    setArchived(actor: SessionUser, id: number, version: number, archived: boolean) {
      const row = versioned(id, version, { archivedAt: archived ? new Date() : null });
      ctx.audit.record(actor, { action: archived ? 'kit.archive' : 'kit.restore', entity: 'kit', entityId: id });
      return row;
    },
  };
}

