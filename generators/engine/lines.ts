/**
 * Splitting decoded text into lines without losing a byte: each line keeps its offset, its raw text and its
 * own terminator; a Ctrl-Z (1Ah) and everything after it stay as the tail (REFERENCES 2.14: Ctrl-Z ends a
 * batch file for COMMAND.COM [M4C] TBATCH2.ASM; 5.1 for text files in general).
 */

export type Eol = '\r\n' | '\n' | '\r' | '';

export type RawLine = {
  /** 0-based position in the file. */
  index: number;
  /** Character (= byte) offset of the line's first character. */
  offset: number;
  /** The line without its terminator, exactly as in the file. */
  text: string;
  eol: Eol;
};

export type SplitText = { lines: RawLine[]; tail: string };

const CR = 13;
const LF = 10;

/** Splits `source` at CR LF, lone LF and lone CR; text from the first Ctrl-Z on is the tail. */
export function splitLines(source: string): SplitText {
  const cut = source.indexOf('\x1a');
  const body = cut < 0 ? source : source.slice(0, cut);
  const tail = cut < 0 ? '' : source.slice(cut);
  const lines: RawLine[] = [];
  let start = 0;
  for (let i = 0; i < body.length; i++) {
    const c = body.charCodeAt(i);
    if (c !== CR && c !== LF) continue;
    const crlf = c === CR && body.charCodeAt(i + 1) === LF;
    const eol: Eol = crlf ? '\r\n' : c === CR ? '\r' : '\n';
    lines.push({ index: lines.length, offset: start, text: body.slice(start, i), eol });
    if (crlf) i++;
    start = i + 1;
  }
  if (start < body.length) lines.push({ index: lines.length, offset: start, text: body.slice(start), eol: '' });
  return { lines, tail };
}

/** Puts lines and tail back together; for an untouched split this is the source exactly. */
export function joinLines(lines: readonly { text: string; eol: Eol }[], tail: string): string {
  let out = '';
  for (const line of lines) out += line.text + line.eol;
  return out + tail;
}

/**
 * Why the text is not a startup file, or null: NUL bytes, or many control characters, before any Ctrl-Z.
 * Tab, form feed and ESC (ANSI colour codes in ECHO lines) count as text.
 */
export function binaryReason(source: string): string | null {
  const cut = source.indexOf('\x1a');
  const body = cut < 0 ? source : source.slice(0, cut);
  let controls = 0;
  for (let i = 0; i < body.length; i++) {
    const c = body.charCodeAt(i);
    if (c === 0) return 'it holds NUL bytes, so it is a program or data file, not text';
    if (c < 32 && c !== 9 && c !== 10 && c !== 13 && c !== 12 && c !== 27) controls++;
  }
  if (body.length > 0 && controls / body.length > 0.05) return 'it holds many control bytes, so it is not a text file';
  return null;
}
