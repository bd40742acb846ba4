/**
 * Word wrapping for 80-column DOS text. Words longer than the room left are cut (a long path must still
 * fit), so every returned line is at most `width` characters.
 */

/**
 * Wraps `text` to `width` columns. The first line starts with `first`, every later line with `rest`
 * (an indent that lines the text up under the first line's text).
 */
export function wrapWords(text: string, width: number, first = '', rest = first): string[] {
  const lines: string[] = [];
  let line = first;
  let empty = true;
  const push = () => {
    lines.push(line);
    line = rest;
    empty = true;
  };
  for (let word of text.split(/\s+/).filter((w) => w.length > 0)) {
    for (;;) {
      const need = empty ? word.length : word.length + 1;
      if (line.length + need <= width) {
        line += (empty ? '' : ' ') + word;
        empty = false;
        break;
      }
      if (!empty) {
        push();
        continue;
      }
      const room = Math.max(1, width - line.length);
      line += word.slice(0, room);
      word = word.slice(room);
      push();
      if (word.length === 0) break;
    }
  }
  if (!empty || lines.length === 0) lines.push(line.trimEnd());
  return lines;
}

/** "Label: text" wrapped, later lines indented under the text. */
export function wrapLabelled(label: string, text: string, width: number): string[] {
  return wrapWords(text, width, label, ' '.repeat(Math.min(label.length, Math.floor(width / 2))));
}

/** Cuts a line that must keep its spacing (a startup-file line) into pieces of at most `width`. */
export function hardWrap(line: string, width: number, first: string, rest: string): string[] {
  const out: string[] = [];
  let text = line;
  let lead = first;
  do {
    const room = Math.max(1, width - lead.length);
    out.push(lead + text.slice(0, room));
    text = text.slice(room);
    lead = rest;
  } while (text.length > 0);
  return out;
}
