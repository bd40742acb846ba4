/**
 * The terminating resistor: exactly one, of 150 Ω, joining the pair's two circuits once the network has
 * 100 ft of wire or more; none needed under 100 ft. Common practice of the trade, no published source.
 */
import { asEntered, asSum, check } from './check';
import type { CleanSurvey } from './clean-input';
import { labelOf } from './graph-checks';
import { TERMINATOR_NEEDED_FROM_FT, TERMINATOR_OHMS, atLeast } from './rules';
import type { SurveyCheck } from './types';

export function terminatorNeeded(totalFt: number): boolean {
  return atLeast(totalFt, TERMINATOR_NEEDED_FROM_FT);
}

export function terminationChecks(survey: CleanSurvey, totalFt: number): SurveyCheck[] {
  const fitted = survey.terminators;
  const checks: SurveyCheck[] = [];
  const needed = terminatorNeeded(totalFt);
  if (needed && fitted.length === 0) {
    checks.push(check('terminator-missing', 'error',
      `The network has ${asSum(totalFt)} ft of wire; from ${TERMINATOR_NEEDED_FROM_FT} ft on it needs one ` +
        `${TERMINATOR_OHMS} Ω terminator across the pair (trade practice).`));
  }
  if (fitted.length > 1) {
    checks.push(check('terminator-duplicate', 'error',
      `${fitted.length} terminators are fitted (${fitted.map((t) => labelOf(survey, t.nodeId)).join(', ')}); ` +
        'the network takes exactly one.',
      { nodeIds: fitted.map((t) => t.nodeId) }));
  }
  for (const t of fitted) {
    if (t.ohms !== TERMINATOR_OHMS) {
      checks.push(check('terminator-wrong-value', 'error',
        `Terminator ${t.id} at ${labelOf(survey, t.nodeId)} is ${Number.isFinite(t.ohms) ? asEntered(t.ohms) : 'not a number of'} Ω; ` +
          `it must be ${TERMINATOR_OHMS} Ω.`,
        { nodeIds: [t.nodeId] }));
    }
  }
  if (!needed && fitted.length === 1) {
    checks.push(check('terminator-not-needed', 'note',
      `The network has only ${asSum(totalFt)} ft of wire; under ${TERMINATOR_NEEDED_FROM_FT} ft no terminator is needed.`,
      { nodeIds: [fitted[0].nodeId] }));
  }
  return checks;
}
