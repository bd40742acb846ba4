/**
 * Reads a survey that may be half-filled or wrong (it comes from a form) into a model the rules can
 * trust. Nothing here throws: every problem becomes a check, and the entry it concerns is either
 * corrected to "unknown" or left out, as the message says.
 */
import { check } from './check';
import { isGauge } from './gauge';
import type {
  Continuity, Gauge, NodeKind, PairTest, RunKind, SurveyCheck, SurveyJack, SurveyNode, Terminator,
} from './types';

export interface CleanRun {
  id: string;
  from: string;
  to: string;
  kind: RunKind;
  lengthFt: number | null;
  gauge: Gauge | null;
  reverses: boolean;
  /** Both ends are known nodes and the id is not a duplicate. */
  inGraph: boolean;
}

export interface CleanSurvey {
  siteName: string;
  jacks: SurveyJack[];
  pairTests: PairTest[];
  nodes: SurveyNode[];
  nodeById: Map<string, SurveyNode>;
  runs: CleanRun[];
  terminators: Terminator[];
  centreNodeId: string | null;
  networkPair: string | null;
}

const NODE_KINDS: readonly NodeKind[] = ['block', 'jack', 'splitter', 'adapter'];
const CONTINUITY: readonly Continuity[] = ['good', 'open', 'short'];

type Raw = Record<string, unknown>;

