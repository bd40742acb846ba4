/**
 * Where a block can go: position p (0..n) means "before line p" (n = at the end). A block there runs when
 * control falls from line p-1 into line p; jumps land on labels, so a block just before a label is skipped
 * by every GOTO to that label. A position is valid when every boot path crosses it (it dominates the end
 * of the boot) and it is not on a loop (so the block runs exactly once).
 */
import { successors, type FlowGraph } from './flow';

/** valid[p] for p in 0..n. */
export function validCuts(g: FlowGraph): boolean[] {
  const n = g.n;
  const valid = new Array<boolean>(n + 1).fill(false);
  valid[0] = true;
  if (n === 0) return valid;
  const ext = extendedGraph(g);
  const idom = dominators(ext.succ, 0);
  const sink = n + 1;
  if (idom[sink] === -1) return valid;
  const cyclic = loopEdges(g);
  for (let v = idom[sink]; v !== 0; v = idom[v]) {
    if (v > sink) {
      const p = v - sink;
      if (!cyclic[p]) valid[p] = true;
    }
  }
  return valid;
}

/**
 * Lines and end of file (0..n), the sink n+1 that every end of boot goes to, and one node n+1+p for each
 * fall-through edge (p-1 -> p). Nodes that can never reach the sink (an endless GOTO loop) get an edge to it,
 * so an endless path also counts as a path that must cross the block.
 */
function extendedGraph(g: FlowGraph): { succ: number[][] } {
  const n = g.n;
  const sink = n + 1;
  const succ: number[][] = Array.from({ length: 2 * n + 2 }, () => []);
  for (let i = 0; i < n; i++) {
    if (g.falls[i]) {
      succ[i].push(sink + i + 1);
      succ[sink + i + 1].push(i + 1);
    }
    for (const j of g.jumps[i]) succ[i].push(j);
    if (g.ends[i]) succ[i].push(sink);
  }
  succ[n].push(sink);
  const reaches = reachesSink(succ, sink);
  for (let v = 0; v < succ.length; v++) if (!reaches[v] && v !== sink) succ[v].push(sink);
  return { succ };
}

function reachesSink(succ: number[][], sink: number): boolean[] {
  const preds: number[][] = succ.map(() => []);
  succ.forEach((list, v) => list.forEach((w) => preds[w].push(v)));
  const seen = new Array<boolean>(succ.length).fill(false);
  const stack = [sink];
  seen[sink] = true;
  while (stack.length > 0) {
    const v = stack.pop()!;
    for (const u of preds[v]) if (!seen[u]) (seen[u] = true), stack.push(u);
  }
  return seen;
}

/** Immediate dominators (Cooper, Harvey & Kennedy, "A Simple, Fast Dominance Algorithm"); -1 = unreachable. */
export function dominators(succ: number[][], entry: number): Int32Array {
  const count = succ.length;
  const post = new Int32Array(count).fill(-1);
  const order: number[] = [];
  const stack: [number, number][] = [[entry, 0]];
  const visited = new Uint8Array(count);
  visited[entry] = 1;
  while (stack.length > 0) {
    const top = stack[stack.length - 1];
    const [v, k] = top;
    if (k < succ[v].length) {
      top[1]++;
      const w = succ[v][k];
      if (!visited[w]) (visited[w] = 1), stack.push([w, 0]);
    } else {
      post[v] = order.length;
      order.push(v);
      stack.pop();
    }
  }
  const preds: number[][] = succ.map(() => []);
  succ.forEach((list, v) => {
    if (visited[v]) list.forEach((w) => preds[w].push(v));
  });
  const idom = new Int32Array(count).fill(-1);
  idom[entry] = entry;
  const intersect = (a: number, b: number): number => {
    while (a !== b) {
      while (post[a] < post[b]) a = idom[a];
      while (post[b] < post[a]) b = idom[b];
    }
    return a;
  };
  for (let changed = true; changed; ) {
    changed = false;
    for (let k = order.length - 1; k >= 0; k--) {
      const v = order[k];
      if (v === entry) continue;
      let d = -1;
      for (const p of preds[v]) if (idom[p] !== -1) d = d === -1 ? p : intersect(p, d);
      if (d !== idom[v]) (idom[v] = d), (changed = true);
    }
  }
  return idom;
}

/** cyclic[p]: the fall-through edge (p-1 -> p) lies on a loop, i.e. p-1 and p share a strongly connected part. */
function loopEdges(g: FlowGraph): boolean[] {
  const comp = components(g);
  const out = new Array<boolean>(g.n + 1).fill(false);
  for (let p = 1; p <= g.n; p++) out[p] = g.falls[p - 1] && comp[p - 1] === comp[p];
  return out;
}

/** Strongly connected components of nodes 0..n (Tarjan's algorithm, iterative). */
function components(g: FlowGraph): Int32Array {
  const count = g.n + 1;
  const index = new Int32Array(count).fill(-1);
  const low = new Int32Array(count);
  const comp = new Int32Array(count).fill(-1);
  const onStack = new Uint8Array(count);
  const stack: number[] = [];
  let next = 0;
  let compCount = 0;
  for (let root = 0; root < count; root++) {
    if (index[root] !== -1) continue;
    const work: [number, number[], number][] = [[root, successors(g, root), 0]];
    index[root] = low[root] = next++;
    stack.push(root);
    onStack[root] = 1;
    while (work.length > 0) {
      const frame = work[work.length - 1];
      const [v, succ, k] = frame;
      if (k < succ.length) {
        frame[2]++;
        const w = succ[k];
        if (index[w] === -1) {
          index[w] = low[w] = next++;
          stack.push(w);
          onStack[w] = 1;
          work.push([w, successors(g, w), 0]);
        } else if (onStack[w]) low[v] = Math.min(low[v], index[w]);
        continue;
      }
      work.pop();
      if (work.length > 0) {
        const parent = work[work.length - 1][0];
        low[parent] = Math.min(low[parent], low[v]);
      }
      if (low[v] === index[v]) {
        let w: number;
        do {
          w = stack.pop()!;
          onStack[w] = 0;
          comp[w] = compCount;
        } while (w !== v);
        compCount++;
      }
    }
  }
  return comp;
}
