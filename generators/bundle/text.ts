/**
 * DOS text as the bundle writes it: CR LF after every line (REFERENCES 5.1, [M4C] TBATCH.ASM reads a batch
 * line up to CR and eats the LF), code page 437 (REFERENCES 5.6, through generators/dos/cp437.ts on
 * iconv-lite), at most 80 columns so every line fits one screen row and one printed line.
 */
import { encodeCp437 } from '../dos/cp437';

export const DOS_COLUMNS = 80;

const CRLF = '\r\n';
const CONTROL = /[\x00-\x1f\x7f]/;
const CONTROLS = /[\x00-\x1f\x7f]/g;
const NON_ASCII = /[^\x00-\x7f]/;

/** Removes what must never reach a DOS text file: control characters (Ctrl-Z would end it, REFERENCES 2.14). */
export function plainText(text: string): string {
  return CONTROL.test(text) ? text.replace(CONTROLS, ' ') : text;
}

/** Code page 437 bytes of `text`; plain ASCII (the same bytes in CP437) skips the code page table. */
export function encodeDos(text: string): Uint8Array {
  return NON_ASCII.test(text) ? encodeCp437(text) : Buffer.from(text, 'latin1');
}

/**
 * Encodes lines as a DOS text file. Each line must already fit `columns` (renderers wrap first); a longer
 * line is a bug of the renderer, so it throws instead of silently cutting a command or a sentence.
 */
export function dosLines(lines: readonly string[], columns = DOS_COLUMNS): Uint8Array {
  let clean = true;
  for (const line of lines) {
    if (line.length > columns) throw new RangeError(`line over ${columns} columns: ${JSON.stringify(line)}`);
    if (CONTROL.test(line)) {
      if (/[\r\n]/.test(line)) throw new RangeError(`line holds a line break: ${JSON.stringify(line)}`);
      clean = false;
    }
  }
  return encodeDos((clean ? lines : lines.map(plainText)).join(CRLF) + CRLF);
}

/** Encodes free text with any line ends (LF, CR LF, CR) as CR LF text, lines kept as they are. */
export function dosTextAnyLength(text: string): Uint8Array {
  const lines = text.split(/\r\n|\n|\r/);
  if (lines.length > 0 && lines[lines.length - 1] === '') lines.pop();
  return encodeDos(lines.map(plainText).join(CRLF) + CRLF);
}
