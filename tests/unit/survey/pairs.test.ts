// Pair readings. Thresholds are common practice of the trade (no published source): a pair over
// 0.3 V DC or over 1 V AC is probably in use.
import { analyzeSurvey } from '@/generators/survey';
import { pairKey, pairStatus } from '@/generators/survey/pairs';
import type { PairTest, SurveyInput } from '@/generators/survey/types';
import { emptySurvey, slugs } from './support/build';

function test1(over: Partial<PairTest>): PairTest {
  return { id: 't1', jackId: 'j1', pair: '2 (black/yellow)', vdc: 0, vac: 0, continuity: 'good', ...over };
}

function oneJack(tests: PairTest[], networkPair?: string): SurveyInput {
  return { ...emptySurvey(), jacks: [{ id: 'j1', label: 'J-01 Reception' }], pairTests: tests, networkPair };
}

describe('pair in use, DC threshold 0.3 V (trade practice, no published source)', () => {
  it.each([
    [0.29, 'free'], [0.3, 'free'], [0.31, 'in-use'], [0.3000001, 'in-use'],
    [-0.3, 'free'], [-0.31, 'in-use'], [48, 'in-use'],
  ])('%p V DC is %s', (vdc, status) => {
    expect(pairStatus(test1({ vdc }))).toBe(status);
  });
});

describe('pair in use, AC threshold 1 V (trade practice, no published source)', () => {
  it.each([[0.99, 'free'], [1, 'free'], [1.01, 'in-use'], [90, 'in-use']])('%p V AC is %s', (vac, status) => {
    expect(pairStatus(test1({ vac }))).toBe(status);
  });
});

describe('pair status and checks', () => {
  it('calls open and short continuity a fault, and a live pair in use whatever the continuity', () => {
    expect(pairStatus(test1({ continuity: 'open' }))).toBe('fault');
    expect(pairStatus(test1({ continuity: 'short' }))).toBe('fault');
    expect(pairStatus(test1({ vdc: 48, continuity: 'short' }))).toBe('in-use');
  });

  it('does not call a pair free when a reading or the continuity is missing, and questions it', () => {
    expect(pairStatus(test1({ continuity: null }))).toBe('unconfirmed');
    expect(pairStatus(test1({ vdc: null }))).toBe('unconfirmed');
    const result = analyzeSurvey(oneJack([test1({ continuity: null, vac: null })]));
    expect(slugs(result)).toEqual(expect.arrayContaining(['continuity-missing', 'reading-missing']));
    expect(result.jacks[0].freePairs).toEqual([]);
  });

  it('flags the network pair in use as an error, another pair in use as a note', () => {
    const tests = [test1({ vdc: 0.31 }), test1({ id: 't2', pair: '1 (red/green)', vdc: 48.3, continuity: null })];
    const result = analyzeSurvey(oneJack(tests, '2'));
    const byslug = Object.fromEntries(result.checks.map((c) => [c.slug, c]));
    expect(byslug['network-pair-in-use'].severity).toBe('error');
    expect(byslug['network-pair-in-use'].jackIds).toEqual(['j1']);
    expect(byslug['network-pair-in-use'].message).toContain('0.31 V DC');
    expect(byslug['pair-in-use'].severity).toBe('note');
    expect(result.jacks[0].networkPairStatus).toBe('in-use');
  });

  it('flags a shorted network pair: its two conductors must stay separate circuits', () => {
    const result = analyzeSurvey(oneJack([test1({ continuity: 'short' })], '2 (black/yellow)'));
    const fault = result.checks.find((c) => c.slug === 'network-pair-fault')!;
    expect(fault.severity).toBe('error');
    expect(fault.message).toMatch(/shorted/);
  });

  it('questions readings out of range and readings that are not numbers', () => {
    const result = analyzeSurvey(oneJack([
      test1({ vdc: 480 }), test1({ id: 't2', pair: '3', vac: -2 }), test1({ id: 't3', pair: '4', vdc: Number.NaN }),
    ]));
    expect(slugs(result).filter((s) => s === 'reading-out-of-range')).toHaveLength(2);
    expect(slugs(result)).toContain('reading-invalid');
  });

  it('prints readings as entered in messages (no rounding)', () => {
    const result = analyzeSurvey(oneJack([test1({ vdc: 0.30000001 })]));
    expect(result.checks.find((c) => c.slug === 'pair-in-use')!.message).toContain('0.30000001 V DC');
    expect(result.jacks[0].pairs[0].vdc).toBe(0.30000001);
  });

  it('lets a retest of the same pair replace the earlier one', () => {
    const result = analyzeSurvey(oneJack([test1({ vdc: 48 }), test1({ id: 't2', pair: '2', vdc: 0.01 })], '2'));
    expect(result.jacks[0].pairs.map((p) => p.current)).toEqual([false, true]);
    expect(result.jacks[0].networkPairStatus).toBe('free');
    expect(slugs(result)).not.toContain('network-pair-in-use');
  });

  it('reports jacks with no readings, an untested network pair and a missing network pair choice', () => {
    const s = oneJack([test1({ pair: '1' })], '2');
    s.jacks.push({ id: 'j2', label: 'J-02' });
    const result = analyzeSurvey(s);
    expect(slugs(result)).toEqual(expect.arrayContaining(['jack-untested', 'network-pair-untested']));
    expect(slugs(analyzeSurvey(oneJack([test1({})])))).toContain('network-pair-unset');
  });

  it('reads "2", " 2 " and "2 (black/yellow)" as the same pair', () => {
    expect(pairKey('2 (black/yellow)')).toBe(pairKey(' 2 '));
    expect(pairKey('spare')).not.toBe(pairKey('2'));
  });

  it('reports a pair test at a jack that is not in the survey', () => {
    expect(slugs(analyzeSurvey(oneJack([test1({ jackId: 'nope' })])))).toContain('pair-test-unknown-jack');
  });
});
