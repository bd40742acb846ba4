// Pasted startup-file text → code page 437 bytes (REFERENCES 5.6, through iconv-lite). A character the code
// page cannot hold is refused with its line and column, never turned silently into "?".
import { encodeCp437, isCp437Text } from '@/generators/dos/cp437';

export type CharProblem = { line: number; column: number; char: string; codePoint: string };
export type EncodeOutcome = { ok: true; bytes: Uint8Array } | { ok: false; problems: CharProblem[] };

/** Most pastes are plain ASCII; remember each other character's answer. */
const known = new Map<string, boolean>();
function fits(ch: string): boolean {
  if (ch.length === 1 && ch.charCodeAt(0) < 0x80) return true;
  let ok = known.get(ch);
  if (ok === undefined) {
    ok = isCp437Text(ch);
    known.set(ch, ok);
  }
  return ok;
}

/**
 * Encodes pasted text. A browser hands text over with LF line ends; DOS text uses CR LF, so a bare LF or
 * bare CR becomes CR LF (lines that already end in CR LF stay). Lines and columns count from 1, a column
 * being one character as the technician sees it.
 */
export function encodePastedText(text: string, maxProblems = 20): EncodeOutcome {
  const problems: CharProblem[] = [];
  let line = 1;
  let column = 0;
  for (const ch of text) {
    if (ch === '\n') {
      line++;
      column = 0;
      continue;
    }
    column++;
    if (ch === '\r') continue;
    if (ch === '\0' || !fits(ch)) {
      if (problems.length < maxProblems) {
        problems.push({ line, column, char: ch, codePoint: `U+${ch.codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')}` });
      }
    }
  }
  if (problems.length > 0) return { ok: false, problems };
  return { ok: true, bytes: encodeCp437(text.replace(/\r\n|\r|\n/g, '\r\n')) };
}

/** One plain sentence naming where the first problems are. */
export function describeProblems(problems: CharProblem[]): string {
  const shown = problems
    .slice(0, 5)
    .map((p) => `line ${p.line}, column ${p.column}: “${p.char === '\0' ? 'NUL' : p.char}” (${p.codePoint})`)
    .join('; ');
  const more = problems.length > 5 ? `, and ${problems.length - 5} more` : '';
  return `Code page 437 (the DOS character set) cannot hold these characters: ${shown}${more}. Replace them and paste again.`;
}
