/**
 * DOS path helpers that need no code page: split `C:\THREAD\TLRES.COM` into drive, folders and file, and
 * check each part against the 8.3 rules in ../dos/names.ts. Browser-safe.
 */
import { problemWith83Name, describeNameProblem, type NameProblem } from '../dos/names';

export type DosPath = { drive: string | null; absolute: boolean; parts: string[] };

/** Splits a DOS path; forward slashes are not separators in DOS, so only backslashes split. */
export function splitDosPath(path: string): DosPath {
  const m = /^([A-Za-z]):/.exec(path);
  const drive = m ? m[1].toUpperCase() : null;
  const rest = m ? path.slice(2) : path;
  return { drive, absolute: rest.startsWith('\\'), parts: rest.split('\\').filter((p) => p.length > 0) };
}

/** The last part (file name) of a path, upper-cased, e.g. "TLRES.COM". */
export function baseName(path: string): string {
  const cut = Math.max(path.lastIndexOf('\\'), /^[A-Za-z]:/.test(path) ? 1 : -1);
  return path.slice(cut + 1).toUpperCase();
}

/** The extension of the last part without the dot, upper-cased ("" when none). */
export function extensionOf(path: string): string {
  const base = baseName(path);
  const dot = base.lastIndexOf('.');
  return dot < 0 ? '' : base.slice(dot + 1);
}

/** The name without extension, upper-cased ("TLRES" for C:\THREAD\TLRES.COM). */
export function stemOf(path: string): string {
  const base = baseName(path);
  const dot = base.lastIndexOf('.');
  return dot < 0 ? base : base.slice(0, dot);
}

export type PathProblem = { part: string; problem: NameProblem; reason: string };

// Startup files name the same few programs again and again; remembering answers keeps planning fast.
const memo = new Map<string, PathProblem[]>();

/** Parts of a path that break the 8.3 rules or are device names; parts holding %VAR% are skipped. */
export function pathProblems(path: string): PathProblem[] {
  let found = memo.get(path);
  if (found === undefined) {
    if (memo.size > 2000) memo.clear();
    found = computeProblems(path);
    memo.set(path, found);
  }
  return found;
}

function computeProblems(path: string): PathProblem[] {
  const out: PathProblem[] = [];
  for (const part of splitDosPath(path).parts) {
    if (part.includes('%') || part === '.' || part === '..') continue;
    const problem = problemWith83Name(part);
    if (problem) out.push({ part, problem, reason: describeNameProblem(problem) });
  }
  return out;
}

/** Folder path normalised for comparison: upper case, no trailing backslash. */
export function normaliseFolder(path: string): string {
  return path.trim().toUpperCase().replace(/\\+$/, '');
}
