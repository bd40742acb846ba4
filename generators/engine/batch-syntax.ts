/**
 * What one AUTOEXEC.BAT line is, read the way COMMAND.COM reads it. Pure functions over one line's text.
 * Facts: `@` first non-blank hides the line (REFERENCES 2.1); `:` first makes a label, so `::` is a label
 * used as a comment (2.5); `;` is not a batch comment (2.6); internal commands per 2.4; GOTO labels count
 * 8 characters (2.8); CALL returns and a plain .BAT hand-off never does (2.2, 2.3); LH/LOADHIGH (2.24).
 */

export type Statement =
  | { kind: 'blank' }
  | { kind: 'comment'; style: 'rem' | 'colons' | 'home-made' }
  | { kind: 'label'; name: string }
  | { kind: 'internal'; command: string; args: string }
  | { kind: 'drive'; drive: string }
  | { kind: 'goto'; target: string; dynamic: boolean }
  | { kind: 'call'; target: string; args: string }
  | { kind: 'exit' }
  | { kind: 'if'; negate: boolean; test: 'errorlevel' | 'exist' | 'compare'; condition: string; then: Statement }
  | { kind: 'for'; variable: string; set: string; then: Statement }
  | { kind: 'program'; path: string; args: string; loadHigh: boolean; handoff: boolean; dynamic: boolean };

export type BatchSyntax = {
  /** Characters before the statement: blanks and an `@` with the blanks after it. */
  prefix: string;
  atSign: boolean;
  stmt: Statement;
};

/** Internal commands of COMMAND.COM (REFERENCES 2.4 for 2.0 and 4.0; LH/LOADHIGH 5.0 [HELP622]). */
const INTERNAL = new Set([
  'BREAK', 'CALL', 'CD', 'CHDIR', 'CHCP', 'CLS', 'COPY', 'CTTY', 'DATE', 'DEL', 'DIR', 'ECHO', 'ERASE',
  'EXIT', 'FOR', 'GOTO', 'IF', 'LH', 'LOADHIGH', 'MD', 'MKDIR', 'PATH', 'PAUSE', 'PROMPT', 'RD', 'REM',
  'REN', 'RENAME', 'RMDIR', 'SET', 'SHIFT', 'TIME', 'TRUENAME', 'TYPE', 'VER', 'VERIFY', 'VOL',
]);

