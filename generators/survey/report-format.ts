/**
 * Text layout for the 80-column survey report: word wrapping, columns, and a last pass that guarantees
 * no line is wider than the page. All text goes through cp437Text first, so one character is one column.
 */
import { cp437Text } from './cp437';

export const REPORT_WIDTH = 80;

/** Word-wraps `text`; the first line starts with `first`, the others with `rest` (both count as width). */
export function wrap(text: string, first = '', rest = first, width = REPORT_WIDTH): string[] {
  const words = cp437Text(text).split(' ').filter((w) => w !== '');
  const lines: string[] = [];
  let line = first;
  let empty = true;
  const room = (prefix: string) => Math.max(1, width - prefix.length);
  for (let word of words) {
    while (word.length > 0) {
      const prefix = lines.length === 0 ? first : rest;
      const gap = empty ? '' : ' ';
      if (line.length + gap.length + word.length <= width) {
        line += gap + word;
        empty = false;
        word = '';
      } else if (empty) {
        // A word longer than the line: cut it, there is no better place.
        line += word.slice(0, room(prefix));
        word = word.slice(room(prefix));
        lines.push(line);
        line = rest;
      } else {
        lines.push(line);
        line = rest;
        empty = true;
      }
    }
  }
  if (!empty || lines.length === 0) lines.push(empty ? first.trimEnd() : line);
  return lines;
}

export interface Column {
  header: string;
  width: number;
  align?: 'left' | 'right';
}

function pad(text: string, column: Column): string {
  return column.align === 'right' ? text.padStart(column.width) : text.padEnd(column.width);
}

/**
 * A table row when every cell fits its column; otherwise the row is written as "header: value" lines,
 * so nothing entered is ever cut short.
 */
export function tableRow(columns: Column[], cells: string[], indent = '  '): string[] {
  const clean = cells.map(cp437Text);
  if (clean.every((cell, i) => cell.length <= columns[i].width)) {
    return [(indent + clean.map((cell, i) => pad(cell, columns[i])).join(' ')).trimEnd()];
  }
  const lines = wrap(`${columns[0].header}: ${clean[0]}`, indent, `${indent}    `);
  for (let i = 1; i < columns.length; i += 1) {
    if (clean[i] !== '') lines.push(...wrap(`${columns[i].header}: ${clean[i]}`, `${indent}    `, `${indent}      `));
  }
  return lines;
}

export function tableHeader(columns: Column[], indent = '  '): string[] {
  const head = (indent + columns.map((c) => pad(cp437Text(c.header), c)).join(' ')).trimEnd();
  const rule = (indent + columns.map((c) => '-'.repeat(c.width)).join(' ')).trimEnd();
  return [head, rule];
}

/** Hard-wraps any line still over the width (the safety net; the builders should not need it). */
export function fitWidth(lines: string[], width = REPORT_WIDTH): string[] {
  return lines.flatMap((line) => {
    const clean = cp437Text(line).trimEnd();
    if (clean.length <= width) return [clean];
    const parts: string[] = [];
    for (let i = 0; i < clean.length; i += width) parts.push(clean.slice(i, i + width).trimEnd());
    return parts;
  });
}

export function heading(title: string): string[] {
  const clean = cp437Text(title.toUpperCase());
  return ['', clean, '-'.repeat(Math.min(REPORT_WIDTH, clean.length))];
}
