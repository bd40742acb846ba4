/**
 * The wiring survey computation: reads the survey, then runs each group of rules on it. The rules are
 * common practice of the trade (no published source, see rules.ts); wire resistance comes from
 * REFERENCES §6.8 [HYPERPHYSICS] (gauge.ts). Never throws on bad input: problems become checks.
 */
import { check, sortChecks } from './check';
import { cleanSurvey, type CleanSurvey } from './clean-input';
import { endToEnd } from './end-to-end';
import { buildGraph, spanningForest } from './graph';
import { graphChecks, labelOf, mainComponent } from './graph-checks';
import { gaugeChecks, runResults, spokeChecks, totalChecks, totals } from './lengths';
import { analysePairs } from './pairs';
import { analysePolarity } from './polarity';
import { splitterChecks } from './splitters';
import { terminationChecks, terminatorNeeded } from './termination';
import { classifyLayout, starSpokes, type Topology } from './topology';
import type { Severity, SurveyCheck, SurveyInput, SurveyResult } from './types';

function rootOrder(survey: CleanSurvey): string[] {
  const blocks = survey.nodes.filter((n) => n.kind === 'block').map((n) => n.id);
  return survey.centreNodeId !== null ? [survey.centreNodeId, ...blocks] : blocks;
}

function drawingChecks(survey: CleanSurvey, topology: Topology): SurveyCheck[] {
  const checks: SurveyCheck[] = [];
  const drawn = new Set(survey.nodes.map((n) => n.jackId).filter((id) => id !== undefined));
  const undrawn = survey.jacks.filter((j) => !drawn.has(j.id));
  if (undrawn.length > 0 && survey.nodes.length > 0) {
    checks.push(check('jack-not-drawn', 'note',
      `No node stands for jack(s) ${undrawn.map((j) => j.label || j.id).join(', ')}, so they are not in the drawing.`,
      { jackIds: undrawn.map((j) => j.id) }));
  }
  const centre = survey.centreNodeId;
  if (centre !== null && topology.layout !== 'star' && topology.layout !== 'empty') {
    checks.push(check('centre-not-star', 'note',
      `A centre (${labelOf(survey, centre)}) is chosen, but the wiring is a ${topology.layout}, not a star: ` +
        'the spoke limit does not apply, the total limit does.',
      { nodeIds: [centre] }));
  }
  return checks;
}

/** Every check also names the jacks of the nodes it names, so a screen can mark them on the jack list. */
function withJacks(checks: SurveyCheck[], survey: CleanSurvey): SurveyCheck[] {
  return checks.map((c) => {
    const fromNodes = c.nodeIds.map((id) => survey.nodeById.get(id)?.jackId).filter((j): j is string => j !== undefined);
    return { ...c, jackIds: [...new Set([...c.jackIds, ...fromNodes])] };
  });
}

function count(checks: SurveyCheck[]): Record<Severity, number> {
  const counts: Record<Severity, number> = { error: 0, warning: 0, note: 0 };
  for (const c of checks) counts[c.severity] += 1;
  return counts;
}

/** Analyses one survey. Deterministic: the same input gives the same result, checks in the same order. */
export function analyzeSurvey(input: SurveyInput): SurveyResult {
  const { survey, checks: inputChecks } = cleanSurvey(input);
  const graph = buildGraph(survey);
  const forest = spanningForest(graph, rootOrder(survey));
  const main = mainComponent(forest, survey.centreNodeId);
  const topology = classifyLayout(survey, graph, forest, main);
  const spokes = topology.layout === 'star' && topology.hubNodeId !== null ? starSpokes(graph, topology.hubNodeId) : [];
  const sum = totals(survey.runs);
  const pairs = analysePairs(survey);
  const polarity = analysePolarity(survey, forest);
  const checks = withJacks(sortChecks([
    ...inputChecks,
    ...graphChecks(survey, graph, forest, main),
    ...pairs.checks,
    ...spokeChecks(spokes),
    ...totalChecks(topology.layout, survey.runs, sum),
    ...gaugeChecks(survey.runs),
    ...terminationChecks(survey, sum.lengthFt),
    ...polarity.checks,
    ...splitterChecks(survey, graph),
    ...drawingChecks(survey, topology),
  ]), survey);
  return {
    layout: topology.layout,
    centreNodeId: topology.hubNodeId,
    jacks: pairs.jacks,
    runs: runResults(survey),
    totals: sum,
    spokes,
    adapterPaths: polarity.paths,
    endToEnd: endToEnd(polarity.paths, forest, main),
    terminatorNeeded: terminatorNeeded(sum.lengthFt),
    checks,
    counts: count(checks),
  };
}
