// Termination. Common practice of the trade, no published source: one 150 Ω resistor joins the pair's two
// circuits once the network has 100 ft of wire or more; under 100 ft none is needed.
import { analyzeSurvey } from '@/generators/survey';
import type { SurveyInput } from '@/generators/survey/types';
import { chain, slugs } from './support/build';

function terminated(s: SurveyInput, ...ohms: number[]): SurveyInput {
  ohms.forEach((o, i) => s.terminators.push({ id: `t${i + 1}`, nodeId: s.nodes[s.nodes.length - 1 - i].id, ohms: o }));
  return s;
}

describe('terminator needed from 100 ft (trade practice, no published source)', () => {
  it.each([[99, false], [99.99, false], [100, true], [100.01, true], [101, true]])('%p ft: needed = %p', (len, needed) => {
    const result = analyzeSurvey(chain([len]));
    expect(result.terminatorNeeded).toBe(needed);
    expect(slugs(result).includes('terminator-missing')).toBe(needed);
  });

  it('counts 33.3 + 33.3 + 33.4 ft as 100 ft despite floating-point sums', () => {
    expect(analyzeSurvey(chain([33.3, 33.3, 33.4])).terminatorNeeded).toBe(true);
  });

  it('is satisfied by exactly one 150 Ω terminator', () => {
    const result = analyzeSurvey(terminated(chain([100]), 150));
    expect(slugs(result).filter((s) => s.startsWith('terminator-'))).toEqual([]);
  });

  it('notes a terminator that is not needed under 100 ft', () => {
    const result = analyzeSurvey(terminated(chain([99]), 150));
    expect(result.checks.find((c) => c.slug === 'terminator-not-needed')?.severity).toBe('note');
  });
});

describe('terminator value 150 Ω and count (trade practice, no published source)', () => {
  it.each([[149, true], [149.9, true], [150, false], [150.1, true], [151, true], [Number.NaN, true]])(
    '%p Ω: wrong = %p', (ohms, wrong) => {
      const result = analyzeSurvey(terminated(chain([300]), ohms));
      expect(slugs(result).includes('terminator-wrong-value')).toBe(wrong);
    });

  it('flags two terminators as a duplicate and names both places', () => {
    const result = analyzeSurvey(terminated(chain([300, 200]), 150, 150));
    const dup = result.checks.find((c) => c.slug === 'terminator-duplicate')!;
    expect(dup.severity).toBe('error');
    expect(dup.nodeIds).toEqual(['n2', 'n1']);
  });

  it('does not count a terminator placed at an unknown node', () => {
    const s = chain([300]);
    s.terminators.push({ id: 't1', nodeId: 'ghost', ohms: 150 });
    expect(slugs(analyzeSurvey(s))).toEqual(expect.arrayContaining(['terminator-unknown-node', 'terminator-missing']));
  });
});
