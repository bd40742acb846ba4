/**
 * What one CONFIG.SYS line is. Facts: directives per REFERENCES 3.1-3.3 ([M2] CONFIG.txt, [M4S] SYSINIT2.ASM);
 * 6.x menu blocks `[MENU]`, `[COMMON]`, INCLUDE=, SUBMENU= (3.13); `;` comments and `name?=` prompts (3.14);
 * FreeDOS `!` and `?` prefixes, including menu digits such as `12?` (3.16 [FDK] config.c).
 */

export type ConfigStatement =
  | { kind: 'blank' }
  | { kind: 'comment'; style: 'rem' | 'semicolon' | 'home-made' }
  | { kind: 'block'; name: string }
  | {
      kind: 'directive';
      /** Upper-case directive name, e.g. FILES, DEVICE, DOS, SET. */
      name: string;
      /** A FreeDOS-style prefix as written: '!', '?', '12?' or ''. */
      marker: string;
      /** `name?=`: DOS 6 asks before running the line. */
      ask: boolean;
      /** The value after `=` (or after the blank), as written. */
      value: string;
      /** Where `value` starts inside the line's text. */
      valueAt: number;
    }
  | { kind: 'unknown' };

export type ConfigSyntax = { stmt: ConfigStatement };

const DIRECTIVE = /^([ \t]*)([0-9]*[?!])?([ \t]*)([A-Za-z]+)([ \t]*\?)?([ \t]*=[ \t]*|[ \t]+)(.*)$/;

/** Classifies one CONFIG.SYS line's text (without its terminator). */
export function readConfigLine(text: string): ConfigSyntax {
  const trimmed = text.trim();
  if (trimmed === '') return { stmt: { kind: 'blank' } };
  if (trimmed.startsWith(';')) return { stmt: { kind: 'comment', style: 'semicolon' } };
  if (trimmed.startsWith('*') || trimmed.startsWith('#')) return { stmt: { kind: 'comment', style: 'home-made' } };
  const block = /^\[([^\]]*)\]/.exec(trimmed);
  if (block) return { stmt: { kind: 'block', name: block[1].trim().toUpperCase() } };
  if (/^REM(\s|$)/i.test(trimmed)) return { stmt: { kind: 'comment', style: 'rem' } };
  const m = DIRECTIVE.exec(text);
  if (!m) return { stmt: { kind: 'unknown' } };
  const valueAt = text.length - m[7].length;
  return {
    stmt: {
      kind: 'directive',
      name: m[4].toUpperCase(),
      marker: m[2] ?? '',
      ask: m[5] !== undefined,
      value: m[7],
      valueAt,
    },
  };
}
