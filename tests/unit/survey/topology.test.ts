// Layout shapes and graph sanity: star, bus, tree, mixed, empty; loops and disconnected parts.
import { analyzeSurvey } from '@/generators/survey';
import { chain, emptySurvey, node, slugs, star, wall, withAdapters } from './support/build';

describe('layout', () => {
  it('is empty with no runs', () => {
    expect(analyzeSurvey(emptySurvey()).layout).toBe('empty');
    const nodesOnly = emptySurvey();
    nodesOnly.nodes.push(node('b', 'block'), node('n1', 'jack'));
    const result = analyzeSurvey(nodesOnly);
    expect(result.layout).toBe('empty');
    expect(slugs(result)).toContain('survey-no-runs');
  });

  it('is a star when every run leaves the centre, with or without adapter cords', () => {
    expect(analyzeSurvey(star([100, 200, 300])).layout).toBe('star');
    const result = analyzeSurvey(withAdapters(star([100, 200, 300]), ['n1', 'n2', 'n3']));
    expect(result.layout).toBe('star');
    expect(result.centreNodeId).toBe('b');
    expect(result.spokes.map((s) => s.firstRunId)).toEqual(['r1', 'r2', 'r3']);
  });

  it('finds the block as centre when none is chosen', () => {
    const s = star([100, 200, 300]);
    s.centreNodeId = null;
    expect(analyzeSurvey(s)).toMatchObject({ layout: 'star', centreNodeId: 'b' });
  });

  it('is a bus for a chain of jacks, adapters hanging off each', () => {
    expect(analyzeSurvey(chain([100, 100, 100])).layout).toBe('bus');
    expect(analyzeSurvey(withAdapters(chain([100, 100, 100]), ['n1', 'n2', 'n3'])).layout).toBe('bus');
  });

  it('is mixed for a centre whose spokes continue as chains', () => {
    const s = star([100, 100, 100]);
    s.nodes.push(node('n4', 'jack'));
    s.runs.push(wall('r4', 'n1', 'n4', 50));
    expect(analyzeSurvey(s).layout).toBe('mixed');
  });

  it('is a tree when a branch splits away from the centre', () => {
    const s = star([100, 100]);
    s.nodes.push(node('n3', 'jack'), node('n4', 'jack'));
    s.runs.push(wall('r3', 'n1', 'n3', 50), wall('r4', 'n1', 'n4', 50));
    expect(analyzeSurvey(s).layout).toBe('tree');
  });

  it('notes a chosen centre when the wiring is not a star around it', () => {
    const s = chain([100, 100]);
    s.centreNodeId = 'b';
    const result = analyzeSurvey(s);
    expect(result.layout).toBe('bus');
    expect(slugs(result)).toContain('centre-not-star');
  });
});

describe('graph sanity', () => {
  it('reports a loop in the wiring with the runs around it', () => {
    const s = chain([100, 100]);
    s.runs.push(wall('r3', 'n2', 'b', 100));
    const result = analyzeSurvey(s);
    const loop = result.checks.find((c) => c.slug === 'wiring-loop')!;
    expect(loop.severity).toBe('error');
    expect([...loop.runIds].sort()).toEqual(['r1', 'r2', 'r3']);
    expect(result.layout).toBe('mixed');
  });

  it('reports a run from a node to itself and two runs between the same nodes as loops', () => {
    const self = chain([100]);
    self.runs.push(wall('r2', 'n1', 'n1', 5));
    expect(analyzeSurvey(self).checks.find((c) => c.slug === 'wiring-loop')!.runIds).toEqual(['r2']);
    const twice = chain([100]);
    twice.runs.push(wall('r2', 'b', 'n1', 100));
    expect([...analyzeSurvey(twice).checks.find((c) => c.slug === 'wiring-loop')!.runIds].sort()).toEqual(['r1', 'r2']);
  });

  it('reports parts not joined to the rest; an error when an adapter is cut off', () => {
    const s = chain([100, 100]);
    s.nodes.push(node('n9', 'jack'));
    const warn = analyzeSurvey(s).checks.find((c) => c.slug === 'wiring-disconnected')!;
    expect(warn).toMatchObject({ severity: 'warning', nodeIds: ['n9'] });
    s.nodes.push(node('a9', 'adapter'));
    s.runs.push({ id: 'c9', from: 'n9', to: 'a9', lengthFt: 7, gauge: 26, reverses: true });
    const err = analyzeSurvey(s).checks.find((c) => c.slug === 'wiring-disconnected')!;
    expect(err.severity).toBe('error');
    expect(err.nodeIds).toEqual(['n9', 'a9']);
  });

  it('reports a jack that no node stands for', () => {
    const s = chain([100]);
    s.jacks.push({ id: 'j1', label: 'J-01' });
    expect(analyzeSurvey(s).checks.find((c) => c.slug === 'jack-not-drawn')!.jackIds).toEqual(['j1']);
  });
});

