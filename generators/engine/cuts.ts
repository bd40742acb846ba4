/**
 * Where a block can go: position p (0..n) means "before line p" (n = at the end). A block there runs when
 * control falls from line p-1 into line p; jumps land on labels, so a block just before a label is skipped
 * by every GOTO to that label. A position is valid when every boot path crosses it (it dominates the end
 * of the boot) and it is not on a loop (so the block runs exactly once).
 *
 * Graphs are stored as edge lists in typed arrays: planning must stay fast (thousands of plans a second).
 */
import type { FlowGraph } from './flow';

/** A directed graph as linked edge lists: head[v] -> first edge, next[e] -> following edge, to[e]. */
class Graph {
  readonly head: Int32Array;
  readonly rhead: Int32Array;
  private next: Int32Array;
  private rnext: Int32Array;
  private to: Int32Array;
  private from: Int32Array;
  private edges = 0;

  constructor(readonly size: number, maxEdges: number) {
    this.head = new Int32Array(size).fill(-1);
    this.rhead = new Int32Array(size).fill(-1);
    this.next = new Int32Array(maxEdges);
    this.rnext = new Int32Array(maxEdges);
    this.to = new Int32Array(maxEdges);
    this.from = new Int32Array(maxEdges);
  }

  add(v: number, w: number): void {
    const e = this.edges++;
    this.to[e] = w;
    this.from[e] = v;
    this.next[e] = this.head[v];
    this.head[v] = e;
    this.rnext[e] = this.rhead[w];
    this.rhead[w] = e;
  }

  target(e: number): number {
    return this.to[e];
  }
  source(e: number): number {
    return this.from[e];
  }
  nextOut(e: number): number {
    return this.next[e];
  }
  nextIn(e: number): number {
    return this.rnext[e];
  }
}

/**
 * valid[p] for p in 0..n. `g` treats the final program as the end of the boot (the block must come before
 * it); `loops` is the same file with the final program returning, since a menu that runs it in a GOTO loop
 * comes back to the top and would run the block again.
 */
export function validCuts(g: FlowGraph, loops: FlowGraph = g): boolean[] {
  const n = g.n;
  const valid = new Array<boolean>(n + 1).fill(false);
  valid[0] = true;
  if (n === 0) return valid;
  const sink = n + 1;
  const ext = extendedGraph(g);
  const idom = dominators(ext, 0);
  if (idom[sink] === -1) return valid;
  const comp = components(loops);
  for (let v = idom[sink]; v !== 0; v = idom[v]) {
    if (v <= sink) continue;
    const p = v - sink;
    // The fall-through edge (p-1 -> p) lies on a loop when p-1 and p share a strongly connected part.
    if (comp[p - 1] !== comp[p]) valid[p] = true;
  }
  return valid;
}

/**
 * Lines and end of file (0..n), the sink n+1 that every end of boot goes to, and one node n+1+p for each
 * fall-through edge (p-1 -> p). Nodes that can never reach the sink (an endless GOTO loop) get an edge to it,
 * so an endless path also counts as a path that must cross the block.
 */
function extendedGraph(g: FlowGraph): Graph {
  const n = g.n;
  const sink = n + 1;
  let edges = 1;
  for (let i = 0; i < n; i++) edges += g.jumps[i].length + 3;
  const size = 2 * n + 2;
  const ext = new Graph(size, edges + size);
  for (let i = 0; i < n; i++) {
    if (g.falls[i]) {
      ext.add(i, sink + i + 1);
      ext.add(sink + i + 1, i + 1);
    }
    for (const j of g.jumps[i]) ext.add(i, j);
    if (g.ends[i]) ext.add(i, sink);
  }
  ext.add(n, sink);
  const reaches = new Uint8Array(size);
  const stack = new Int32Array(size);
  let top = 0;
  reaches[sink] = 1;
  stack[top++] = sink;
  while (top > 0) {
    const v = stack[--top];
    for (let e = ext.rhead[v]; e !== -1; e = ext.nextIn(e)) {
      const u = ext.source(e);
      if (!reaches[u]) (reaches[u] = 1), (stack[top++] = u);
    }
  }
  for (let v = 0; v < size; v++) if (!reaches[v]) ext.add(v, sink);
  return ext;
}

/** Immediate dominators (Cooper, Harvey & Kennedy, "A Simple, Fast Dominance Algorithm"); -1 = unreachable. */
function dominators(g: Graph, entry: number): Int32Array {
  const size = g.size;
  const post = new Int32Array(size).fill(-1);
  const order = new Int32Array(size);
  let count = 0;
  const stack = new Int32Array(size);
  const edgeAt = new Int32Array(size);
  const visited = new Uint8Array(size);
  let top = 0;
  stack[top++] = entry;
  edgeAt[entry] = g.head[entry];
  visited[entry] = 1;
  while (top > 0) {
    const v = stack[top - 1];
    const e = edgeAt[v];
    if (e !== -1) {
      edgeAt[v] = g.nextOut(e);
      const w = g.target(e);
      if (!visited[w]) (visited[w] = 1), (edgeAt[w] = g.head[w]), (stack[top++] = w);
    } else {
      post[v] = count;
      order[count++] = v;
      top--;
    }
  }
  const idom = new Int32Array(size).fill(-1);
  idom[entry] = entry;
  for (let changed = true; changed; ) {
    changed = false;
    for (let k = count - 1; k >= 0; k--) {
      const v = order[k];
      if (v === entry) continue;
      let d = -1;
      for (let e = g.rhead[v]; e !== -1; e = g.nextIn(e)) {
        const p = g.source(e);
        if (idom[p] === -1) continue;
        if (d === -1) {
          d = p;
          continue;
        }
        let a = p;
        let b = d;
        while (a !== b) {
          while (post[a] < post[b]) a = idom[a];
          while (post[b] < post[a]) b = idom[b];
        }
        d = a;
      }
      if (d !== idom[v]) (idom[v] = d), (changed = true);
    }
  }
  return idom;
}

/** Strongly connected components of nodes 0..n of the flow graph (Tarjan's algorithm, iterative). */
function components(g: FlowGraph): Int32Array {
  const count = g.n + 1;
  const index = new Int32Array(count).fill(-1);
  const low = new Int32Array(count);
  const comp = new Int32Array(count).fill(-1);
  const onStack = new Uint8Array(count);
  const stack = new Int32Array(count);
  const work = new Int32Array(count);
  const at = new Int32Array(count);
  let sp = 0;
  let next = 0;
  let compCount = 0;
  for (let root = 0; root < count; root++) {
    if (index[root] !== -1) continue;
    let wp = 0;
    work[wp++] = root;
    at[root] = 0;
    index[root] = low[root] = next++;
    stack[sp++] = root;
    onStack[root] = 1;
    while (wp > 0) {
      const v = work[wp - 1];
      const succ = g.succ[v];
      if (at[v] < succ.length) {
        const w = succ[at[v]++];
        if (index[w] === -1) {
          index[w] = low[w] = next++;
          stack[sp++] = w;
          onStack[w] = 1;
          at[w] = 0;
          work[wp++] = w;
        } else if (onStack[w] && index[w] < low[v]) low[v] = index[w];
        continue;
      }
      wp--;
      if (wp > 0) {
        const parent = work[wp - 1];
        if (low[v] < low[parent]) low[parent] = low[v];
      }
      if (low[v] === index[v]) {
        let w: number;
        do {
          w = stack[--sp];
          onStack[w] = 0;
          comp[w] = compCount;
        } while (w !== v);
        compCount++;
      }
    }
  }
  return comp;
}
