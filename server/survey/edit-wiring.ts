// The network as wired: nodes (block, jack, splitter, adapter), the cable runs between them, terminators,
// and the survey's settings (centre of the star, network pair). The rules of the trade are not enforced
// here (a too-long spoke can be recorded; the checks flag it); only references and unlikely values are.
import type { z } from 'zod';
import {
  runQuestions, terminatorQuestions,
  type nodeCreateSchema, type nodeUpdateSchema, type runCreateSchema, type runUpdateSchema, type settingsUpdateSchema,
  type terminatorCreateSchema, type terminatorUpdateSchema,
} from '@/db/requests/survey';
import { badRequest, conflict } from '../http/errors';
import type { SessionUser } from '../http/require-role';
import { NODE_REF_PREFIX, RUN_REF_PREFIX, nextRef } from './refs';
import type { SurveyKit } from './service-kit';
import { nodeRow, runRow, settingsRow, terminatorRow } from './to-input';

type NodeCreate = z.output<typeof nodeCreateSchema>;
type NodeUpdate = z.output<typeof nodeUpdateSchema>;
type RunCreate = z.output<typeof runCreateSchema>;
type RunUpdate = z.output<typeof runUpdateSchema>;
type TerminatorCreate = z.output<typeof terminatorCreateSchema>;
type TerminatorUpdate = z.output<typeof terminatorUpdateSchema>;
type SettingsUpdate = z.output<typeof settingsUpdateSchema>;

