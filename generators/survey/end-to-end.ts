/**
 * End-to-end loop resistance: the worst path the signal has to drive. Between adapters when there are two
 * or more; otherwise the longest path through the main part of the wiring, found with two sweeps over the
 * spanning tree (exact on a tree, linear in its size).
 */
import { summarisePath, type Edge, type Forest } from './graph';
import type { AdapterPath } from './polarity';
import type { SurveyPath } from './types';

function worse(a: SurveyPath, b: SurveyPath): boolean {
  return b.loopOhms > a.loopOhms || (b.loopOhms === a.loopOhms && b.lengthFt > a.lengthFt);
}

function treeNeighbours(forest: Forest, members: string[]): Map<string, Array<{ edge: Edge; other: string }>> {
  const next = new Map<string, Array<{ edge: Edge; other: string }>>(members.map((id) => [id, []]));
  for (const id of members) {
    const step = forest.up.get(id);
    if (!step) continue;
    next.get(id)!.push({ edge: step.edge, other: step.parent });
    next.get(step.parent)!.push({ edge: step.edge, other: id });
  }
  return next;
}

/** The farthest node from `from` along the tree (loop resistance first, then length), with its path. */
function farthestFrom(from: string, tree: ReturnType<typeof treeNeighbours>): SurveyPath {
  const via = new Map<string, { edge: Edge; parent: string } | null>([[from, null]]);
  const ohms = new Map<string, number>([[from, 0]]);
  const feet = new Map<string, number>([[from, 0]]);
  const order = [from];
  let far = from;
  for (let i = 0; i < order.length; i += 1) {
    const node = order[i];
    for (const { edge, other } of tree.get(node)!) {
      if (via.has(other)) continue;
      via.set(other, { edge, parent: node });
      ohms.set(other, ohms.get(node)! + edge.loopOhms);
      feet.set(other, feet.get(node)! + edge.lengthFt);
      order.push(other);
      const better = ohms.get(other)! > ohms.get(far)! || (ohms.get(other) === ohms.get(far) && feet.get(other)! > feet.get(far)!);
      if (better) far = other;
    }
  }
  const path: Edge[] = [];
  for (let at = via.get(far); at; at = via.get(at.parent)) path.unshift(at.edge);
  return summarisePath(from, far, path);
}

export function endToEnd(adapterPaths: AdapterPath[], forest: Forest, main: number | null): SurveyPath | null {
  if (adapterPaths.length > 0) {
    const worst = adapterPaths.reduce((a, b) => (worse(a, b) ? b : a));
    const { even: _even, ...path } = worst;
    return path;
  }
  if (main === null || forest.components[main].length < 2) return null;
  const members = forest.components[main];
  const tree = treeNeighbours(forest, members);
  return farthestFrom(farthestFrom(members[0], tree).toNodeId, tree);
}
