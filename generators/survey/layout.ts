/**
 * Positions for drawing the network: a tree layered from the chosen centre (or the punch-down block),
 * one row per step away from it, leaves side by side and each parent centred over its children.
 * Parts not joined to the rest stand to the right. Runs that close a loop are drawn by the screen as
 * extra lines between the placed nodes. Deterministic: the same survey gives the same drawing.
 */
import { cleanSurvey } from './clean-input';
import { buildGraph, spanningForest, type Forest } from './graph';
import type { SurveyInput } from './types';

export const LAYOUT_COLUMN_GAP = 120;
export const LAYOUT_ROW_GAP = 100;
export const LAYOUT_MARGIN = 60;

export interface SurveyDrawing {
  nodes: Array<{ id: string; x: number; y: number }>;
  size: { width: number; height: number };
}

function childrenOf(forest: Forest): Map<string, string[]> {
  const children = new Map<string, string[]>();
  for (const component of forest.components) {
    for (const id of component) {
      const step = forest.up.get(id);
      if (!step) continue;
      const siblings = children.get(step.parent);
      if (siblings) siblings.push(id);
      else children.set(step.parent, [id]);
    }
  }
  return children;
}

/**
 * Gives each leaf the next column and each parent the middle of its children; returns the columns used.
 * Walks with its own stack, so a very long chain cannot overflow the call stack.
 */
function place(root: string, children: Map<string, string[]>, firstColumn: number, column: Map<string, number>): number {
  let next = firstColumn;
  const stack: Array<{ id: string; expanded: boolean }> = [{ id: root, expanded: false }];
  while (stack.length > 0) {
    const top = stack.pop()!;
    const kids = children.get(top.id) ?? [];
    if (kids.length === 0) {
      column.set(top.id, next);
      next += 1;
    } else if (top.expanded) {
      column.set(top.id, (column.get(kids[0])! + column.get(kids[kids.length - 1])!) / 2);
    } else {
      stack.push({ id: top.id, expanded: true });
      for (let i = kids.length - 1; i >= 0; i -= 1) stack.push({ id: kids[i], expanded: false });
    }
  }
  return next - firstColumn;
}

export function layoutSurvey(input: SurveyInput): SurveyDrawing {
  const { survey } = cleanSurvey(input);
  const graph = buildGraph(survey);
  const blocks = survey.nodes.filter((n) => n.kind === 'block').map((n) => n.id);
  const forest = spanningForest(graph, survey.centreNodeId !== null ? [survey.centreNodeId, ...blocks] : blocks);
  const children = childrenOf(forest);
  const column = new Map<string, number>();
  let columns = 0;
  for (const component of forest.components) columns += place(component[0], children, columns, column);
  const nodes = survey.nodes.map((n) => ({
    id: n.id,
    x: LAYOUT_MARGIN + column.get(n.id)! * LAYOUT_COLUMN_GAP,
    y: LAYOUT_MARGIN + forest.depth.get(n.id)! * LAYOUT_ROW_GAP,
  }));
  const rows = survey.nodes.reduce((most, n) => Math.max(most, forest.depth.get(n.id)! + 1), 0);
  return {
    nodes,
    size: {
      width: 2 * LAYOUT_MARGIN + Math.max(0, columns - 1) * LAYOUT_COLUMN_GAP,
      height: 2 * LAYOUT_MARGIN + Math.max(0, rows - 1) * LAYOUT_ROW_GAP,
    },
  };
}
