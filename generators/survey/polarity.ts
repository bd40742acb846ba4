/**
 * Polarity: every adapter cord reverses the pair and wall wiring does not, so a working path between two
 * adapters crosses an even number of reversals. Two adapters joined by a cord alone see one reversal and
 * fail. Common practice of the trade, no published source.
 *
 * Every pair of adapters in the same part of the wiring is checked along its path. In a wiring with a loop
 * the path is the spanning forest's one (the loop has its own check).
 */
import { check } from './check';
import type { CleanSurvey } from './clean-input';
import { forestPath, summarisePath, type Forest } from './graph';
import { labelOf } from './graph-checks';
import type { SurveyCheck, SurveyPath } from './types';

/** Above this many adapters in one part, pairs are judged by parity groups only (the list would be huge). */
export const MAX_LISTED_ADAPTERS = 100;

export type AdapterPath = SurveyPath & { even: boolean };

function adaptersByComponent(survey: CleanSurvey, forest: Forest): string[][] {
  const groups = forest.components.map(() => [] as string[]);
  for (const node of survey.nodes) {
    if (node.kind === 'adapter' && forest.componentOf.has(node.id)) groups[forest.componentOf.get(node.id)!].push(node.id);
  }
  return groups;
}

function pairsOf(adapters: string[], forest: Forest): AdapterPath[] {
  const paths: AdapterPath[] = [];
  for (let i = 0; i < adapters.length; i += 1) {
    for (let j = i + 1; j < adapters.length; j += 1) {
      const path = summarisePath(adapters[i], adapters[j], forestPath(forest, adapters[i], adapters[j])!);
      paths.push({ ...path, even: path.reversals % 2 === 0 });
    }
  }
  return paths;
}

function oddPairCheck(survey: CleanSurvey, p: AdapterPath): SurveyCheck {
  return check('polarity-odd', 'error',
    `Between adapters ${labelOf(survey, p.fromNodeId)} and ${labelOf(survey, p.toNodeId)} the pair is reversed ` +
      `${p.reversals} time(s) (runs ${p.runIds.join(', ')}); a working path crosses an even number of reversals ` +
      '(each adapter cord reverses the pair, wall wiring does not).',
    { runIds: p.runIds, nodeIds: [p.fromNodeId, p.toNodeId] });
}

/** For a part with very many adapters: reversal parity from the root, then one check for the odd side. */
function groupCheck(survey: CleanSurvey, adapters: string[], forest: Forest): SurveyCheck[] {
  const root = forest.components[forest.componentOf.get(adapters[0])!][0];
  const parity = (id: string) => forestPath(forest, root, id)!.filter((e) => e.reverses).length % 2;
  const odd = adapters.filter((id) => parity(id) !== parity(adapters[0]));
  if (odd.length === 0) return [];
  return [check('polarity-odd', 'error',
    `${odd.length} of ${adapters.length} adapters see an odd number of reversals from the others ` +
      `(${odd.map((id) => labelOf(survey, id)).join(', ')}); a working path crosses an even number.`,
    { nodeIds: odd })];
}

function cordChecks(survey: CleanSurvey): SurveyCheck[] {
  const checks: SurveyCheck[] = [];
  for (const r of survey.runs) {
    if (r.kind === 'wall' && r.reverses) {
      checks.push(check('wall-run-crossed', 'error',
        `Wall run ${r.id} is marked as reversing the pair: its conductors are crossed. The two circuits of the ` +
          'pair must never be crossed in the wall wiring.',
        { runIds: [r.id], nodeIds: [r.from, r.to] }));
    }
    const toAdapter = [r.from, r.to].some((id) => survey.nodeById.get(id)?.kind === 'adapter');
    if (r.kind === 'cord' && toAdapter && !r.reverses) {
      checks.push(check('cord-not-reversing', 'warning',
        `Cord ${r.id} reaches an adapter but is marked as not reversing the pair; an adapter cord reverses it. ` +
          'Check the cord and the entry.',
        { runIds: [r.id], nodeIds: [r.from, r.to] }));
    }
  }
  return checks;
}

export function analysePolarity(survey: CleanSurvey, forest: Forest): { paths: AdapterPath[]; checks: SurveyCheck[] } {
  const paths: AdapterPath[] = [];
  const checks = cordChecks(survey);
  for (const adapters of adaptersByComponent(survey, forest)) {
    if (adapters.length < 2) continue;
    if (adapters.length > MAX_LISTED_ADAPTERS) {
      checks.push(...groupCheck(survey, adapters, forest));
      continue;
    }
    const found = pairsOf(adapters, forest);
    paths.push(...found);
    checks.push(...found.filter((p) => !p.even).map((p) => oddPairCheck(survey, p)));
  }
  return { paths, checks };
}
