// Polarity. Common practice of the trade, no published source: every adapter cord reverses the pair and
// wall wiring does not, so a working path between two adapters crosses an even number of reversals; two
// adapters joined by a cord alone see one reversal and fail.
import fc from 'fast-check';
import { analyzeSurvey } from '@/generators/survey';
import type { CableRun, NodeKind, SurveyInput } from '@/generators/survey/types';
import { chain, cord, emptySurvey, node, slugs, withAdapters } from './support/build';

describe('polarity examples (trade practice, no published source)', () => {
  it('fails two adapters joined by one cord alone: one reversal', () => {
    const s = emptySurvey();
    s.nodes.push(node('a1', 'adapter'), node('a2', 'adapter'));
    s.runs.push(cord('c1', 'a1', 'a2', 10));
    const result = analyzeSurvey(s);
    expect(result.adapterPaths).toEqual([expect.objectContaining({ reversals: 1, even: false, runIds: ['c1'] })]);
    const odd = result.checks.find((c) => c.slug === 'polarity-odd')!;
    expect(odd).toMatchObject({ severity: 'error', runIds: ['c1'], nodeIds: ['a1', 'a2'] });
  });

  it('passes adapter - cord - jack - wall - jack - cord - adapter: two reversals', () => {
    const result = analyzeSurvey(withAdapters(chain([100, 100]), ['n1', 'n2']));
    expect(result.adapterPaths).toEqual([expect.objectContaining({ reversals: 2, even: true })]);
    expect(slugs(result)).not.toContain('polarity-odd');
  });

  it('flags a wall run marked as reversing (crossed conductors) and the odd paths it causes', () => {
    const s = withAdapters(chain([100, 100]), ['n1', 'n2']);
    s.runs[1].reverses = true;
    const result = analyzeSurvey(s);
    expect(result.checks.find((c) => c.slug === 'wall-run-crossed')).toMatchObject({ severity: 'error', runIds: ['r2'] });
    expect(result.checks.find((c) => c.slug === 'polarity-odd')!.runIds).toEqual(['c-n1', 'r2', 'c-n2']);
  });

  it('questions an adapter cord marked as not reversing', () => {
    const s = withAdapters(chain([100]), ['n1']);
    s.runs[1].reverses = false;
    expect(analyzeSurvey(s).checks.find((c) => c.slug === 'cord-not-reversing')?.severity).toBe('warning');
  });

  it('reports an odd loop of reversals as the two circuits joined', () => {
    const s = withAdapters(chain([100, 100]), ['n1']);
    s.runs.push({ id: 'x', from: 'n2', to: 'b', lengthFt: 5, gauge: 22, reverses: true, kind: 'cord' });
    expect(analyzeSurvey(s).checks.find((c) => c.slug === 'wiring-loop')!.message).toMatch(/odd number of reversals/);
  });
});

// ---- property: random trees of runs and cords ------------------------------------------------------

interface RandomTree {
  kinds: NodeKind[];
  /** parent[i] < i for i >= 1; parent[0] is unused. */
  parent: number[];
  reverses: boolean[];
  flip: boolean[];
  cordKind: boolean[];
  nodeOrder: number[];
  runOrder: number[];
}

const KINDS: NodeKind[] = ['block', 'jack', 'splitter', 'adapter'];

const treeArb: fc.Arbitrary<RandomTree> = fc.integer({ min: 2, max: 30 }).chain((n) => {
  const idx = [...Array(n).keys()];
  return fc.record({
    kinds: fc.array(fc.constantFrom(...KINDS, 'adapter' as NodeKind), { minLength: n, maxLength: n }),
    parent: fc.array(fc.nat(), { minLength: n, maxLength: n }).map((raw) => raw.map((r, i) => (i === 0 ? -1 : r % i))),
    reverses: fc.array(fc.boolean(), { minLength: n, maxLength: n }),
    flip: fc.array(fc.boolean(), { minLength: n, maxLength: n }),
    cordKind: fc.array(fc.boolean(), { minLength: n, maxLength: n }),
    nodeOrder: fc.shuffledSubarray(idx, { minLength: n, maxLength: n }),
    runOrder: fc.shuffledSubarray(idx.slice(1), { minLength: n - 1, maxLength: n - 1 }),
  });
});

function toSurvey(t: RandomTree): SurveyInput {
  const s = emptySurvey();
  s.nodes = t.nodeOrder.map((i) => node(`v${i}`, t.kinds[i]));
  s.runs = t.runOrder.map((i): CableRun => {
    const [from, to] = t.flip[i] ? [`v${i}`, `v${t.parent[i]}`] : [`v${t.parent[i]}`, `v${i}`];
    return { id: `e${i}`, from, to, lengthFt: 10 + i, gauge: 22, reverses: t.reverses[i], kind: t.cordKind[i] ? 'cord' : 'wall' };
  });
  return s;
}

/** Independent count: climb the generator's own parent links from both ends to the common ancestor. */
function expectedPath(t: RandomTree, a: number, b: number): { runs: string[]; reversals: number } {
  const up = (v: number): number[] => (v === 0 ? [0] : [v, ...up(t.parent[v])]);
  const fromA = up(a);
  const fromB = up(b);
  const common = fromA.find((v) => fromB.includes(v))!;
  const edgesTo = (chainUp: number[]) => chainUp.slice(0, chainUp.indexOf(common));
  const edges = [...edgesTo(fromA), ...edgesTo(fromB)];
  return { runs: edges.map((v) => `e${v}`), reversals: edges.filter((v) => t.reverses[v]).length };
}

describe('polarity parity on random trees (property; trade practice, no published source)', () => {
  it('matches an independent count of reversals along every adapter-to-adapter path', () => {
    fc.assert(fc.property(treeArb, (t) => {
      const result = analyzeSurvey(toSurvey(t));
      const adapters = t.nodeOrder.filter((i) => t.kinds[i] === 'adapter');
      expect(result.adapterPaths).toHaveLength((adapters.length * (adapters.length - 1)) / 2);
      expect(slugs(result)).not.toContain('wiring-loop');
      expect(slugs(result)).not.toContain('wiring-disconnected');
      const oddChecks = result.checks.filter((c) => c.slug === 'polarity-odd').map((c) => [...c.nodeIds].sort().join('|'));
      const oddExpected: string[] = [];
      for (const p of result.adapterPaths) {
        const a = Number(p.fromNodeId.slice(1));
        const b = Number(p.toNodeId.slice(1));
        const want = expectedPath(t, a, b);
        expect(p.reversals).toBe(want.reversals);
        expect(p.even).toBe(want.reversals % 2 === 0);
        expect([...p.runIds].sort()).toEqual([...want.runs].sort());
        if (want.reversals % 2 === 1) oddExpected.push([p.fromNodeId, p.toNodeId].sort().join('|'));
      }
      expect(oddChecks.sort()).toEqual(oddExpected.sort());
    }), { numRuns: 1000 });
  });
});

describe('polarity with very many adapters', () => {
  it('judges more than 100 adapters in one part by parity groups and names the odd side', () => {
    const s = withAdapters(chain([10]), []);
    for (let i = 0; i < 101; i += 1) {
      s.nodes.push(node(`a${i}`, 'adapter'));
      s.runs.push(cord(`c${i}`, 'n1', `a${i}`, 7, i !== 42));
    }
    const result = analyzeSurvey(s);
    expect(result.adapterPaths).toEqual([]);
    const odd = result.checks.filter((c) => c.slug === 'polarity-odd');
    expect(odd).toHaveLength(1);
    expect(odd[0].nodeIds).toEqual(['a42']);
  });
});
