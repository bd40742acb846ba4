/**
 * The shape of the network: star (every run from one centre), bus (one chain), mixed (a centre whose
 * spokes continue as chains), tree (branches away from the centre too), or empty.
 *
 * The shape is judged on the wiring core: adapters and splitters at the ends are set aside first, because
 * every jack has an adapter on a cord and that cord does not change the shape of the wall wiring.
 * A wiring with a loop is called mixed (it is none of the named shapes; a check says why).
 */
import type { CleanSurvey } from './clean-input';
import { summarisePath, type Edge, type Forest, type Graph } from './graph';
import type { Layout, Spoke } from './types';

export interface Topology {
  layout: Layout;
  /** The star's centre, or the node the network is seen from (chosen centre, block, main root). */
  hubNodeId: string | null;
  /** The chosen centre (or the block) is the hub of the shape. */
  hubExplicit: boolean;
}

function componentEdges(graph: Graph, members: Set<string>): Edge[] {
  return graph.edges.filter((e) => members.has(e.a));
}

/** Removes end adapters, then the splitters left as ends, until only the wall wiring remains. */
function wiringCore(survey: CleanSurvey, edges: Edge[], keep: string | null): Edge[] {
  let core = edges;
  for (;;) {
    const degree = new Map<string, number>();
    for (const e of core) {
      degree.set(e.a, (degree.get(e.a) ?? 0) + 1);
      degree.set(e.b, (degree.get(e.b) ?? 0) + 1);
    }
    const ends = new Set([...degree].filter(([id, d]) => {
      const kind = survey.nodeById.get(id)?.kind;
      return d === 1 && id !== keep && (kind === 'adapter' || kind === 'splitter');
    }).map(([id]) => id));
    const next = core.filter((e) => !ends.has(e.a) && !ends.has(e.b));
    if (next.length === core.length) return core;
    if (next.length === 0) return core;
    core = next;
  }
}

function chooseHub(survey: CleanSurvey, edges: Edge[], centre: string | null): { hub: string; explicit: boolean } {
  const degree = new Map<string, number>();
  for (const e of edges) {
    degree.set(e.a, (degree.get(e.a) ?? 0) + 1);
    degree.set(e.b, (degree.get(e.b) ?? 0) + 1);
  }
  if (centre !== null && degree.has(centre)) return { hub: centre, explicit: true };
  const blocks = [...degree.keys()].filter((id) => survey.nodeById.get(id)?.kind === 'block');
  if (blocks.length === 1) return { hub: blocks[0], explicit: true };
  let hub = survey.nodes.find((n) => degree.has(n.id))!.id;
  for (const n of survey.nodes) {
    if ((degree.get(n.id) ?? -1) > degree.get(hub)!) hub = n.id;
  }
  return { hub, explicit: false };
}

function classifyTree(edges: Edge[], hub: string, explicit: boolean): Layout {
  const degree = new Map<string, number>();
  for (const e of edges) {
    degree.set(e.a, (degree.get(e.a) ?? 0) + 1);
    degree.set(e.b, (degree.get(e.b) ?? 0) + 1);
  }
  const hubDegree = degree.get(hub) ?? 0;
  const allTouchHub = edges.every((e) => e.a === hub || e.b === hub);
  if (allTouchHub && (hubDegree >= 2 || explicit)) return 'star';
  const others = [...degree].filter(([id]) => id !== hub).map(([, d]) => d);
  if (hubDegree <= 2 && others.every((d) => d <= 2)) return 'bus';
  if (hubDegree >= 3 && others.every((d) => d <= 2)) return 'mixed';
  return 'tree';
}

export function classifyLayout(
  survey: CleanSurvey, graph: Graph, forest: Forest, main: number | null,
): Topology {
  const fallbackHub = survey.centreNodeId ?? survey.nodes.find((n) => n.kind === 'block')?.id ?? null;
  if (graph.edges.length === 0 || main === null) return { layout: 'empty', hubNodeId: fallbackHub, hubExplicit: false };
  const members = new Set(forest.components[main]);
  const edges = componentEdges(graph, members);
  if (edges.length === 0) return { layout: 'empty', hubNodeId: fallbackHub, hubExplicit: false };
  const hasLoop = forest.loopClosers.some((e) => members.has(e.a));
  const core = wiringCore(survey, edges, survey.centreNodeId);
  const { hub, explicit } = chooseHub(survey, core, survey.centreNodeId);
  if (hasLoop) return { layout: 'mixed', hubNodeId: hub, hubExplicit: explicit };
  return { layout: classifyTree(core, hub, explicit), hubNodeId: hub, hubExplicit: explicit };
}

/** Each spoke of a star: the nodes behind one run from the hub, and the longest path into them. */
export function starSpokes(graph: Graph, hub: string): Spoke[] {
  return graph.neighbours.get(hub)!.map(({ edge, other }) => {
    // Parent links and distances, not copied paths: a spoke may hold a long chain of cords.
    const via = new Map<string, { edge: Edge; parent: string | null }>([[other, { edge, parent: null }]]);
    const distance = new Map<string, number>([[other, edge.lengthFt]]);
    const order = [other];
    for (let i = 0; i < order.length; i += 1) {
      const node = order[i];
      for (const next of graph.neighbours.get(node)!) {
        if (next.other === hub || via.has(next.other)) continue;
        via.set(next.other, { edge: next.edge, parent: node });
        distance.set(next.other, distance.get(node)! + next.edge.lengthFt);
        order.push(next.other);
      }
    }
    let far = other;
    for (const node of order) if (distance.get(node)! > distance.get(far)!) far = node;
    const path: Edge[] = [];
    for (let at: string | null = far; at !== null; at = via.get(at)!.parent) path.unshift(via.get(at)!.edge);
    return { firstRunId: edge.runId, nodeIds: order, farthest: summarisePath(hub, far, path) };
  });
}
