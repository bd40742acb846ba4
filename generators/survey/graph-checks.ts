/**
 * Sanity of the wiring as a whole: loops (a cycle of runs) and parts not joined to the rest.
 * Both are plain graph facts; the messages say what they mean for a network on one pair.
 */
import { check } from './check';
import type { CleanSurvey } from './clean-input';
import { forestPath, type Forest, type Graph } from './graph';
import type { SurveyCheck } from './types';

/** The component the network is judged on: the centre's, else the largest (the first of equals). */
export function mainComponent(forest: Forest, centreNodeId: string | null): number | null {
  if (forest.components.length === 0) return null;
  // The centre's part, unless the centre is not wired yet: then the wiring elsewhere is the network.
  const centrePart = centreNodeId === null ? undefined : forest.componentOf.get(centreNodeId);
  if (centrePart !== undefined && forest.components[centrePart].length > 1) return centrePart;
  let best = 0;
  forest.components.forEach((c, i) => {
    if (c.length > forest.components[best].length) best = i;
  });
  return best;
}

export function loopChecks(forest: Forest): SurveyCheck[] {
  return forest.loopClosers.map((closer) => {
    const around = [...(forestPath(forest, closer.a, closer.b) ?? []), closer];
    const runIds = around.map((e) => e.runId);
    const nodeIds = [...new Set(around.flatMap((e) => [e.a, e.b]))];
    const reversals = around.filter((e) => e.reverses).length;
    const polarity = reversals % 2 === 1
      ? ' The loop also has an odd number of reversals, so the two circuits of the pair are joined to each other.'
      : '';
    return check('wiring-loop', 'error',
      `Runs ${runIds.join(', ')} form a loop. The network pair must be a tree of runs (no ring); open one run of the loop.${polarity}`,
      { runIds, nodeIds });
  });
}

export function disconnectedChecks(survey: CleanSurvey, forest: Forest, main: number | null): SurveyCheck[] {
  if (main === null || forest.components.length < 2) return [];
  const cutOff = forest.components.filter((_, i) => i !== main).flat();
  const adapters = cutOff.filter((id) => survey.nodeById.get(id)?.kind === 'adapter');
  const jackIds = cutOff.map((id) => survey.nodeById.get(id)?.jackId).filter((j): j is string => j !== undefined);
  const names = cutOff.map((id) => labelOf(survey, id)).join(', ');
  return [check('wiring-disconnected', adapters.length > 0 ? 'error' : 'warning',
    `Not joined to the rest of the wiring: ${names}.` +
      (adapters.length > 0 ? ' Adapters there cannot reach the others.' : ''),
    { nodeIds: cutOff, jackIds })];
}

export function labelOf(survey: CleanSurvey, nodeId: string): string {
  const label = survey.nodeById.get(nodeId)?.label ?? '';
  return label !== '' && label !== nodeId ? `${label} (${nodeId})` : nodeId;
}

export function graphChecks(survey: CleanSurvey, graph: Graph, forest: Forest, main: number | null): SurveyCheck[] {
  const checks = [...loopChecks(forest), ...disconnectedChecks(survey, forest, main)];
  if (survey.nodes.length === 0 && survey.runs.length === 0) {
    checks.push(check('survey-empty', 'note', 'The survey has no nodes and no runs yet.'));
  } else if (graph.edges.length === 0) {
    checks.push(check('survey-no-runs', 'note', 'No runs join the nodes yet, so the layout cannot be judged.'));
  }
  return checks;
}
