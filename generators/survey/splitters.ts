/**
 * A splitter goes into a wall jack, never into an adapter. Common practice of the trade, no published
 * source. The data has no plug/socket sides, so a splitter counts as placed in a wall jack when one of its
 * runs reaches a jack node; one that reaches adapters and no jack must be plugged into an adapter.
 */
import { check } from './check';
import type { CleanSurvey } from './clean-input';
import type { Graph } from './graph';
import { labelOf } from './graph-checks';
import type { SurveyCheck } from './types';

export function splitterChecks(survey: CleanSurvey, graph: Graph): SurveyCheck[] {
  const checks: SurveyCheck[] = [];
  for (const node of survey.nodes) {
    if (node.kind !== 'splitter') continue;
    const links = graph.neighbours.get(node.id)!;
    if (links.length === 0) continue; // an unwired node is reported as disconnected
    const kinds = links.map((l) => survey.nodeById.get(l.other)!.kind);
    if (kinds.includes('jack')) continue;
    const refs = { nodeIds: [node.id, ...links.map((l) => l.other)], runIds: links.map((l) => l.edge.runId) };
    checks.push(kinds.includes('adapter')
      ? check('splitter-into-adapter', 'error',
        `Splitter ${labelOf(survey, node.id)} is joined to adapters but to no wall jack; a splitter goes into a wall jack, never into an adapter.`, refs)
      : check('splitter-not-at-wall-jack', 'error',
        `Splitter ${labelOf(survey, node.id)} is not plugged into a wall jack; a splitter goes into a wall jack.`, refs));
  }
  return checks;
}
