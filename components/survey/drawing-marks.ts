// Which parts of the drawing a check concerns. A flagged part (named by an error or a warning) is drawn
// dashed with a "!" badge and the check's slug; a selected check (or part) is highlighted with its
// partners. Checks that name no part (a missing terminator) are flagged on the drawing as a whole.
import type { SurveyCheck } from '@/generators/survey/types';

export type Selection = { kind: 'check'; index: number } | { kind: 'run'; ref: string } | { kind: 'node'; ref: string } | null;

export type DrawingMarks = {
  runs: Map<string, SurveyCheck[]>;
  nodes: Map<string, SurveyCheck[]>;
  networkWide: Array<{ index: number; check: SurveyCheck }>;
};

type NodeLike = { id: string; jackId?: string };

const flags = (c: SurveyCheck) => c.severity !== 'note';

function add(map: Map<string, SurveyCheck[]>, key: string, c: SurveyCheck) {
  const list = map.get(key);
  if (list) {
    if (!list.includes(c)) list.push(c);
  } else map.set(key, [c]);
}

/** The drawing nodes a check concerns: those it names and those standing for the jacks it names. */
export function nodesOf(c: SurveyCheck, nodes: NodeLike[]): string[] {
  const ids = new Set(c.nodeIds);
  for (const n of nodes) if (n.jackId && c.jackIds.includes(n.jackId)) ids.add(n.id);
  return [...ids];
}

export function drawingMarks(checks: SurveyCheck[], nodes: NodeLike[]): DrawingMarks {
  const marks: DrawingMarks = { runs: new Map(), nodes: new Map(), networkWide: [] };
  checks.forEach((c, index) => {
    if (!flags(c)) return;
    const named = nodesOf(c, nodes);
    for (const r of c.runIds) add(marks.runs, r, c);
    for (const n of named) add(marks.nodes, n, c);
    if (c.runIds.length === 0 && named.length === 0 && c.jackIds.length === 0) marks.networkWide.push({ index, check: c });
  });
  return marks;
}

export type Highlight = { runs: Set<string>; nodes: Set<string>; checks: Set<number> };

export function highlightOf(selection: Selection, checks: SurveyCheck[], nodes: NodeLike[]): Highlight {
  const h: Highlight = { runs: new Set(), nodes: new Set(), checks: new Set() };
  if (!selection) return h;
  if (selection.kind === 'check') {
    const c = checks[selection.index];
    if (!c) return h;
    h.checks.add(selection.index);
    c.runIds.forEach((r) => h.runs.add(r));
    nodesOf(c, nodes).forEach((n) => h.nodes.add(n));
    return h;
  }
  if (selection.kind === 'run') {
    h.runs.add(selection.ref);
    checks.forEach((c, i) => c.runIds.includes(selection.ref) && h.checks.add(i));
    return h;
  }
  h.nodes.add(selection.ref);
  checks.forEach((c, i) => nodesOf(c, nodes).includes(selection.ref) && h.checks.add(i));
  return h;
}

/** The badge text beside a flagged part: its first check's slug, and how many more. */
export function flagLabel(list: SurveyCheck[]): string {
  return list.length === 1 ? list[0].slug : `${list[0].slug} +${list.length - 1}`;
}
