// Bad input becomes checks, never an exception: unknown ids, negative or NaN lengths, junk, an empty survey.
import fc from 'fast-check';
import { analyzeSurvey, layoutSurvey, renderSurveyReport, renderSurveyText } from '@/generators/survey';
import type { SurveyInput } from '@/generators/survey/types';
import { chain, emptySurvey, slugs, withAdapters } from './support/build';

function everything(input: unknown) {
  const survey = input as SurveyInput;
  const result = analyzeSurvey(survey);
  renderSurveyReport(survey, result);
  renderSurveyText(survey, result);
  layoutSurvey(survey);
  return result;
}

describe('bad input gives checks', () => {
  it('handles an empty survey', () => {
    const result = everything(emptySurvey());
    expect(result.layout).toBe('empty');
    expect(slugs(result)).toEqual(['survey-empty']);
    expect(result.endToEnd).toBeNull();
  });

  it('reports runs that name unknown nodes and leaves them out of the drawing and paths', () => {
    const s = chain([100]);
    s.runs.push({ id: 'rx', from: 'n1', to: 'ghost', lengthFt: 50, gauge: 22, reverses: false });
    const result = everything(s);
    const c = result.checks.find((x) => x.slug === 'run-unknown-node')!;
    expect(c).toMatchObject({ severity: 'error', runIds: ['rx'] });
    expect(c.message).toContain('"ghost"');
    expect(result.runs.find((r) => r.runId === 'rx')!.inGraph).toBe(false);
    expect(layoutSurvey(s).nodes.map((n) => n.id)).toEqual(['b', 'n1']);
  });

  it.each([[-1], [Number.NaN], [Number.POSITIVE_INFINITY], ['12' as unknown as number]])(
    'reports a run length of %p and leaves it out of the totals', (len) => {
      const s = withAdapters(chain([100, 50]), ['b', 'n2']);
      s.runs[1].lengthFt = len;
      const result = everything(s);
      expect(result.checks.find((c) => c.slug === 'run-bad-length')!.runIds).toEqual(['r2']);
      expect(result.totals).toMatchObject({ lengthFt: 114, runsCounted: 3, runsSkipped: 1 });
      expect(result.runs[1]).toMatchObject({ lengthFt: null, loopOhms: null });
      expect(result.endToEnd?.complete).toBe(false);
    });

  it('reports an unknown gauge, duplicate ids, bad node kinds and an unknown centre', () => {
    const s = chain([100, 50]);
    (s.runs[0] as { gauge: number }).gauge = 23;
    s.runs.push({ ...s.runs[1] });
    (s.nodes as Array<{ id: string; kind: string; label: string }>).push({ id: 'q', kind: 'router', label: 'Q' });
    s.centreNodeId = 'nowhere';
    expect(slugs(everything(s))).toEqual(expect.arrayContaining(['run-bad-gauge', 'duplicate-id', 'node-bad-kind', 'centre-unknown']));
  });

  it.each([
    ['null', null], ['a number', 42], ['an empty object', {}], ['arrays of junk', { jacks: [1, null], nodes: 'x', runs: [{}], pairTests: [{ id: 7 }] }],
  ])('survives %s', (_name, junk) => {
    const result = everything(junk);
    expect(result.layout).toBe('empty');
    expect(result.checks.every((c) => typeof c.slug === 'string' && c.message.length > 0)).toBe(true);
  });

  it('never throws on random surveys with wrong ids and odd numbers (property)', () => {
    const id = fc.constantFrom('a', 'b', 'c', 'd', '', 'zz');
    const num = fc.oneof(fc.double(), fc.integer({ min: -10, max: 5000 }), fc.constant(Number.NaN), fc.constant(null));
    const arb = fc.record({
      siteName: fc.string(),
      jacks: fc.array(fc.record({ id, label: fc.string() })),
      pairTests: fc.array(fc.record({ id, jackId: id, pair: fc.string(), vdc: num, vac: num, continuity: fc.constantFrom('good', 'open', 'short', null, 'bad') })),
      nodes: fc.array(fc.record({ id, kind: fc.constantFrom('block', 'jack', 'splitter', 'adapter', 'other'), label: fc.string(), jackId: fc.option(id) })),
      runs: fc.array(fc.record({ id: fc.string({ maxLength: 3 }), from: id, to: id, lengthFt: num, gauge: fc.constantFrom(22, 24, 26, 28), reverses: fc.boolean(), kind: fc.constantFrom('wall', 'cord', undefined) })),
      terminators: fc.array(fc.record({ id, nodeId: id, ohms: num })),
      centreNodeId: fc.option(id),
      networkPair: fc.option(fc.string()),
    });
    fc.assert(fc.property(arb, (s) => {
      const result = everything(s);
      expect(['star', 'bus', 'tree', 'mixed', 'empty']).toContain(result.layout);
      expect(result.counts.error + result.counts.warning + result.counts.note).toBe(result.checks.length);
    }), { numRuns: 300 });
  });
});

describe('large input', () => {
  it('analyses and lays out a chain of 20,000 runs without overflowing the stack', () => {
    const lengths = Array.from({ length: 20000 }, () => 0.1);
    const started = Date.now();
    const result = analyzeSurvey(chain(lengths));
    const drawing = layoutSurvey(chain(lengths));
    expect(result.layout).toBe('bus');
    expect(result.totals.runsCounted).toBe(20000);
    expect(drawing.nodes).toHaveLength(20001);
    expect(Date.now() - started).toBeLessThan(10000);
  });
});
