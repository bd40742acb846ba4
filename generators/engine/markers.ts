/**
 * Our marker REM lines around the block. REM text avoids `>`, `<` and `|`, which a REM line may not hold
 * (REFERENCES 2.6 [HELP622] REM--Note). Lines we turn off get a REM (or `::`) prefix of our own, so the
 * original text stays byte for byte after it and re-running the engine recognises them.
 */

export const BLOCK_START = 'REM --- Bootwright network block start (do not edit by hand) ---';
export const BLOCK_END = 'REM --- Bootwright network block end ---';
export const CONFIG_START = 'REM --- Bootwright CONFIG.SYS lines start (do not edit by hand) ---';
export const CONFIG_END = 'REM --- Bootwright CONFIG.SYS lines end ---';
export const OFF_WORDS = 'Bootwright off: ';

const START_RE = /^[ \t]*@?[ \t]*REM --- Bootwright network block start\b/i;
const END_RE = /^[ \t]*@?[ \t]*REM --- Bootwright network block end\b/i;
const CONFIG_START_RE = /^[ \t]*REM --- Bootwright CONFIG\.SYS lines start\b/i;
const CONFIG_END_RE = /^[ \t]*REM --- Bootwright CONFIG\.SYS lines end\b/i;
const OFF_RE = /^[ \t]*@?(REM|::) Bootwright off: /i;

export function isBlockStart(text: string): boolean {
  return START_RE.test(text);
}
export function isBlockEnd(text: string): boolean {
  return END_RE.test(text);
}
export function isConfigStart(text: string): boolean {
  return CONFIG_START_RE.test(text);
}
export function isConfigEnd(text: string): boolean {
  return CONFIG_END_RE.test(text);
}
/** True for a line an earlier run turned off. */
export function isTurnedOff(text: string): boolean {
  return OFF_RE.test(text);
}

/**
 * The prefix that turns a batch line off. A line holding `>`, `<` or `|` gets `::` (a label line, which
 * COMMAND skips without parsing: REFERENCES 2.5 [M4C] TBATCH.ASM) because REM may not hold them (2.6).
 */
export function batchOffPrefix(text: string, atSign: boolean): string {
  if (/[<>|]/.test(text)) return `:: ${OFF_WORDS}`;
  return `${atSign ? '@' : ''}REM ${OFF_WORDS}`;
}

/** The prefix that turns a CONFIG.SYS line off (REM is a CONFIG.SYS line from 4.0, REFERENCES 3.2). */
export function configOffPrefix(): string {
  return `REM ${OFF_WORDS}`;
}

/** Where our block sits in a list of line texts: start and end indexes, or a problem. */
export type BlockSpan = { start: number; end: number };
export type BlockSearch =
  | { found: false }
  | { found: true; span: BlockSpan }
  | { found: 'broken'; reason: string; line: number };

export function findBlock(texts: readonly string[], start: (t: string) => boolean, end: (t: string) => boolean): BlockSearch {
  const starts: number[] = [];
  const ends: number[] = [];
  texts.forEach((t, i) => {
    if (start(t)) starts.push(i);
    else if (end(t)) ends.push(i);
  });
  if (starts.length === 0 && ends.length === 0) return { found: false };
  if (starts.length > 1) return { found: 'broken', reason: 'the file holds our block more than once', line: starts[1] };
  if (starts.length === 0 || ends.length !== 1) {
    return { found: 'broken', reason: 'a start or end marker line of our block is missing', line: starts[0] ?? ends[0] };
  }
  if (ends[0] < starts[0]) return { found: 'broken', reason: 'the end marker comes before the start marker', line: ends[0] };
  return { found: true, span: { start: starts[0], end: ends[0] } };
}