function isRecord(value: unknown): value is Raw {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function list(value: unknown): unknown[] {
  return Array.isArray(value) ? value : [];
}

function text(value: unknown): string {
  return typeof value === 'string' ? value : value === undefined || value === null ? '' : String(value);
}

function optionalText(value: unknown): string | undefined {
  return value === undefined || value === null ? undefined : text(value);
}

function usableId(value: unknown): value is string {
  return typeof value === 'string' && value.trim() !== '';
}

/** Keeps entries that are objects with a fresh, non-empty id; reports the others. */
function entries(raw: unknown, what: string, checks: SurveyCheck[]): Raw[] {
  const seen = new Set<string>();
  const kept: Raw[] = [];
  list(raw).forEach((entry, index) => {
    if (!isRecord(entry) || !usableId(entry.id)) {
      checks.push(check('entry-invalid', 'error', `${what} number ${index + 1} has no usable id and is left out.`));
      return;
    }
    if (seen.has(entry.id)) {
      checks.push(check('duplicate-id', 'error', `${what} id "${entry.id}" is used more than once; only the first is used.`));
      return;
    }
    seen.add(entry.id);
    kept.push(entry);
  });
  return kept;
}

function reading(value: unknown): number | null {
  if (value === null || value === undefined || value === '') return null;
  return typeof value === 'number' ? value : Number.NaN;
}

function cleanJacks(raw: unknown, checks: SurveyCheck[]): SurveyJack[] {
  return entries(raw, 'Jack', checks).map((j) => ({
    id: j.id as string,
    label: text(j.label),
    room: optionalText(j.room),
    station: optionalText(j.station),
  }));
}

function cleanPairTests(raw: unknown, checks: SurveyCheck[]): PairTest[] {
  return entries(raw, 'Pair test', checks).map((t) => {
    const continuity = CONTINUITY.includes(t.continuity as Continuity) ? (t.continuity as Continuity) : null;
    if (continuity === null && t.continuity !== null && t.continuity !== undefined) {
      checks.push(check('reading-invalid', 'warning',
        `Pair test ${String(t.id)}: continuity "${text(t.continuity)}" is not good, open or short; it is treated as not measured.`,
        { jackIds: usableId(t.jackId) ? [t.jackId] : [] }));
    }
    return {
      id: t.id as string,
      jackId: text(t.jackId),
      pair: text(t.pair),
      vdc: reading(t.vdc),
      vac: reading(t.vac),
      continuity,
      by: optionalText(t.by),
      at: optionalText(t.at),
    };
  });
}

function cleanNodes(raw: unknown, jackIds: Set<string>, checks: SurveyCheck[]): SurveyNode[] {
  const nodes: SurveyNode[] = [];
  for (const n of entries(raw, 'Node', checks)) {
    const id = n.id as string;
    if (!NODE_KINDS.includes(n.kind as NodeKind)) {
      checks.push(check('node-bad-kind', 'error',
        `Node ${id} has kind "${text(n.kind)}"; a node is a block, jack, splitter or adapter. It is left out.`,
        { nodeIds: [id] }));
      continue;
    }
    const jackId = optionalText(n.jackId);
    if (jackId !== undefined && !jackIds.has(jackId)) {
      checks.push(check('node-unknown-jack', 'warning', `Node ${id} names jack "${jackId}", which is not in the survey.`,
        { nodeIds: [id] }));
    }
    nodes.push({ id, kind: n.kind as NodeKind, label: text(n.label), jackId });
  }
  return nodes;
}

function cleanLength(value: unknown): number | null {
  return typeof value === 'number' && Number.isFinite(value) && value >= 0 ? value : null;
}

function cleanRun(r: Raw, nodeById: Map<string, SurveyNode>, checks: SurveyCheck[]): CleanRun {
  const id = r.id as string;
  const from = text(r.from);
  const to = text(r.to);
  const missing = [from, to].filter((end) => !nodeById.has(end));
  if (missing.length > 0) {
    checks.push(check('run-unknown-node', 'error',
      `Run ${id} names ${missing.map((m) => `"${m}"`).join(' and ')}, not a node of the survey; it is left out of the drawing and the paths.`,
      { runIds: [id] }));
  }
  const lengthFt = cleanLength(r.lengthFt);
  if (lengthFt === null) {
    checks.push(check('run-bad-length', 'error',
      `Run ${id} has length "${text(r.lengthFt)}"; a length is a number of feet, zero or more. It is left out of the totals.`,
      { runIds: [id] }));
  }
  const gauge = isGauge(r.gauge) ? r.gauge : null;
  if (gauge === null) {
    checks.push(check('run-bad-gauge', 'error',
      `Run ${id} has gauge "${text(r.gauge)}"; only 22, 24 and 26 AWG are known, so its resistance is unknown.`,
      { runIds: [id] }));
  }
  const touchesAdapter = [from, to].some((end) => nodeById.get(end)?.kind === 'adapter');
  const kind: RunKind = r.kind === 'wall' || r.kind === 'cord' ? r.kind : touchesAdapter ? 'cord' : 'wall';
  return { id, from, to, kind, lengthFt, gauge, reverses: r.reverses === true, inGraph: missing.length === 0 };
}

function cleanTerminators(raw: unknown, nodeById: Map<string, SurveyNode>, checks: SurveyCheck[]): Terminator[] {
  const kept: Terminator[] = [];
  for (const t of entries(raw, 'Terminator', checks)) {
    const id = t.id as string;
    const nodeId = text(t.nodeId);
    const ohms = typeof t.ohms === 'number' ? t.ohms : Number.NaN;
    if (!nodeById.has(nodeId)) {
      checks.push(check('terminator-unknown-node', 'error',
        `Terminator ${id} is placed at "${nodeId}", not a node of the survey; it is not counted.`));
      continue;
    }
    kept.push({ id, nodeId, ohms });
  }
  return kept;
}

function cleanCentre(value: unknown, nodeById: Map<string, SurveyNode>, checks: SurveyCheck[]): string | null {
  if (value === null || value === undefined || value === '') return null;
  const id = text(value);
  if (nodeById.has(id)) return id;
  checks.push(check('centre-unknown', 'error', `The chosen centre "${id}" is not a node of the survey.`));
  return null;
}

/** The survey with every entry checked, and the checks that reading it raised. */
export function cleanSurvey(input: unknown): { survey: CleanSurvey; checks: SurveyCheck[] } {
  const checks: SurveyCheck[] = [];
  const raw: Raw = isRecord(input) ? input : {};
  const jacks = cleanJacks(raw.jacks, checks);
  const pairTests = cleanPairTests(raw.pairTests, checks);
  const nodes = cleanNodes(raw.nodes, new Set(jacks.map((j) => j.id)), checks);
  const nodeById = new Map(nodes.map((n) => [n.id, n]));
  const runs = entries(raw.runs, 'Run', checks).map((r) => cleanRun(r, nodeById, checks));
  const terminators = cleanTerminators(raw.terminators, nodeById, checks);
  const centreNodeId = cleanCentre(raw.centreNodeId, nodeById, checks);
  const networkPair = typeof raw.networkPair === 'string' && raw.networkPair.trim() !== '' ? raw.networkPair : null;
  const survey: CleanSurvey = {
    siteName: text(raw.siteName), jacks, pairTests, nodes, nodeById, runs, terminators, centreNodeId, networkPair,
  };
  return { survey, checks };
}

