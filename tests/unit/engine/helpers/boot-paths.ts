/** Checks, with the test interpreter, that every boot path runs our block's commands once, in order. */
import { blockRange } from './outside-block';
import { batchLines, parseCmd, walkPaths } from './walker';

export function bootPathProblems(after: string, finalLine: number | null, choices: string[] | null): string[] {
  const range = blockRange(after);
  if (!range) return ['the new file has no block'];
  const blockProgramLines = batchLines(after)
    .map((raw, i) => ({ no: i + 1, cmd: parseCmd(raw) }))
    .filter((l) => l.no > range.start && l.no < range.end && (l.cmd.t === 'run' || l.cmd.t === 'call'))
    .map((l) => l.no);
  if (blockProgramLines.length < 2) return ['the block runs fewer than two programs'];
  const paths = walkPaths(after, { finalLine, configChoices: choices });
  const problems: string[] = [];
  for (const path of paths) {
    const seen = path.events.filter((e) => e.line > range.start && e.line < range.end).map((e) => e.line);
    // A path cut short in a loop may still reach the block later; it must not have run it twice.
    const wanted = path.end === 'loop' && seen.length === 0 ? '' : blockProgramLines.join(',');
    if (seen.join(',') !== wanted) {
      problems.push(`a path ending in ${path.end} ran block lines [${seen}] instead of [${blockProgramLines}] (programs: ${path.events.map((e) => e.line).join(',')})`);
    }
    if (path.end === 'final' && path.events[path.events.length - 1].line !== finalLine) problems.push('a path ended at another program');
  }
  return [...new Set(problems)];
}
