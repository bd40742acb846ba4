/**
 * End-to-end loop resistance: the worst path the signal has to drive. Between adapters when there are two
 * or more; otherwise the longest path through the main part of the wiring (two sweeps, exact on a tree).
 */
import { forestPath, summarisePath, type Forest } from './graph';
import type { AdapterPath } from './polarity';
import type { SurveyPath } from './types';

function worse(a: SurveyPath, b: SurveyPath): boolean {
  return b.loopOhms > a.loopOhms || (b.loopOhms === a.loopOhms && b.lengthFt > a.lengthFt);
}

function farthestFrom(forest: Forest, from: string, members: string[]): SurveyPath {
  let best = summarisePath(from, from, []);
  for (const id of members) {
    const path = summarisePath(from, id, forestPath(forest, from, id)!);
    if (worse(best, path)) best = path;
  }
  return best;
}

export function endToEnd(adapterPaths: AdapterPath[], forest: Forest, main: number | null): SurveyPath | null {
  if (adapterPaths.length > 0) {
    const worst = adapterPaths.reduce((a, b) => (worse(a, b) ? b : a));
    const { even: _even, ...path } = worst;
    return path;
  }
  if (main === null || forest.components[main].length < 2) return null;
  const members = forest.components[main];
  const first = farthestFrom(forest, members[0], members);
  return farthestFrom(forest, first.toNodeId, members);
}
