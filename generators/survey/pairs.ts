/**
 * Pair readings at each jack: which pairs are in use, free or faulty, and what the readings leave open.
 * Thresholds: common practice of the trade, no published source (rules.ts).
 */
import { asEntered, check } from './check';
import type { CleanSurvey } from './clean-input';
import { IN_USE_VAC, IN_USE_VDC, READING_MAX_ABS_VDC, READING_MAX_VAC } from './rules';
import type { JackResult, PairResult, PairStatus, PairTest, SurveyCheck, SurveyJack } from './types';

/** "2 (black/yellow)", "2" and " 2 " name the same pair: the leading number decides when there is one. */
export function pairKey(pair: string): string {
  const number = /^\s*(\d+)/.exec(pair);
  return number ? number[1] : pair.trim().toLowerCase().replace(/\s+/g, ' ');
}

function usable(value: number | null): number | null {
  return value !== null && Number.isFinite(value) ? value : null;
}

export function isInUse(test: Pick<PairTest, 'vdc' | 'vac'>): boolean {
  const vdc = usable(test.vdc);
  const vac = usable(test.vac);
  return (vdc !== null && Math.abs(vdc) > IN_USE_VDC) || (vac !== null && vac > IN_USE_VAC);
}

/** In use wins over a fault: a live pair is the danger, whatever else the meter says. */
export function pairStatus(test: PairTest): PairStatus {
  if (isInUse(test)) return 'in-use';
  if (test.continuity === 'open' || test.continuity === 'short') return 'fault';
  if (usable(test.vdc) === null || usable(test.vac) === null || test.continuity === null) return 'unconfirmed';
  return 'free';
}

function volts(value: number | null, unit: string): string {
  return value === null ? `no ${unit} reading` : `${asEntered(value)} ${unit}`;
}

function where(test: PairTest, jack: SurveyJack | undefined): string {
  return `Pair ${test.pair || '?'} at ${jack ? jack.label || jack.id : test.jackId}`;
}

function readingChecks(test: PairTest, jack: SurveyJack | undefined): SurveyCheck[] {
  const refs = { jackIds: jack ? [jack.id] : [] };
  const checks: SurveyCheck[] = [];
  const bad = [['V DC', test.vdc], ['V AC', test.vac]].filter(([, v]) => v !== null && !Number.isFinite(v as number));
  for (const [unit] of bad) {
    checks.push(check('reading-invalid', 'warning', `${where(test, jack)}: the ${unit} reading is not a number; measure again.`, refs));
  }
  const vdc = usable(test.vdc);
  const vac = usable(test.vac);
  if ((vdc !== null && Math.abs(vdc) > READING_MAX_ABS_VDC) || (vac !== null && (vac < 0 || vac > READING_MAX_VAC))) {
    checks.push(check('reading-out-of-range', 'warning',
      `${where(test, jack)} reads ${volts(vdc, 'V DC')}, ${volts(vac, 'V AC')}: outside what a telephone pair carries ` +
        `(up to ${READING_MAX_ABS_VDC} V DC either way, 0 to ${READING_MAX_VAC} V AC). Check the meter range and the entry.`, refs));
  }
  if (isInUse(test)) return checks;
  if (vdc === null || vac === null) {
    checks.push(check('reading-missing', 'warning',
      `${where(test, jack)} has ${volts(vdc, 'V DC')} and ${volts(vac, 'V AC')}; both are needed to call the pair free.`, refs));
  }
  if (test.continuity === null) {
    checks.push(check('continuity-missing', 'warning', `${where(test, jack)} has no continuity result; test it before using the pair.`, refs));
  }
  return checks;
}

