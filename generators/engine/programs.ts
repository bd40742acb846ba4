/**
 * The programs a boot runs: the boot preview, the candidates for "final program" and its detection.
 * By default the final program is the last external program that some boot path reaches and that is not
 * known to return at once (a menu, WIN, an application, or a hand-off to another batch file).
 */
import { innermost } from './batch-syntax';
import { stemOf } from './dos-path';
import { isKnownReturning } from './known-programs';
import { isTurnedOff } from './markers';
import type { BatchLine } from './model';

export type BootStep = { line: number; program: string; args: string; conditional?: boolean };
export type Candidate = { line: number; program: string; text: string };

/** The program (path as written) and arguments a line runs, or null when it runs no program. */
export function programOf(line: BatchLine): { program: string; args: string; call: boolean } | null {
  const s = innermost(line.stmt);
  if (s.kind === 'program') return { program: s.path, args: s.args.trim(), call: false };
  if (s.kind === 'call') return { program: s.target, args: s.args.trim(), call: true };
  return null;
}

/**
 * Boot steps of `lines` in file order, for the lines `reach` marks (a walk that treats the final program as
 * returning, since what follows it runs once it exits). `lineNo` maps an index to its 1-based file line.
 */
export function bootSteps(lines: readonly BatchLine[], reach: readonly boolean[], lineNo: (i: number) => number): BootStep[] {
  const out: BootStep[] = [];
  lines.forEach((line, i) => {
    if (!reach[i]) return;
    const p = programOf(line);
    if (!p) return;
    const step: BootStep = { line: lineNo(i), program: p.program, args: p.args };
    if (line.stmt.kind === 'if' || line.stmt.kind === 'for') step.conditional = true;
    out.push(step);
  });
  return out;
}

/** Indexes of lines the technician may pick as the final program. */
export function candidateIndexes(lines: readonly BatchLine[], reach: readonly boolean[], loaderStem: string): number[] {
  const out: number[] = [];
  lines.forEach((line, i) => {
    if (!reach[i] || isTurnedOff(line.text) || line.stmt.kind === 'for') return;
    const p = programOf(line);
    if (!p) return;
    const stem = stemOf(p.program);
    if (stem === 'MODE' || stem === loaderStem) return;
    out.push(i);
  });
  return out;
}

/** The detected final program: the last candidate that is not a CALL and not known to return. */
export function detectFinal(lines: readonly BatchLine[], candidates: readonly number[]): number | null {
  for (let k = candidates.length - 1; k >= 0; k--) {
    const p = programOf(lines[candidates[k]])!;
    if (p.call || p.program.includes('%')) continue;
    if (!isKnownReturning(stemOf(p.program))) return candidates[k];
  }
  return null;
}
