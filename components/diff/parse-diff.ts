// Reads a unified diff (the engine's, one file) into rows with the line numbers of both files, and pairs
// them for the side-by-side view. Browser-safe: only the `diff` package's parser.
import { parsePatch } from 'diff';

export type RowKind = 'context' | 'add' | 'del';

export type DiffRow = { kind: RowKind; oldNo: number | null; newNo: number | null; text: string; noEol?: boolean };

export type DiffHunk = { header: string; oldStart: number; newStart: number; rows: DiffRow[] };

/** One row of the side-by-side view: the old file's line on the left, the new file's on the right. */
export type SideRow = { left: DiffRow | null; right: DiffRow | null };

/** Control bytes a DOS file may hold, shown as a caret name so they are seen, not lost (Ctrl-Z ends many files). */
export function displayText(raw: string): string {
  const text = raw.endsWith('\r') ? raw.slice(0, -1) : raw;
  return text.replace(/[\u0000-\u0008\u000b-\u001f]/g, (c) => `^${String.fromCharCode(c.charCodeAt(0) + 64)}`);
}

/** Parses a one-file unified diff; '' (no change) gives no hunks. */
export function parseUnifiedDiff(diff: string): DiffHunk[] {
  if (!diff.trim()) return [];
  const [patch] = parsePatch(diff);
  if (!patch) return [];
  return patch.hunks.map((h) => {
    let oldNo = h.oldStart;
    let newNo = h.newStart;
    const rows: DiffRow[] = [];
    for (const line of h.lines) {
      const sign = line[0];
      const text = displayText(line.slice(1));
      if (sign === '\\') {
        const last = rows[rows.length - 1];
        if (last) last.noEol = true;
      } else if (sign === '+') rows.push({ kind: 'add', oldNo: null, newNo: newNo++, text });
      else if (sign === '-') rows.push({ kind: 'del', oldNo: oldNo++, newNo: null, text });
      else rows.push({ kind: 'context', oldNo: oldNo++, newNo: newNo++, text });
    }
    // An empty old file is written "-0,0"; its first line is 1.
    const header = `@@ -${h.oldStart},${h.oldLines} +${h.newStart},${h.newLines} @@`;
    return { header, oldStart: h.oldStart, newStart: h.newStart, rows };
  });
}

/** Pairs each run of removed lines with the added lines after it, so a changed line sits beside its new form. */
export function sideBySide(rows: DiffRow[]): SideRow[] {
  const out: SideRow[] = [];
  let i = 0;
  while (i < rows.length) {
    const row = rows[i]!;
    if (row.kind === 'context') {
      out.push({ left: row, right: row });
      i++;
      continue;
    }
    const dels: DiffRow[] = [];
    const adds: DiffRow[] = [];
    while (i < rows.length && rows[i]!.kind === 'del') dels.push(rows[i++]!);
    while (i < rows.length && rows[i]!.kind === 'add') adds.push(rows[i++]!);
    for (let k = 0; k < Math.max(dels.length, adds.length); k++) out.push({ left: dels[k] ?? null, right: adds[k] ?? null });
  }
  return out;
}

/** Lines added and removed in the whole diff. */
export function countChanges(hunks: DiffHunk[]): { added: number; removed: number } {
  let added = 0;
  let removed = 0;
  for (const h of hunks) for (const r of h.rows) r.kind === 'add' ? added++ : r.kind === 'del' ? removed++ : 0;
  return { added, removed };
}