describe('splitters go into a wall jack, never into an adapter (trade practice, no published source)', () => {
  function withSplitter(into: 'jack' | 'adapter') {
    const s = chain([100]);
    s.nodes.push(node('a1', 'adapter'), node('s1', 'splitter'), node('a2', 'adapter'), node('a3', 'adapter'));
    if (into === 'jack') {
      s.runs.push({ id: 'p', from: 'n1', to: 's1', lengthFt: 0.5, gauge: 26, reverses: false, kind: 'cord' });
    } else {
      s.runs.push({ id: 'c1', from: 'n1', to: 'a1', lengthFt: 7, gauge: 26, reverses: true });
      s.runs.push({ id: 'p', from: 'a1', to: 's1', lengthFt: 0.5, gauge: 26, reverses: false, kind: 'cord' });
    }
    s.runs.push({ id: 'c2', from: 's1', to: 'a2', lengthFt: 7, gauge: 26, reverses: true });
    s.runs.push({ id: 'c3', from: 's1', to: 'a3', lengthFt: 7, gauge: 26, reverses: true });
    return analyzeSurvey(s);
  }

  it('accepts a splitter in a wall jack', () => {
    expect(slugs(withSplitter('jack')).filter((x) => x.startsWith('splitter'))).toEqual([]);
  });

  it('flags a splitter plugged into an adapter', () => {
    const c = withSplitter('adapter').checks.find((x) => x.slug === 'splitter-into-adapter')!;
    expect(c.severity).toBe('error');
    expect(c.nodeIds).toContain('s1');
  });

  it('flags a splitter joined only to another splitter', () => {
    const s = chain([100]);
    s.nodes.push(node('s1', 'splitter'), node('s2', 'splitter'));
    s.runs.push({ id: 'p1', from: 'n1', to: 's1', lengthFt: 1, gauge: 26, reverses: false, kind: 'cord' });
    s.runs.push({ id: 'p2', from: 's1', to: 's2', lengthFt: 1, gauge: 26, reverses: false, kind: 'cord' });
    expect(analyzeSurvey(s).checks.find((x) => x.slug === 'splitter-not-at-wall-jack')!.nodeIds[0]).toBe('s2');
  });
});

describe('checks name the jacks of their nodes', () => {
  it('adds the jack of every node a check names', () => {
    const s = star([600, 100]);
    s.jacks.push({ id: 'j1', label: 'J-01' }, { id: 'j2', label: 'J-02' });
    s.nodes[1].jackId = 'j1';
    s.nodes[2].jackId = 'j2';
    expect(analyzeSurvey(s).checks.find((c) => c.slug === 'spoke-too-long')!.jackIds).toEqual(['j1']);
  });

  it('judges the wired part when the chosen centre is not wired yet', () => {
    const s = chain([100, 100]);
    s.nodes.push(node('hub', 'block'));
    s.centreNodeId = 'hub';
    const result = analyzeSurvey(s);
    expect(result.layout).toBe('bus');
    expect(result.checks.find((c) => c.slug === 'wiring-disconnected')!.nodeIds).toEqual(['hub']);
  });
});
