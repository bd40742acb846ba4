// Reads a unified diff into display lines with their numbers in the old and new file (no React here, so
// the API tests check it against the engine's own texts).
export type DiffLine = { type: 'add' | 'del' | 'same' | 'hunk' | 'file'; text: string; oldNo: number | null; newNo: number | null };

/** Reads `diff` output into lines with their numbers in the old and new file. */
export function parseUnifiedDiff(diff: string): DiffLine[] {
  const out: DiffLine[] = [];
  let oldNo = 0;
  let newNo = 0;
  for (const raw of diff.split('\n')) {
    const line = raw.replace(/\r$/, '');
    if (line.startsWith('--- ') || line.startsWith('+++ ') || line.startsWith('Index: ') || line.startsWith('====')) {
      if (line.startsWith('+++ ')) out.push({ type: 'file', text: line.slice(4).replace(/^b\//, ''), oldNo: null, newNo: null });
      continue;
    }
    const hunk = /^@@ -(\d+)(?:,\d+)? \+(\d+)(?:,\d+)? @@/.exec(line);
    if (hunk) {
      oldNo = Number(hunk[1]);
      newNo = Number(hunk[2]);
      out.push({ type: 'hunk', text: line, oldNo: null, newNo: null });
    } else if (line.startsWith('+')) out.push({ type: 'add', text: line.slice(1), oldNo: null, newNo: newNo++ });
    else if (line.startsWith('-')) out.push({ type: 'del', text: line.slice(1), oldNo: oldNo++, newNo: null });
    else if (line.startsWith(' ')) out.push({ type: 'same', text: line.slice(1), oldNo: oldNo++, newNo: newNo++ });
  }
  return out;
}