function statusCheck(test: PairTest, jack: SurveyJack | undefined, status: PairStatus, isNetwork: boolean): SurveyCheck[] {
  const refs = { jackIds: jack ? [jack.id] : [] };
  if (status === 'in-use') {
    const message = `${where(test, jack)} reads ${volts(usable(test.vdc), 'V DC')}, ${volts(usable(test.vac), 'V AC')}: ` +
      `probably in use (over ${IN_USE_VDC} V DC or ${IN_USE_VAC} V AC, trade practice).`;
    return [isNetwork
      ? check('network-pair-in-use', 'error', `${message} It cannot carry the network.`, refs)
      : check('pair-in-use', 'note', message, refs)];
  }
  if (status === 'fault') {
    const what = test.continuity === 'short'
      ? 'is shorted: its two conductors are joined, but they must stay two separate circuits'
      : 'is open: a conductor is broken somewhere';
    return [isNetwork
      ? check('network-pair-fault', 'error', `${where(test, jack)} ${what}. The network pair must be repaired or another chosen.`, refs)
      : check('pair-fault', 'warning', `${where(test, jack)} ${what}.`, refs)];
  }
  return [];
}

/** The later entry for the same pair at the same jack replaces the earlier one (a retest). */
function currentTests(tests: PairTest[]): Set<string> {
  const latest = new Map<string, string>();
  for (const t of tests) latest.set(`${t.jackId}\u0000${pairKey(t.pair)}`, t.id);
  return new Set(latest.values());
}

function jackSummary(jack: SurveyJack, results: PairResult[], networkKey: string | null): JackResult {
  const current = results.filter((p) => p.current);
  const network = networkKey === null ? undefined : current.find((p) => pairKey(p.pair) === networkKey);
  return {
    jackId: jack.id,
    label: jack.label,
    pairs: results,
    freePairs: current.filter((p) => p.status === 'free').map((p) => p.pair),
    networkPairStatus: networkKey === null ? null : network ? network.status : 'untested',
  };
}

function jackChecks(jack: JackResult, networkPair: string | null): SurveyCheck[] {
  const refs = { jackIds: [jack.jackId] };
  const name = jack.label || jack.jackId;
  if (jack.pairs.length === 0) return [check('jack-untested', 'warning', `Jack ${name} has no pair readings yet.`, refs)];
  if (jack.networkPairStatus === 'untested') {
    return [check('network-pair-untested', 'warning', `The network pair ${networkPair} has not been tested at ${name}.`, refs)];
  }
  if (jack.networkPairStatus === 'unconfirmed') {
    return [check('network-pair-unconfirmed', 'warning', `The network pair ${networkPair} at ${name} is not confirmed free: a reading is missing.`, refs)];
  }
  if (networkPair === null && jack.freePairs.length === 0) {
    return [check('no-free-pair', 'warning', `No pair tested at ${name} is free.`, refs)];
  }
  return [];
}

export function analysePairs(survey: CleanSurvey): { jacks: JackResult[]; checks: SurveyCheck[] } {
  const checks: SurveyCheck[] = [];
  const jackById = new Map(survey.jacks.map((j) => [j.id, j]));
  const networkKey = survey.networkPair === null ? null : pairKey(survey.networkPair);
  const current = currentTests(survey.pairTests);
  const byJack = new Map<string, PairResult[]>(survey.jacks.map((j) => [j.id, []]));
  for (const test of survey.pairTests) {
    const jack = jackById.get(test.jackId);
    if (!jack) {
      checks.push(check('pair-test-unknown-jack', 'error', `Pair test ${test.id} names jack "${test.jackId}", which is not in the survey.`));
      continue;
    }
    const status = pairStatus(test);
    const isCurrent = current.has(test.id);
    byJack.get(jack.id)!.push({
      testId: test.id, pair: test.pair, status, vdc: test.vdc, vac: test.vac, continuity: test.continuity, current: isCurrent,
    });
    if (!isCurrent) continue;
    checks.push(...readingChecks(test, jack), ...statusCheck(test, jack, status, networkKey === pairKey(test.pair)));
  }
  const jacks = survey.jacks.map((j) => jackSummary(j, byJack.get(j.id)!, networkKey));
  for (const jack of jacks) checks.push(...jackChecks(jack, survey.networkPair));
  if (networkKey === null && survey.pairTests.length > 0) {
    checks.push(check('network-pair-unset', 'note', 'No network pair is chosen yet; pick one that is free at every jack.'));
  }
  return { jacks, checks };
}
