/**
 * The wiring as a graph: nodes joined by runs. A breadth-first spanning forest gives every node one
 * path back to its root; runs that are not part of the forest close a loop in the wiring.
 */
import type { CleanRun, CleanSurvey } from './clean-input';
import { loopOhms } from './gauge';
import type { SurveyPath } from './types';

export interface Edge {
  runId: string;
  a: string;
  b: string;
  /** Zero when the entered length is unusable (then `complete` is false). */
  lengthFt: number;
  loopOhms: number;
  reverses: boolean;
  complete: boolean;
}

export interface Graph {
  /** Every known node, in input order. */
  nodeIds: string[];
  edges: Edge[];
  neighbours: Map<string, Array<{ edge: Edge; other: string }>>;
}

export interface Forest {
  /** The run that leads from a node towards its root; null for a root. */
  up: Map<string, { edge: Edge; parent: string } | null>;
  depth: Map<string, number>;
  /** Components in discovery order, each listed from its root outwards. */
  components: string[][];
  componentOf: Map<string, number>;
  /** Runs outside the forest: each one closes a loop. */
  loopClosers: Edge[];
}

function toEdge(run: CleanRun): Edge {
  const complete = run.lengthFt !== null && run.gauge !== null;
  const lengthFt = run.lengthFt ?? 0;
  return {
    runId: run.id,
    a: run.from,
    b: run.to,
    lengthFt,
    loopOhms: run.gauge !== null ? loopOhms(run.gauge, lengthFt) : 0,
    reverses: run.reverses,
    complete,
  };
}

export function buildGraph(survey: CleanSurvey): Graph {
  const nodeIds = survey.nodes.map((n) => n.id);
  const neighbours = new Map<string, Array<{ edge: Edge; other: string }>>(nodeIds.map((id) => [id, []]));
  const edges = survey.runs.filter((r) => r.inGraph).map(toEdge);
  for (const edge of edges) {
    neighbours.get(edge.a)!.push({ edge, other: edge.b });
    if (edge.b !== edge.a) neighbours.get(edge.b)!.push({ edge, other: edge.a });
  }
  return { nodeIds, edges, neighbours };
}

/** Breadth-first forest; roots are tried in `rootOrder` first, then in input order. */
export function spanningForest(graph: Graph, rootOrder: string[]): Forest {
  const up: Forest['up'] = new Map();
  const depth = new Map<string, number>();
  const componentOf = new Map<string, number>();
  const components: string[][] = [];
  const treeRuns = new Set<string>();
  for (const root of [...rootOrder, ...graph.nodeIds]) {
    if (up.has(root) || !graph.neighbours.has(root)) continue;
    const component: string[] = [root];
    up.set(root, null);
    depth.set(root, 0);
    componentOf.set(root, components.length);
    for (let i = 0; i < component.length; i += 1) {
      const node = component[i];
      for (const { edge, other } of graph.neighbours.get(node)!) {
        if (up.has(other)) continue;
        up.set(other, { edge, parent: node });
        depth.set(other, depth.get(node)! + 1);
        componentOf.set(other, components.length);
        treeRuns.add(edge.runId);
        component.push(other);
      }
    }
    components.push(component);
  }
  const loopClosers = graph.edges.filter((e) => !treeRuns.has(e.runId));
  return { up, depth, components, componentOf, loopClosers };
}

/** The forest path from `from` to `to`, as runs in order, or null when they are not connected. */
export function forestPath(forest: Forest, from: string, to: string): Edge[] | null {
  if (forest.componentOf.get(from) === undefined || forest.componentOf.get(from) !== forest.componentOf.get(to)) {
    return null;
  }
  const head: Edge[] = [];
  const tail: Edge[] = [];
  let u = from;
  let v = to;
  while (u !== v) {
    if (forest.depth.get(u)! >= forest.depth.get(v)!) {
      const step = forest.up.get(u)!;
      head.push(step.edge);
      u = step.parent;
    } else {
      const step = forest.up.get(v)!;
      tail.push(step.edge);
      v = step.parent;
    }
  }
  return [...head, ...tail.reverse()];
}

/** Length, resistance and reversals along a list of runs. */
export function summarisePath(from: string, to: string, edges: Edge[]): SurveyPath {
  return {
    fromNodeId: from,
    toNodeId: to,
    runIds: edges.map((e) => e.runId),
    lengthFt: edges.reduce((sum, e) => sum + e.lengthFt, 0),
    loopOhms: edges.reduce((sum, e) => sum + e.loopOhms, 0),
    reversals: edges.filter((e) => e.reverses).length,
    complete: edges.every((e) => e.complete),
  };
}

/** Number of runs at each node; a run from a node to itself counts twice, as in graph theory. */
export function degrees(graph: Graph, edges: Edge[] = graph.edges): Map<string, number> {
  const degree = new Map<string, number>(graph.nodeIds.map((id) => [id, 0]));
  for (const e of edges) {
    degree.set(e.a, degree.get(e.a)! + 1);
    degree.set(e.b, degree.get(e.b)! + 1);
  }
  return degree;
}
