/**
 * A small batch interpreter written for the tests, independent of the engine's parser and graph code: it
 * walks every boot path of an AUTOEXEC.BAT (both ways at each IF, every menu choice at GOTO %CONFIG%) and
 * records the programs each path starts. Label rules follow REFERENCES 2.8 ([M4C] TBATCH2.ASM: first match
 * from the top, 8 characters, case-insensitive); CALL returns and a .BAT hand-off does not (2.2, 2.3);
 * Ctrl-Z ends the file (2.14).
 */

export type Cmd =
  | { t: 'nop' }
  | { t: 'label'; name: string }
  | { t: 'goto'; target: string }
  | { t: 'cond'; inner: Cmd }
  | { t: 'call'; target: string; args: string }
  | { t: 'exit' }
  | { t: 'run'; program: string; args: string; batch: boolean };

export type WalkEvent = { line: number; program: string; args: string };
export type WalkEnd = 'final' | 'handoff' | 'exit' | 'eof' | 'loop' | 'missing-label';
export type WalkPath = { events: WalkEvent[]; end: WalkEnd };

const NOPS = /^(echo|set|path|prompt|cls|cd|chdir|md|mkdir|rd|rmdir|ver|vol|pause|shift|break|verify|ctty|type|del|erase|copy|dir|date|time|ren|rename|chcp)(?![a-z0-9_$#!~-])/i;

/** The lines COMMAND.COM would read: up to the first Ctrl-Z, split at CR LF, LF or CR. */
export function batchLines(text: string): string[] {
  const body = text.split('\x1a')[0];
  if (body === '') return [];
  const lines = body.split(/\r\n|\n|\r/);
  if (lines[lines.length - 1] === '') lines.pop();
  return lines;
}

export function parseCmd(raw: string): Cmd {
  const s = raw.replace(/^[ \t]*@?[ \t]*/, '');
  if (s.trim() === '') return { t: 'nop' };
  // `::` lines are labels no GOTO can name (GOTO drops one leading colon of its target), used as comments
  // (REFERENCES 2.5); they are no jump targets here, not even for GOTO %CONFIG% with an unknown menu.
  if (s.startsWith('::')) return { t: 'nop' };
  if (s.startsWith(':')) return { t: 'label', name: s.slice(1).trim().split(/\s/)[0].toUpperCase() };
  if (/^rem(\s|$)/i.test(s) || /^[;*#]/.test(s) || /^[a-z]:\s*$/i.test(s)) return { t: 'nop' };
  let m = /^goto[\s,;=]*:?(\S*)/i.exec(s);
  if (m) return { t: 'goto', target: m[1].toUpperCase() };
  m = /^if\s+(?:not\s+)?(?:(?:errorlevel|exist)\s+\S+|[^=\s]*\s*==\s*\S*)\s+(.*)$/i.exec(s);
  if (m) return { t: 'cond', inner: parseCmd(m[1]) };
  m = /^for\s+.*?\)\s*do\s+(.*)$/i.exec(s);
  if (m) return { t: 'cond', inner: parseCmd(m[1]) };
  m = /^call\s+(\S+)(.*)$/i.exec(s);
  if (m) return { t: 'call', target: m[1], args: m[2].trim() };
  if (/^exit(\s|$)/i.test(s)) return { t: 'exit' };
  if (NOPS.test(s)) return { t: 'nop' };
  m = /^(?:lh|loadhigh)\s+(?:\/\S*\s+)*(\S+)(.*)$/i.exec(s);
  const [program, args] = m ? [m[1], m[2]] : [s.split(/\s/)[0], s.slice(s.split(/\s/)[0].length)];
  return { t: 'run', program, args: args.trim(), batch: /\.bat$/i.test(program) };
}

export type WalkOptions = {
  /** 1-based line of the program that may never return, or null. */
  finalLine: number | null;
  /** Menu block names for GOTO %CONFIG%, or null when unknown (then every label, or none). */
  configChoices: string[] | null;
  /** How often one path may pass a line before the walk stops it as a loop. */
  maxVisits?: number;
  maxPaths?: number;
};

type State = { pc: number; visits: Map<number, number>; events: WalkEvent[] };

/** Every boot path of `text`. */
export function walkPaths(text: string, options: WalkOptions): WalkPath[] {
  const cmds = batchLines(text).map(parseCmd);
  const labels = new Map<string, number>();
  cmds.forEach((c, i) => {
    if (c.t === 'label' && !labels.has(c.name.slice(0, 8))) labels.set(c.name.slice(0, 8), i);
  });
  const maxVisits = options.maxVisits ?? 2;
  const maxPaths = options.maxPaths ?? 4000;
  const done: WalkPath[] = [];
  const work: State[] = [{ pc: 0, visits: new Map(), events: [] }];
  const fork = (s: State, pc: number): State => ({ pc, visits: new Map(s.visits), events: [...s.events] });
  const gotoTargets = (target: string): (number | null)[] => {
    if (!target.includes('%')) return [labels.has(target.slice(0, 8)) ? labels.get(target.slice(0, 8))! : null];
    if (/^%CONFIG%$/i.test(target) && options.configChoices) {
      return options.configChoices.map((c) => labels.get(c.toUpperCase().slice(0, 8)) ?? null);
    }
    return [...new Set(labels.values()), null];
  };
  while (work.length > 0 && done.length < maxPaths) {
    const s = work.pop()!;
    let end: WalkEnd | null = null;
    while (end === null) {
      if (s.pc >= cmds.length) {
        end = 'eof';
        break;
      }
      const seen = (s.visits.get(s.pc) ?? 0) + 1;
      s.visits.set(s.pc, seen);
      if (seen > maxVisits) {
        end = 'loop';
        break;
      }
      let cmd = cmds[s.pc];
      if (cmd.t === 'cond') {
        work.push(fork(s, s.pc + 1));
        cmd = cmd.inner;
      }
      if (cmd.t === 'goto') {
        const targets = gotoTargets(cmd.target);
        for (const t of targets.slice(1)) {
          if (t === null) done.push({ events: [...s.events], end: 'missing-label' });
          else work.push(fork(s, t));
        }
        if (targets[0] === null) end = 'missing-label';
        else s.pc = targets[0];
        continue;
      }
      if (cmd.t === 'exit') end = 'exit';
      else if (cmd.t === 'call') s.events.push({ line: s.pc + 1, program: cmd.target, args: cmd.args });
      else if (cmd.t === 'run') {
        s.events.push({ line: s.pc + 1, program: cmd.program, args: cmd.args });
        if (s.pc + 1 === options.finalLine) end = 'final';
        else if (cmd.batch) end = 'handoff';
      }
      s.pc++;
    }
    done.push({ events: s.events, end });
  }
  return done;
}

/** Every program a file names (for placing stubs): runs and CALL targets, with the line number. */
export function programsNamed(text: string): { line: number; program: string; call: boolean }[] {
  const out: { line: number; program: string; call: boolean }[] = [];
  batchLines(text).forEach((raw, i) => {
    let c = parseCmd(raw);
    if (c.t === 'cond') c = c.inner;
    if (c.t === 'run') out.push({ line: i + 1, program: c.program, call: false });
    if (c.t === 'call') out.push({ line: i + 1, program: c.target, call: true });
  });
  return out;
}
