/**
 * Unified diffs of our edits, file names under a/ and b/ so `patch -p1` applies them. The hunks are derived
 * from the edits (STYLE.md: the diff comes from the edits, not the other way round) and printed by the
 * `diff` package's formatPatch. Lines are split at LF as GNU patch and the `diff` package split them, so a
 * CR LF line keeps its CR inside the line and a CR-only file is one long line.
 * Text is the decoded code page 437 (one character per byte), so encoding the diff gives the file's bytes.
 */
import { FILE_HEADERS_ONLY, formatPatch, type StructuredPatch, type StructuredPatchHunk } from 'diff';
import type { StartupFileName } from './check';
import { applyEdits, sortEdits, type Edit } from './edits';

const CONTEXT = 3;
const NO_NEWLINE = '\\ No newline at end of file';

/** One changed stretch: old LF-lines [oldStart, oldStart + oldCount) become `lines` (0-based). */
type Change = { oldStart: number; oldCount: number; lines: string[]; endsWithoutNewline: boolean };

/** LF-lines of a text that starts at a line start: contents without the LF, and whether the last lacks one. */
function lfLines(text: string): { lines: string[]; open: boolean } {
  if (text === '') return { lines: [], open: false };
  const lines = text.split('\n');
  const open = lines[lines.length - 1] !== '';
  if (!open) lines.pop();
  return { lines, open };
}

function countLf(text: string, end: number): number {
  let n = 0;
  for (let i = text.indexOf('\n'); i >= 0 && i < end; i = text.indexOf('\n', i + 1)) n++;
  return n;
}

/** Widens each edit to whole LF-lines and merges edits that touch the same lines. */
function changesOf(source: string, edits: readonly Edit[]): Change[] {
  const regions: { a: number; b: number; edits: Edit[] }[] = [];
  for (const e of sortEdits(edits)) {
    const a = e.offset === 0 ? 0 : source.lastIndexOf('\n', e.offset - 1) + 1;
    const pureInsert = e.length === 0 && e.offset === a && e.text.endsWith('\n');
    let b = a;
    if (!pureInsert) {
      const nl = source.indexOf('\n', e.length === 0 ? e.offset : e.offset + e.length - 1);
      b = nl < 0 ? source.length : nl + 1;
    }
    const last = regions[regions.length - 1];
    if (last && a <= last.b) {
      last.b = Math.max(last.b, b);
      last.edits.push(e);
    } else regions.push({ a, b, edits: [e] });
  }
  return regions.map((r) => {
    const shifted = r.edits.map((e) => ({ ...e, offset: e.offset - r.a }));
    return trimmed(countLf(source, r.a), lfLines(source.slice(r.a, r.b)), lfLines(applyEdits(source.slice(r.a, r.b), shifted)));
  });
}

/** Drops lines a rewrite leaves as they were at either end, so a rewritten block shows only what differs. */
function trimmed(start: number, old: { lines: string[]; open: boolean }, next: { lines: string[]; open: boolean }): Change {
  const a = [...old.lines];
  const b = [...next.lines];
  let aOpen = old.open;
  let bOpen = next.open;
  let oldStart = start;
  const closed = (list: string[], open: boolean) => !(list.length === 1 && open);
  while (a.length > 0 && b.length > 0 && a[0] === b[0] && closed(a, aOpen) && closed(b, bOpen)) {
    a.shift();
    b.shift();
    oldStart++;
  }
  while (a.length > 0 && b.length > 0 && a[a.length - 1] === b[b.length - 1] && aOpen === bOpen) {
    a.pop();
    b.pop();
    aOpen = bOpen = false;
  }
  return { oldStart, oldCount: a.length, lines: b, endsWithoutNewline: bOpen };
}

/** The unified diff from `before` (null: no such file) through `edits`; '' when nothing changes. */
export function editsDiff(name: StartupFileName, before: string | null, edits: readonly Edit[]): string {
  const source = before ?? '';
  const after = applyEdits(source, edits);
  if (before !== null && after === source) return '';
  const old = lfLines(source);
  const changes = changesOf(source, edits).filter((c) => c.oldCount > 0 || c.lines.length > 0);
  const hunks: StructuredPatchHunk[] = [];
  let delta = 0;
  for (let i = 0; i < changes.length; ) {
    let j = i;
    while (j + 1 < changes.length && changes[j + 1].oldStart - (changes[j].oldStart + changes[j].oldCount) <= 2 * CONTEXT) j++;
    hunks.push(hunkOf(changes.slice(i, j + 1), old, delta));
    for (let k = i; k <= j; k++) delta += changes[k].lines.length - changes[k].oldCount;
    i = j + 1;
  }
  const patch: StructuredPatch = { oldFileName: `a/${name}`, newFileName: `b/${name}`, oldHeader: undefined, newHeader: undefined, hunks };
  return formatPatch(patch, FILE_HEADERS_ONLY);
}

function hunkOf(group: Change[], old: { lines: string[]; open: boolean }, delta: number): StructuredPatchHunk {
  const lastOld = old.lines.length - 1;
  const from = Math.max(0, group[0].oldStart - CONTEXT);
  const end = group[group.length - 1];
  const to = Math.min(old.lines.length, end.oldStart + end.oldCount + CONTEXT);
  const lines: string[] = [];
  const context = (k: number) => {
    lines.push(` ${old.lines[k]}`);
    if (k === lastOld && old.open) lines.push(NO_NEWLINE);
  };
  let at = from;
  let added = 0;
  for (const c of group) {
    for (; at < c.oldStart; at++) context(at);
    for (let k = c.oldStart; k < c.oldStart + c.oldCount; k++) {
      lines.push(`-${old.lines[k]}`);
      if (k === lastOld && old.open) lines.push(NO_NEWLINE);
    }
    c.lines.forEach((l, k) => {
      lines.push(`+${l}`);
      if (k === c.lines.length - 1 && c.endsWithoutNewline) lines.push(NO_NEWLINE);
    });
    at = c.oldStart + c.oldCount;
    added += c.lines.length - c.oldCount;
  }
  for (; at < to; at++) context(at);
  const oldLines = to - from;
  return { oldStart: from + 1, oldLines, newStart: from + 1 + delta, newLines: oldLines + added, lines };
}
