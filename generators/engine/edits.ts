/**
 * Edits are values against the original text: `{ offset, length, text }`, never overlapping. Everything
 * else (the patched file, line numbers in the new file, the diff) is derived from them.
 */

export type Edit = { offset: number; length: number; text: string };

/** Edits in the order they apply: by offset, a pure insertion before a replacement at the same offset. */
export function sortEdits(edits: readonly Edit[]): Edit[] {
  return [...edits].sort((a, b) => a.offset - b.offset || a.length - b.length);
}

/** Applies non-overlapping edits; throws on overlap, which is a bug in the engine, not bad input. */
export function applyEdits(source: string, edits: readonly Edit[]): string {
  let out = '';
  let at = 0;
  for (const e of sortEdits(edits)) {
    if (e.offset < at || e.offset + e.length > source.length) throw new Error('engine bug: overlapping edits');
    out += source.slice(at, e.offset) + e.text;
    at = e.offset + e.length;
  }
  return out + source.slice(at);
}

/** Number of line breaks (CR LF, LF or CR each count once) in `text`. */
export function countBreaks(text: string): number {
  let n = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 10) n++;
    else if (c === 13) {
      n++;
      if (text.charCodeAt(i + 1) === 10) i++;
    }
  }
  return n;
}

/** 1-based line in the new text where the edit's own text starts. */
export function newLineOf(source: string, edits: readonly Edit[], target: Edit): number {
  let shift = 0;
  for (const e of sortEdits(edits)) {
    if (e === target) break;
    if (e.offset <= target.offset) shift += countBreaks(e.text) - countBreaks(source.slice(e.offset, e.offset + e.length));
  }
  const lead = target.text.startsWith('\r\n') ? 1 : 0;
  return countBreaks(source.slice(0, target.offset)) + shift + 1 + lead;
}