// A command word ends at a blank or at a character DOS treats as a separator after a command name.
const WORD = /^[^\s,;=<>|"+]+/;
// An internal name may be glued to what follows: ECHO. CD\ CD.. PATH; (a letter or digit would make it a
// different word, e.g. SETUP).
const GLUED = /^([A-Za-z]+)(?=[.\\/:[\]+]|$)/;

/** Classifies one line's text (without its terminator). */
export function readBatchLine(text: string): BatchSyntax {
  const lead = /^[ \t]*/.exec(text)![0];
  let rest = text.slice(lead.length);
  let prefix = lead;
  let atSign = false;
  if (rest.startsWith('@')) {
    atSign = true;
    const after = /^@[ \t]*/.exec(rest)![0];
    prefix += after;
    rest = rest.slice(after.length);
  }
  return { prefix, atSign, stmt: readStatement(rest) };
}

/** Classifies a command with its leading blanks and `@` already removed. */
export function readStatement(text: string): Statement {
  const trimmed = text.replace(/^[ \t]+/, '');
  if (trimmed.replace(/[ \t\f]+$/, '') === '') return { kind: 'blank' };
  const first = trimmed[0];
  if (first === ':') {
    if (trimmed[1] === ':' || /^:[ \t]*$/.test(trimmed)) return { kind: 'comment', style: 'colons' };
    const name = /^:[ \t]*([^\s]*)/.exec(trimmed)![1];
    return { kind: 'label', name: name.toUpperCase() };
  }
  if (first === ';' || first === '*' || first === '#') return { kind: 'comment', style: 'home-made' };
  const word = WORD.exec(trimmed)?.[0] ?? trimmed[0];
  const glued = GLUED.exec(word);
  const name = (glued ? glued[1] : word).toUpperCase();
  if (INTERNAL.has(name) && (glued || word.length === name.length)) {
    return readInternal(name, trimmed.slice(name.length));
  }
  if (/^[A-Za-z]:$/.test(word) && trimmed.slice(word.length).trim() === '') {
    return { kind: 'drive', drive: word[0].toUpperCase() };
  }
  return readProgram(word, trimmed.slice(word.length), false);
}

function readProgram(path: string, args: string, loadHigh: boolean): Statement {
  const handoff = /\.BAT$/i.test(path);
  return { kind: 'program', path, args, loadHigh, handoff, dynamic: path.includes('%') };
}

function readInternal(command: string, args: string): Statement {
  switch (command) {
    case 'REM':
      return { kind: 'comment', style: 'rem' };
    case 'GOTO': {
      const target = /^[\s,;=]*:?([^\s]*)/.exec(args)![1];
      return { kind: 'goto', target: target.toUpperCase(), dynamic: target.includes('%') };
    }
    case 'CALL': {
      const m = /^[\s,;=]*([^\s]*)(.*)$/.exec(args)!;
      return { kind: 'call', target: m[1], args: m[2] };
    }
    case 'EXIT':
      return { kind: 'exit' };
    case 'IF':
      return readIf(args) ?? { kind: 'internal', command, args };
    case 'FOR':
      return readFor(args) ?? { kind: 'internal', command, args };
    case 'LH':
    case 'LOADHIGH':
      return readLoadHigh(args) ?? { kind: 'internal', command, args };
    default:
      return { kind: 'internal', command, args };
  }
}

/** `IF [NOT] ERRORLEVEL n cmd`, `IF [NOT] EXIST file cmd`, `IF [NOT] a==b cmd`. */
function readIf(args: string): Statement | null {
  let rest = args.replace(/^[ \t]+/, '');
  let negate = false;
  const not = /^NOT[ \t]+/i.exec(rest);
  if (not) {
    negate = true;
    rest = rest.slice(not[0].length);
  }
  const keyword = /^(ERRORLEVEL|EXIST)[ \t]+([^ \t]+)[ \t]*/i.exec(rest);
  if (keyword) {
    const test = keyword[1].toUpperCase() === 'EXIST' ? 'exist' : 'errorlevel';
    return { kind: 'if', negate, test, condition: keyword[2], then: readStatement(rest.slice(keyword[0].length)) };
  }
  const compare = /^([^ \t=]*)[ \t]*==[ \t]*([^ \t]*)[ \t]*/.exec(rest);
  if (!compare) return null;
  const condition = `${compare[1]}==${compare[2]}`;
  return { kind: 'if', negate, test: 'compare', condition, then: readStatement(rest.slice(compare[0].length)) };
}

/** `FOR %%V IN (set) DO cmd`. */
function readFor(args: string): Statement | null {
  const m = /^[ \t]*(%%?[^ \t]+)[ \t]+IN[ \t]*\(([^)]*)\)[ \t]*DO[ \t]+/i.exec(args);
  if (!m) return null;
  return { kind: 'for', variable: m[1], set: m[2], then: readStatement(args.slice(m[0].length)) };
}

/** `LH [/L:...] [/S] program args` (switches per REFERENCES 2.24). */
function readLoadHigh(args: string): Statement | null {
  const m = /^([ \t]+(?:\/[^ \t]*[ \t]+)*)([^ \t]+)/.exec(args);
  if (!m) return null;
  return readProgram(m[2], args.slice(m[0].length), true);
}

/** The statement that runs when a line runs: the command after IF/FOR, or the line itself. */
export function innermost(stmt: Statement): Statement {
  let s = stmt;
  while (s.kind === 'if' || s.kind === 'for') s = s.then;
  return s;
}

/** True when the statement runs only under a condition (IF) or a repeat (FOR). */
export function isConditional(stmt: Statement): boolean {
  return stmt.kind === 'if' || stmt.kind === 'for';
}

/** The first 8 characters of a label, upper-cased: what GOTO compares (REFERENCES 2.8) [M4C] TBATCH2.ASM. */
export function labelKey(name: string): string {
  return name.toUpperCase().slice(0, 8);
}
