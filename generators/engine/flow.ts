/**
 * The control-flow graph of AUTOEXEC.BAT: lines are nodes; a line falls through to the next, GOTO jumps to
 * the first label whose first 8 characters match (REFERENCES 2.8 [M4C] TBATCH2.ASM), IF and FOR may or may
 * not run their command, CALL returns (2.2), a .BAT hand-off never does (2.3), EXIT and the final program end
 * the boot. A GOTO to a missing label ends the batch file ("Label not found", 2.8).
 */
import { innermost, labelKey, type Statement } from './batch-syntax';
import type { BatchLine } from './model';

export type FlowGraph = {
  /** Lines in the graph; node `n` is the end of the file. */
  n: number;
  /** Line i goes on to line i+1 (or to the end of the file). */
  falls: boolean[];
  /** Labels line i may jump to. */
  jumps: number[][];
  /** Line i may end the boot here (hand-off, EXIT, final program, missing label). */
  ends: boolean[];
  /** GOTO lines whose label is not in the file, with the missing name. */
  missingLabels: { line: number; label: string }[];
  /** Successors of each node 0..n (jumps, then the next line when it falls through). */
  succ: number[][];
};

export type FlowOptions = {
  /** Index of the program that may never return, or null. */
  finalIndex: number | null;
  /** Block names a DOS 6 menu can put in %CONFIG% (REFERENCES 2.23), or null when unknown. */
  configChoices: string[] | null;
};

/** Builds the graph of `lines` (a view of the file, without our own block). */
export function buildFlow(lines: readonly BatchLine[], options: FlowOptions): FlowGraph {
  const labels = new Map<string, number>();
  lines.forEach((l, i) => {
    if (l.stmt.kind === 'label' && !labels.has(labelKey(l.stmt.name))) labels.set(labelKey(l.stmt.name), i);
  });
  const g: FlowGraph = { n: lines.length, falls: [], jumps: [], ends: [], missingLabels: [], succ: [] };
  lines.forEach((line, i) => {
    const e = effectOf(line.stmt, i === options.finalIndex, labels, options.configChoices);
    g.falls.push(e.falls);
    g.jumps.push(e.jumps);
    g.ends.push(e.ends);
    g.succ.push(e.falls ? [...e.jumps, i + 1] : e.jumps);
    for (const label of e.missing) g.missingLabels.push({ line: i, label });
  });
  g.succ.push([]);
  return g;
}

type Effect = { falls: boolean; jumps: number[]; ends: boolean; missing: string[] };

function effectOf(stmt: Statement, isFinal: boolean, labels: Map<string, number>, choices: string[] | null): Effect {
  if (stmt.kind === 'if' || stmt.kind === 'for') {
    const inner = effectOf(stmt.then, isFinal, labels, choices);
    return { ...inner, falls: true };
  }
  switch (stmt.kind) {
    case 'goto':
      return gotoEffect(stmt, labels, choices);
    case 'exit':
      return { falls: false, jumps: [], ends: true, missing: [] };
    case 'program':
      return stmt.handoff || isFinal ? { falls: false, jumps: [], ends: true, missing: [] } : plain();
    default:
      return plain();
  }
}

const NONE: number[] = [];
const PLAIN: Effect = { falls: true, jumps: NONE, ends: false, missing: [] };

function plain(): Effect {
  return PLAIN;
}

function gotoEffect(stmt: Extract<Statement, { kind: 'goto' }>, labels: Map<string, number>, choices: string[] | null): Effect {
  if (!stmt.dynamic) {
    const target = labels.get(labelKey(stmt.target));
    if (target !== undefined) return { falls: false, jumps: [target], ends: false, missing: [] };
    return { falls: false, jumps: [], ends: true, missing: [stmt.target] };
  }
  // GOTO %CONFIG% with a known menu goes to one label per menu block; otherwise any label, or none.
  if (choices && /^%CONFIG%$/i.test(stmt.target)) {
    const jumps: number[] = [];
    const missing: string[] = [];
    for (const choice of choices) {
      const t = labels.get(labelKey(choice));
      if (t === undefined) missing.push(choice);
      else if (!jumps.includes(t)) jumps.push(t);
    }
    return { falls: false, jumps, ends: missing.length > 0, missing };
  }
  return { falls: false, jumps: [...new Set(labels.values())], ends: true, missing: [] };
}

/** Successors of node i in 0..n (n = end of file); ends are not listed. */
export function successors(g: FlowGraph, i: number): number[] {
  return g.succ[i];
}

/** Nodes (0..n) reachable from the first line. */
export function reachable(g: FlowGraph): boolean[] {
  const seen = new Array<boolean>(g.n + 1).fill(false);
  const stack = [0];
  seen[0] = true;
  while (stack.length > 0) {
    const i = stack.pop()!;
    for (const j of successors(g, i)) {
      if (!seen[j]) {
        seen[j] = true;
        stack.push(j);
      }
    }
  }
  return seen;
}

/** The statement a line runs when it runs (IF/FOR unwrapped). */
export function runs(line: BatchLine): Statement {
  return innermost(line.stmt);
}
