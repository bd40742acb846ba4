// Jacks and the pair readings taken at them. A reading records who took it and when (the signed-in
// account, now); its voltages are stored as the text typed.
import type { z } from 'zod';
import {
  readingQuestions, type jackCreateSchema, type jackUpdateSchema, type readingCreateSchema, type readingUpdateSchema,
} from '@/db/requests/survey';
import type { SessionUser } from '../http/require-role';
import { JACK_REF_PREFIX, nextRef } from './refs';
import type { SurveyKit } from './service-kit';
import { jackRow, readingRow } from './to-input';

type JackCreate = z.output<typeof jackCreateSchema>;
type JackUpdate = z.output<typeof jackUpdateSchema>;
type ReadingCreate = z.output<typeof readingCreateSchema>;
type ReadingUpdate = z.output<typeof readingUpdateSchema>;

export function jackEdits(kit: SurveyKit) {
  const { repo } = kit;

  function createJack(actor: SessionUser, siteId: number, input: JackCreate) {
    kit.siteOr404(siteId);
    const ref = input.ref ?? nextRef(JACK_REF_PREFIX, repo.refsIn('jack', siteId));
    kit.refFree('jack', siteId, ref);
    const now = new Date();
    const row = repo.insert('jack', { siteId, ref, label: input.label, room: input.room, station: input.station, createdAt: now, updatedAt: now });
    kit.record(actor, 'create', 'jack', siteId, row.id, { ref, label: row.label, room: row.room, station: row.station });
    return jackRow(row);
  }

  function updateJack(actor: SessionUser, siteId: number, id: number, input: JackUpdate) {
    const before = kit.owned('jack', siteId, id);
    const { version, ...changes } = input;
    if (changes.ref !== undefined) kit.refFree('jack', siteId, changes.ref, before.ref);
    const row = repo.update('jack', id, version, changes) ?? kit.stale();
    kit.record(actor, 'update', 'jack', siteId, id, { ref: row.ref, changes });
    return jackRow(row);
  }

  /** Its readings go with it (they were taken at this jack); nodes standing for it lose the link. */
  function deleteJack(actor: SessionUser, siteId: number, id: number, version: number) {
    const before = kit.owned('jack', siteId, id);
    if (before.version !== version) kit.stale();
    const { readings, unlinked } = repo.transaction(() => {
      const counts = { readings: repo.deleteReadingsOfJack(id), unlinked: repo.unlinkJackNodes(id) };
      if (!repo.remove('jack', id, version)) kit.stale();
      return counts;
    });
    kit.record(actor, 'delete', 'jack', siteId, id, { ref: before.ref, label: before.label, readingsDeleted: readings, nodesUnlinked: unlinked });
    return { id, readingsDeleted: readings, nodesUnlinked: unlinked };
  }

  function createReading(actor: SessionUser, siteId: number, jackId: number, input: ReadingCreate) {
    const jack = kit.owned('jack', siteId, jackId);
    kit.ask(readingQuestions(input), input.confirmed);
    const now = new Date();
    const row = repo.insert('reading', {
      siteId, jackId, pair: input.pair, vdcVolts: input.vdc, vacVolts: input.vac, continuity: input.continuity,
      testedBy: actor.id, testedByName: actor.name, testedAt: now, createdAt: now, updatedAt: now,
    });
    kit.record(actor, 'create', 'reading', siteId, row.id, {
      jack: jack.ref, pair: row.pair, vdc: row.vdcVolts, vac: row.vacVolts, continuity: row.continuity, confirmed: input.confirmed,
    });
    return readingRow(row);
  }

  /** A correction of a typing slip keeps who took the reading and when; the audit trail says who corrected it. */
  function updateReading(actor: SessionUser, siteId: number, id: number, input: ReadingUpdate) {
    const before = kit.owned('reading', siteId, id);
    kit.ask(readingQuestions(input), input.confirmed);
    const row = repo.update('reading', id, input.version, {
      pair: input.pair, vdcVolts: input.vdc, vacVolts: input.vac, continuity: input.continuity,
    }) ?? kit.stale();
    kit.record(actor, 'update', 'reading', siteId, id, {
      before: { pair: before.pair, vdc: before.vdcVolts, vac: before.vacVolts, continuity: before.continuity },
      after: { pair: row.pair, vdc: row.vdcVolts, vac: row.vacVolts, continuity: row.continuity },
      confirmed: input.confirmed,
    });
    return readingRow(row);
  }

  function deleteReading(actor: SessionUser, siteId: number, id: number, version: number) {
    const before = kit.owned('reading', siteId, id);
    if (!repo.remove('reading', id, version)) kit.stale();
    kit.record(actor, 'delete', 'reading', siteId, id, { pair: before.pair, vdc: before.vdcVolts, vac: before.vacVolts, continuity: before.continuity });
    return { id };
  }

  return { createJack, updateJack, deleteJack, createReading, updateReading, deleteReading };
}
