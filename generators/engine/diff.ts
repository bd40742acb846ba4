/**
 * Unified diffs made with the `diff` package, file names under a/ and b/ so `patch -p1` applies them.
 * Text is the decoded code page 437 (one character per byte), so encoding the diff gives the file's bytes.
 */
import { createTwoFilesPatch } from 'diff';
import type { StartupFileName } from './check';

/** The unified diff from `before` (null: no such file) to `after`; '' when nothing changes. */
export function unifiedDiff(name: StartupFileName, before: string | null, after: string): string {
  if (before === after) return '';
  const patch = createTwoFilesPatch(`a/${name}`, `b/${name}`, before ?? '', after, undefined, undefined, { context: 3 });
  // The package starts with a line of "=" signs; patch skips it, but the lead reads the diff more easily without.
  return patch.replace(/^=+\n/, '');
}
