// Small survey builders for the tests: a star from a block, a chain (bus) of jacks, adapters on cords.
import type { CableRun, Gauge, SurveyInput, SurveyNode } from '@/generators/survey/types';

export function emptySurvey(): SurveyInput {
  return { siteName: 'Test site', jacks: [], pairTests: [], nodes: [], runs: [], terminators: [] };
}

export function wall(id: string, from: string, to: string, lengthFt: number, gauge: Gauge = 22): CableRun {
  return { id, from, to, lengthFt, gauge, reverses: false, kind: 'wall' };
}

export function cord(id: string, from: string, to: string, lengthFt = 7, reverses = true): CableRun {
  return { id, from, to, lengthFt, gauge: 26, reverses, kind: 'cord' };
}

export function node(id: string, kind: SurveyNode['kind'], jackId?: string): SurveyNode {
  return { id, kind, label: id.toUpperCase(), ...(jackId ? { jackId } : {}) };
}

/** A block "b" with one wall run per length to jacks n1..nk; no adapters, no terminator. */
export function star(lengths: number[], gauge: Gauge = 22): SurveyInput {
  const s = emptySurvey();
  s.nodes.push(node('b', 'block'));
  lengths.forEach((len, i) => {
    s.nodes.push(node(`n${i + 1}`, 'jack'));
    s.runs.push(wall(`r${i + 1}`, 'b', `n${i + 1}`, len, gauge));
  });
  s.centreNodeId = 'b';
  return s;
}

/** A chain b - n1 - n2 - ... with the given run lengths (a bus); gauges per run or one for all. */
export function chain(lengths: number[], gauge: Gauge | Gauge[] = 22): SurveyInput {
  const s = emptySurvey();
  s.nodes.push(node('b', 'block'));
  let previous = 'b';
  lengths.forEach((len, i) => {
    const id = `n${i + 1}`;
    s.nodes.push(node(id, 'jack'));
    s.runs.push(wall(`r${i + 1}`, previous, id, len, Array.isArray(gauge) ? gauge[i] : gauge));
    previous = id;
  });
  return s;
}

/** Adds an adapter on a reversing 7 ft cord at each named node. */
export function withAdapters(s: SurveyInput, at: string[]): SurveyInput {
  for (const id of at) {
    s.nodes.push(node(`a-${id}`, 'adapter'));
    s.runs.push(cord(`c-${id}`, id, `a-${id}`));
  }
  return s;
}

export function slugs(result: { checks: Array<{ slug: string }> }): string[] {
  return result.checks.map((c) => c.slug);
}
