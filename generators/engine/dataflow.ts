/**
 * Facts that must hold on every path into a point of AUTOEXEC.BAT: "PATH holds the DOS folder" and "ECHO is
 * off". A forward must-analysis over the flow graph: a fact holds at a line when it holds after every line
 * that can come just before it.
 */
import { innermost, isConditional, type Statement } from './batch-syntax';
import { reachable, successors, type FlowGraph } from './flow';
import { normaliseFolder } from './dos-path';
import type { BatchLine } from './model';

/** after[i]: the fact holds after line i runs (i in 0..n-1); index n is the fact at the end of the file. */
export function mustHold(
  g: FlowGraph,
  lines: readonly BatchLine[],
  transfer: (line: BatchLine, before: boolean) => boolean,
  atStart: boolean,
): boolean[] {
  const count = g.n + 1;
  const preds = reachedPredecessors(g);
  const out = new Array<boolean>(count).fill(true);
  // A line no path reaches gets "false": nothing is promised there.
  const inState = (i: number): boolean => {
    if (i !== 0 && preds[i].length === 0) return false;
    let v = i === 0 ? atStart : true;
    for (const p of preds[i]) v = v && out[p];
    return v;
  };
  for (let changed = true; changed; ) {
    changed = false;
    for (let i = 0; i < count; i++) {
      const v = i < g.n ? transfer(lines[i], inState(i)) : inState(i);
      if (v !== out[i]) (out[i] = v), (changed = true);
    }
  }
  return out;
}

// Only lines a path reaches count as predecessors: a line after the final program must not spoil a fact.
const predCache = new WeakMap<FlowGraph, number[][]>();

function reachedPredecessors(g: FlowGraph): number[][] {
  let preds = predCache.get(g);
  if (!preds) {
    const reach = reachable(g);
    const list: number[][] = new Array(g.n + 1);
    for (let i = 0; i <= g.n; i++) list[i] = [];
    for (let i = 0; i < g.n; i++) if (reach[i]) for (const j of successors(g, i)) list[j].push(i);
    preds = list;
    predCache.set(g, preds);
  }
  return preds;
}

/** The fact just before position p (0 = start of the file), for a block placed there. */
export function holdsBefore(after: boolean[], p: number, atStart: boolean): boolean {
  return p === 0 ? atStart : after[p - 1];
}

/** Transfer for "PATH holds `dosDir`": PATH and SET PATH lines change it (REFERENCES 2.12 PATH). */
export function pathTransfer(dosDir: string, bootDrive: string) {
  const wanted = normaliseFolder(dosDir);
  const onBoot = wanted.startsWith(`${bootDrive.toUpperCase()}:`) ? wanted.slice(2) : null;
  return (line: BatchLine, before: boolean): boolean => {
    const value = pathValue(innermost(line.stmt));
    if (value === null) return before;
    const entries = value.split(';').map(normaliseFolder);
    const has = entries.some((e) => e === wanted || (onBoot !== null && e === onBoot) || (e === '%PATH%' && before));
    // A PATH under IF may or may not run, so afterwards the fact holds only if it holds either way.
    return isConditional(line.stmt) ? has && before : has;
  };
}

/** The new PATH a statement sets, '' when it clears PATH, or null when it leaves PATH alone. */
export function pathValue(stmt: Statement): string | null {
  if (stmt.kind !== 'internal') return null;
  if (stmt.command === 'PATH') {
    const value = stmt.args.replace(/^[ \t=]+/, '').trim();
    if (value === '') return null;
    return value === ';' ? '' : value;
  }
  if (stmt.command === 'SET') {
    const m = /^[ \t]+PATH=(.*)$/i.exec(stmt.args);
    return m ? m[1].trim() : null;
  }
  return null;
}

/**
 * Transfer for "ECHO is off". Before DOS 3.3 a line starting with @ fails (REFERENCES 2.1), so
 * `@ECHO OFF` turns nothing off there.
 */
export function echoTransfer(atSignWorks: boolean) {
  return (line: BatchLine, before: boolean): boolean => (line.atSign && !atSignWorks ? before : echoStep(line, before));
}

function echoStep(line: BatchLine, before: boolean): boolean {
  const s = innermost(line.stmt);
  if (s.kind !== 'internal' || s.command !== 'ECHO') return before;
  const word = s.args.trim().toUpperCase();
  if (word !== 'OFF' && word !== 'ON') return before;
  if (isConditional(line.stmt)) return before && word === 'OFF';
  return word === 'OFF';
}