export function wiringEdits(kit: SurveyKit) {
  const { repo } = kit;

  /** A node named in a body must be one of this site's; otherwise the field is wrong (400), not the URL. */
  function nodeOfSite(siteId: number, id: number, field: string) {
    const node = repo.get('node', id);
    if (!node || node.siteId !== siteId) throw badRequest('That point is not in this survey.', { [field]: 'Not a point of this survey.' });
    return node;
  }

  function checkJackLink(siteId: number, kind: string, jackId: number | null | undefined) {
    if (jackId === null || jackId === undefined) return;
    if (kind !== 'jack') throw badRequest('Only a wall-jack point stands for a surveyed jack.', { jackId: 'Only for a wall jack.' });
    const jack = repo.get('jack', jackId);
    if (!jack || jack.siteId !== siteId) throw badRequest('That jack is not in this survey.', { jackId: 'Not a jack of this survey.' });
  }

  function createNode(actor: SessionUser, siteId: number, input: NodeCreate) {
    kit.siteOr404(siteId);
    checkJackLink(siteId, input.kind, input.jackId);
    const ref = input.ref ?? nextRef(NODE_REF_PREFIX[input.kind], repo.refsIn('node', siteId));
    kit.refFree('node', siteId, ref);
    const now = new Date();
    const row = repo.insert('node', { siteId, ref, kind: input.kind, label: input.label, jackId: input.jackId ?? null, createdAt: now, updatedAt: now });
    kit.record(actor, 'create', 'node', siteId, row.id, { ref, kind: row.kind, label: row.label, jackId: row.jackId });
    return nodeRow(row);
  }

  function updateNode(actor: SessionUser, siteId: number, id: number, input: NodeUpdate) {
    const before = kit.owned('node', siteId, id);
    const { version, ...changes } = input;
    const kind = changes.kind ?? before.kind;
    const jackId = changes.jackId === undefined ? before.jackId : changes.jackId;
    // A point that stops being a wall jack drops its jack link rather than keep a link that means nothing.
    if (kind !== 'jack' && changes.jackId === undefined) changes.jackId = null;
    else checkJackLink(siteId, kind, jackId);
    if (changes.ref !== undefined) kit.refFree('node', siteId, changes.ref, before.ref);
    const row = repo.update('node', id, version, changes) ?? kit.stale();
    kit.record(actor, 'update', 'node', siteId, id, { ref: row.ref, changes });
    return nodeRow(row);
  }

  /** Refused while runs or a terminator use the point: the technician removes those first, on purpose. */
  function deleteNode(actor: SessionUser, siteId: number, id: number, version: number) {
    const before = kit.owned('node', siteId, id);
    const runs = repo.runsAtNode(id);
    const terminators = repo.terminatorsAtNode(id);
    if (runs.length > 0 || terminators.length > 0) {
      const what = [runs.length ? `run(s) ${runs.join(', ')}` : '', terminators.length ? `${terminators.length} terminator(s)` : ''].filter(Boolean);
      throw conflict(`${before.label} still has ${what.join(' and ')}; remove them first.`, 'node_in_use');
    }
    const centreCleared = repo.transaction(() => {
      const cleared = repo.clearCentre(siteId, id);
      if (!repo.remove('node', id, version)) kit.stale();
      return cleared > 0;
    });
    kit.record(actor, 'delete', 'node', siteId, id, { ref: before.ref, kind: before.kind, label: before.label, centreCleared });
    return { id, centreCleared };
  }

  function runKind(input: { kind?: 'wall' | 'cord' | null }, from: { kind: string }, to: { kind: string }): 'wall' | 'cord' {
    if (input.kind) return input.kind;
    return from.kind === 'adapter' || to.kind === 'adapter' ? 'cord' : 'wall';
  }

  function createRun(actor: SessionUser, siteId: number, input: RunCreate) {
    kit.siteOr404(siteId);
    const from = nodeOfSite(siteId, input.fromNodeId, 'fromNodeId');
    const to = nodeOfSite(siteId, input.toNodeId, 'toNodeId');
    kit.ask(runQuestions(input), input.confirmed);
    const ref = input.ref ?? nextRef(RUN_REF_PREFIX[runKind(input, from, to)], repo.refsIn('run', siteId));
    kit.refFree('run', siteId, ref);
    const now = new Date();
    const row = repo.insert('run', {
      siteId, ref, fromNodeId: from.id, toNodeId: to.id, lengthFt: input.lengthFt, gauge: input.gauge, reverses: input.reverses,
      kind: input.kind ?? null, createdAt: now, updatedAt: now,
    });
    kit.record(actor, 'create', 'run', siteId, row.id, {
      ref, from: from.ref, to: to.ref, lengthFt: row.lengthFt, gauge: row.gauge, reverses: row.reverses, kind: row.kind, confirmed: input.confirmed,
    });
    return runRow(row);
  }

  function updateRun(actor: SessionUser, siteId: number, id: number, input: RunUpdate) {
    const before = kit.owned('run', siteId, id);
    const { version, confirmed, ...changes } = input;
    const fromId = changes.fromNodeId ?? before.fromNodeId;
    const toId = changes.toNodeId ?? before.toNodeId;
    if (changes.fromNodeId !== undefined) nodeOfSite(siteId, changes.fromNodeId, 'fromNodeId');
    if (changes.toNodeId !== undefined) nodeOfSite(siteId, changes.toNodeId, 'toNodeId');
    if (fromId === toId) throw badRequest('A run joins two different points.', { toNodeId: 'A run joins two different points.' });
    // Only a changed length is questioned; one confirmed before is not asked about again.
    if (changes.lengthFt !== undefined && changes.lengthFt !== before.lengthFt) kit.ask(runQuestions({ lengthFt: changes.lengthFt }), confirmed);
    if (changes.ref !== undefined) kit.refFree('run', siteId, changes.ref, before.ref);
    const row = repo.update('run', id, version, changes) ?? kit.stale();
    kit.record(actor, 'update', 'run', siteId, id, {
      ref: row.ref, before: { lengthFt: before.lengthFt, gauge: before.gauge, reverses: before.reverses, kind: before.kind }, changes, confirmed,
    });
    return runRow(row);
  }

  function deleteRun(actor: SessionUser, siteId: number, id: number, version: number) {
    const before = kit.owned('run', siteId, id);
    if (!repo.remove('run', id, version)) kit.stale();
    kit.record(actor, 'delete', 'run', siteId, id, { ref: before.ref, lengthFt: before.lengthFt, gauge: before.gauge });
    return { id };
  }

  function createTerminator(actor: SessionUser, siteId: number, input: TerminatorCreate) {
    kit.siteOr404(siteId);
    const node = nodeOfSite(siteId, input.nodeId, 'nodeId');
    kit.ask(terminatorQuestions(input), input.confirmed);
    const now = new Date();
    const row = repo.insert('terminator', { siteId, nodeId: node.id, ohms: input.ohms, createdAt: now, updatedAt: now });
    kit.record(actor, 'create', 'terminator', siteId, row.id, { node: node.ref, ohms: row.ohms, confirmed: input.confirmed });
    return terminatorRow(row);
  }

  function updateTerminator(actor: SessionUser, siteId: number, id: number, input: TerminatorUpdate) {
    const before = kit.owned('terminator', siteId, id);
    const { version, confirmed, ...changes } = input;
    if (changes.nodeId !== undefined) nodeOfSite(siteId, changes.nodeId, 'nodeId');
    if (changes.ohms !== undefined && changes.ohms !== before.ohms) kit.ask(terminatorQuestions({ ohms: changes.ohms }), confirmed);
    const row = repo.update('terminator', id, version, changes) ?? kit.stale();
    kit.record(actor, 'update', 'terminator', siteId, id, { before: { nodeId: before.nodeId, ohms: before.ohms }, changes, confirmed });
    return terminatorRow(row);
  }

  function deleteTerminator(actor: SessionUser, siteId: number, id: number, version: number) {
    const before = kit.owned('terminator', siteId, id);
    if (!repo.remove('terminator', id, version)) kit.stale();
    kit.record(actor, 'delete', 'terminator', siteId, id, { nodeId: before.nodeId, ohms: before.ohms });
    return { id };
  }

  function updateSettings(actor: SessionUser, siteId: number, input: SettingsUpdate) {
    kit.siteOr404(siteId);
    if (input.centreNodeId !== undefined && input.centreNodeId !== null) nodeOfSite(siteId, input.centreNodeId, 'centreNodeId');
    const { version, ...changes } = input;
    const existing = repo.settings(siteId);
    let row;
    if (version === 0) {
      if (existing) kit.stale();
      const now = new Date();
      row = repo.insertSettings({ siteId, centreNodeId: changes.centreNodeId ?? null, networkPair: changes.networkPair ?? '', createdAt: now, updatedAt: now });
    } else {
      if (!existing) kit.stale();
      row = repo.updateSettings(siteId, version, changes) ?? kit.stale();
    }
    kit.record(actor, 'update', 'settings', siteId, siteId, { changes });
    return settingsRow(row);
  }

  return {
    createNode, updateNode, deleteNode, createRun, updateRun, deleteRun,
    createTerminator, updateTerminator, deleteTerminator, updateSettings,
  };
}
