/**
 * The rule "every line outside our block is byte-identical, or turned into a REM line with a check",
 * checked on raw text with code of its own (not the engine's).
 */
import type { Check } from '../../../../generators/engine/check';

type Line = { text: string; eol: string };

function lines(text: string): Line[] {
  const out: Line[] = [];
  const body = text.split('\x1a')[0];
  const re = /([^\r\n]*)(\r\n|\n|\r|$)/g;
  for (let m = re.exec(body); m && m.index < body.length; m = re.exec(body)) {
    out.push({ text: m[1], eol: m[2] });
    if (m[2] === '') break;
  }
  return out;
}

/** 1-based first and last line of our block, or null. */
export function blockRange(text: string): { start: number; end: number } | null {
  const ls = lines(text);
  const start = ls.findIndex((l) => /REM --- Bootwright network block start/i.test(l.text));
  const end = ls.findIndex((l) => /REM --- Bootwright network block end/i.test(l.text));
  return start >= 0 && end >= start ? { start: start + 1, end: end + 1 } : null;
}

function withoutBlock(ls: Line[]): Line[] {
  const start = ls.findIndex((l) => /REM --- Bootwright network block start/i.test(l.text));
  const end = ls.findIndex((l) => /REM --- Bootwright network block end/i.test(l.text));
  return start >= 0 && end >= start ? [...ls.slice(0, start), ...ls.slice(end + 1)] : ls;
}

/** Where line `no` of `before` is in `after`, pairing the lines outside the block one to one. */
export function mapLine(before: string, after: string, no: number): number {
  const a = lines(before);
  const b = lines(after);
  const old = withoutBlock(a);
  const now = withoutBlock(b);
  const k = old.indexOf(a[no - 1]);
  return b.indexOf(now[k]) + 1;
}

const OFF = /^(@?REM|::) Bootwright off: /;

/** Problems found; [] when the rule holds. Line numbers in checks refer to `before`. */
export function outsideBlockProblems(before: string, after: string, checks: Check[]): string[] {
  const a = lines(before);
  const origNumber = new Map<Line, number>(a.map((l, i) => [l, i + 1]));
  const old = withoutBlock(a);
  const now = withoutBlock(lines(after));
  const problems: string[] = [];
  if (old.length !== now.length) return [`${old.length} lines outside the block before, ${now.length} after`];
  const tailBefore = before.includes('\x1a') ? before.slice(before.indexOf('\x1a')) : '';
  const tailAfter = after.includes('\x1a') ? after.slice(after.indexOf('\x1a')) : '';
  if (tailBefore !== tailAfter) problems.push('the Ctrl-Z tail changed');
  old.forEach((o, i) => {
    const n = now[i];
    const no = origNumber.get(o)!;
    const hasCheck = (slug?: string) => checks.some((c) => c.file === 'AUTOEXEC.BAT' && c.line === no && (!slug || c.slug === slug));
    if (n.text === o.text && n.eol === o.eol) return;
    const gainedEnd = o.eol === '' && n.eol === '\r\n';
    if (n.eol !== o.eol && !gainedEnd) {
      problems.push(`line ${no} changed its line end`);
      return;
    }
    if (gainedEnd && !hasCheck('line-end-added')) problems.push(`line ${no} gained a line end without a check`);
    if (n.text === o.text) return;
    const m = OFF.exec(n.text);
    if (m && n.text.slice(m[0].length) === o.text) {
      if (!hasCheck()) problems.push(`line ${no} was turned off without a check`);
      return;
    }
    problems.push(`line ${no} changed: ${JSON.stringify(o.text)} -> ${JSON.stringify(n.text)}`);
  });
  return problems;
}
